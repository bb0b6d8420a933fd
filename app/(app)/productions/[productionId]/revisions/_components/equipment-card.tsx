// The equipment list (of a revision or the paperwork as it stands) and the add / return list from another
// revision: chosen with a plain GET form, so the view can be bookmarked and printed.
import type { EquipmentReport } from "@/lib/data/revision-equipment";
import type { RevisionDto } from "@/lib/revisions/types";
import { Card } from "@/components/ui/card";
import { PrintButton } from "./print-button";

const KIND = { type: "Fixture", accessory: "Accessory" } as const;

function RevisionSelect({
  name,
  label,
  value,
  revisions,
  none,
}: {
  name: string;
  label: string;
  value: string;
  revisions: RevisionDto[];
  none?: string;
}) {
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={`eq-${name}`} className="font-medium">
        {label}
      </label>
      <select
        id={`eq-${name}`}
        name={name}
        defaultValue={value}
        className="min-h-10 rounded-md border border-line bg-surface px-3 text-ink"
      >
        {none ? <option value="">{none}</option> : null}
        <option value="current">The paperwork now</option>
        {revisions.map((r) => (
          <option key={r.id} value={String(r.id)}>
            Revision {r.label}
          </option>
        ))}
      </select>
    </div>
  );
}

export function EquipmentCard({
  productionId,
  revisions,
  report,
  query,
}: {
  productionId: number;
  revisions: RevisionDto[];
  report: EquipmentReport;
  query: { of: string; from: string; spares: string };
}) {
  const params = new URLSearchParams({ of: query.of, spares: String(report.sparesPercent) });
  if (query.from) params.set("from", query.from);
  const file = (format: string) => `/api/productions/${productionId}/revisions/equipment?${params}&format=${format}`;
  return (
    <Card title="Equipment for the shop" actions={<PrintButton />}>
      <form method="get" className="mb-3 flex flex-wrap items-end gap-3 print:hidden" aria-label="Equipment list">
        <RevisionSelect name="of" label="List of" value={query.of} revisions={revisions} />
        <RevisionSelect
          name="eqFrom"
          label="Add / return from"
          value={query.from}
          revisions={revisions}
          none="(no add / return list)"
        />
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Spares %</span>
          <input
            name="spares"
            type="number"
            min={0}
            max={100}
            step={1}
            defaultValue={report.sparesPercent}
            className="min-h-10 w-24 rounded-md border border-line bg-surface px-3 text-ink"
          />
        </label>
        <button type="submit" className="min-h-10 rounded-md border border-line px-4 text-sm hover:bg-raised">
          Show
        </button>
        <a className="text-sm text-accent underline" href={file("csv")}>
          CSV
        </a>
        <a className="text-sm text-accent underline" href={file("xlsx")}>
          Excel
        </a>
      </form>
      {report.addReturn ? (
        <>
          <h3 className="text-sm font-semibold">
            Add / return, {report.from} to {report.of}
          </h3>
          {report.addReturn.length ? (
            <table className="mb-4 w-full text-sm" aria-label="Add and return list">
              <thead className="text-left text-xs uppercase tracking-wide text-muted">
                <tr>
                  <th scope="col">Kind</th>
                  <th scope="col">Item</th>
                  <th scope="col">Total at {report.from}</th>
                  <th scope="col">Total at {report.of}</th>
                  <th scope="col">Send</th>
                  <th scope="col">Take back</th>
                </tr>
              </thead>
              <tbody>
                {report.addReturn.map((l) => (
                  <tr key={`${l.kind}-${l.name}`} className="border-t border-line">
                    <td>{KIND[l.kind]}</td>
                    <td>{l.name}</td>
                    <td>{l.before}</td>
                    <td>{l.after}</td>
                    <td className="font-medium">{l.add || ""}</td>
                    <td className="font-medium">{l.return || ""}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : (
            <p className="mb-4 text-sm text-muted">Nothing to send or take back.</p>
          )}
        </>
      ) : null}
      <h3 className="text-sm font-semibold">
        Equipment list, {report.of === "current" ? "the paperwork now" : `revision ${report.of}`}, with{" "}
        {report.sparesPercent} % spares
      </h3>
      <table className="w-full text-sm" aria-label="Equipment list">
        <thead className="text-left text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col">Kind</th>
            <th scope="col">Item</th>
            <th scope="col">In the rig</th>
            <th scope="col">Spares</th>
            <th scope="col">Total</th>
          </tr>
        </thead>
        <tbody>
          {report.list.map((l) => (
            <tr key={`${l.kind}-${l.name}`} className="border-t border-line">
              <td>{KIND[l.kind]}</td>
              <td>{l.name}</td>
              <td>{l.inUse}</td>
              <td>{l.spares}</td>
              <td className="font-medium">{l.total}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Card>
  );
}

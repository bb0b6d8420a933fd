// One show report in the list: a draft (with the stage manager's edit and send buttons beside it) or a sent
// one, which stays as it was sent.
import type { ReactNode } from "react";
import type { ShowReportDto } from "@/lib/notes/dto";
import { KIND_LABELS } from "@/lib/notes/words";

export function ReportCard({
  report: r,
  fixtureLabel,
  actions,
}: {
  report: ShowReportDto;
  fixtureLabel: (id: number | null) => string;
  actions: ReactNode;
}) {
  const draft = r.status === "draft";
  return (
    <article className="rounded-md border border-line bg-surface p-3 text-sm" data-testid={`report-${r.id}`}>
      <div className="flex flex-wrap items-center gap-2">
        <h3 className="font-medium">
          {r.performance} · {r.performedOn}
        </h3>
        <span
          className={`rounded-full border px-2 text-xs ${draft ? "border-caution text-caution" : "border-line text-muted"}`}
          data-testid={`report-status-${r.id}`}
        >
          {draft ? "Draft, not sent" : `Sent ${r.sentAt ? new Date(r.sentAt).toLocaleString() : ""}`}
        </span>
        {actions}
      </div>
      {r.summary ? <p className="whitespace-pre-wrap">{r.summary}</p> : null}
      {r.faults.length ? (
        <ul className="mt-1">
          {r.faults.map((f) => (
            <li key={f.id}>
              {f.kind === "lamp_out" ? "Lamp out" : "Fault"}
              {f.fixtureId != null ? ` · ${fixtureLabel(f.fixtureId)}` : ""}: {f.description}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-muted">No lamps out or faults logged.</p>
      )}
      {draft ? (
        r.items.length ? (
          <ul className="mt-1 list-disc pl-5">
            {r.items.map((it) => (
              <li key={it.id}>
                [{KIND_LABELS[it.kind]}] {it.body}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-muted">No lighting items yet.</p>
        )
      ) : (
        <p className="mt-1 text-xs text-muted">
          {r.noteIds.length} note{r.noteIds.length === 1 ? "" : "s"} written from this report; a sent report stays as it
          was sent.
        </p>
      )}
    </article>
  );
}

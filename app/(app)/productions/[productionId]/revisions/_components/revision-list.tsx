// The issued revisions, newest first, each with the counts of what changed in it; a row opens its list.
import Link from "next/link";
import type { DiffSummary, RevisionDto } from "@/lib/revisions/types";

function counts(s: DiffSummary): string {
  const f = s.fixtures;
  const c = s.cues;
  const parts = [
    f.added && `${f.added} unit${f.added === 1 ? "" : "s"} added`,
    f.removed && `${f.removed} removed`,
    f.refocused && `${f.refocused} refocused`,
    f.repatched && `${f.repatched} re-patched`,
    f.recoloured && `${f.recoloured} recoloured`,
    f.otherwise && `${f.otherwise} otherwise changed`,
    c.added && `${c.added} cue${c.added === 1 ? "" : "s"} added`,
    c.removed && `${c.removed} cue${c.removed === 1 ? "" : "s"} removed`,
    c.retimed && `${c.retimed} retimed`,
    c.relevelled && `${c.relevelled} re-levelled`,
  ].filter(Boolean);
  return parts.length ? parts.join(", ") : "no changes to units or cues";
}

export function RevisionList({
  productionId,
  revisions,
  selectedId,
}: {
  productionId: number;
  revisions: RevisionDto[];
  selectedId: number | null;
}) {
  if (!revisions.length) return <p className="text-sm text-muted">No revision has been issued yet.</p>;
  return (
    <table className="w-full text-sm" aria-label="Issued revisions">
      <thead className="text-left text-xs uppercase tracking-wide text-muted">
        <tr>
          <th scope="col">Revision</th>
          <th scope="col">For</th>
          <th scope="col">Issued</th>
          <th scope="col">By</th>
          <th scope="col">What changed</th>
        </tr>
      </thead>
      <tbody>
        {revisions.map((r) => (
          <tr
            key={r.id}
            className={`border-t border-line align-top ${r.id === selectedId ? "bg-raised" : ""}`}
            aria-current={r.id === selectedId ? "true" : undefined}
          >
            <td className="py-1 font-semibold">
              <Link href={`/productions/${productionId}/revisions?revision=${r.id}`} className="text-accent underline">
                {r.label}
              </Link>
            </td>
            <td>{r.issuedFor}</td>
            <td className="whitespace-nowrap">{new Date(r.issuedAt).toUTCString().slice(5, 22)}</td>
            <td>{r.issuedBy ?? "—"}</td>
            <td>
              {counts(r.summary)}
              {r.note ? <span className="block text-xs text-muted">{r.note}</span> : null}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

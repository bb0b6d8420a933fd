"use client";

import type { ImportPreview } from "@/lib/dto/import";

/** The check's verdict before anything is written: how many rows add, change or leave a fixture, and each change as old → new. */
export function ImportChanges({ preview }: { preview: ImportPreview }) {
  const { counts, changes, changedTotal } = preview;
  return (
    <div className="flex flex-col gap-2" data-testid="import-changes">
      <dl className="flex flex-wrap gap-2 text-sm" aria-label="What the import would do">
        {[
          ["New", counts.create, "import-count-new"],
          ["Changed", counts.update, "import-count-changed"],
          ["Unchanged", counts.unchanged, "import-count-unchanged"],
        ].map(([label, n, id]) => (
          <div key={id} className="rounded-md border border-line px-3 py-1">
            <dt className="text-xs text-muted">{label}</dt>
            <dd className="font-semibold tabular-nums" data-testid={id}>
              {n}
            </dd>
          </div>
        ))}
      </dl>
      {changes.length ? (
        <details open className="rounded-md border border-line">
          <summary className="cursor-pointer px-2 py-1 text-sm font-medium">
            Changes to existing fixtures ({changedTotal})
          </summary>
          <ul className="max-h-72 overflow-y-auto px-2 pb-2 text-sm" data-testid="import-change-list">
            {changes.map((c) => (
              <li
                key={`${c.row}-${c.position}-${c.unitNumber}`}
                className="border-t border-line/50 py-1"
                data-testid="import-change"
              >
                <span className="font-medium">
                  {c.position}, unit {c.unitNumber}
                </span>{" "}
                <span className="text-xs text-muted">(row {c.row})</span>
                <ul className="ml-4">
                  {c.fields.map((f) => (
                    <li key={f.field} data-testid={`import-change-${f.field}`}>
                      {f.header}: <span className="text-muted">{f.from}</span>
                      <span aria-hidden="true"> → </span>
                      <span className="sr-only"> becomes </span>
                      <span className="font-medium">{f.to}</span>
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
          {changedTotal > changes.length ? (
            <p className="px-2 pb-2 text-xs text-muted">
              …and {changedTotal - changes.length} more fixtures change; all of them are written on import.
            </p>
          ) : null}
        </details>
      ) : null}
    </div>
  );
}

"use client";

import type { ImportPreview } from "@/lib/dto/import";
import type { ColumnTarget, IMPORT_FIELDS } from "@/lib/io/fields";

/** The file's first rows under its own headers, with a field chooser above each column. */
export function ImportPreviewTable({
  preview,
  fields,
  onMap,
}: {
  preview: ImportPreview;
  fields: typeof IMPORT_FIELDS;
  onMap: (index: number, target: ColumnTarget) => void;
}) {
  return (
    <div className="overflow-x-auto rounded-md border border-line">
      <table className="text-xs" data-testid="import-preview">
        <thead className="bg-raised">
          <tr>
            {preview.headers.map((h, i) => (
              <th key={i} scope="col" className="border-b border-line px-2 py-1 text-left align-bottom">
                <span className="block font-semibold">{h}</span>
                <select
                  aria-label={`Field for column ${h}`}
                  className="mt-1 rounded border border-line bg-surface px-1 py-0.5 font-normal"
                  value={preview.mapping[i]}
                  onChange={(e) => onMap(i, e.target.value as ColumnTarget)}
                >
                  <option value="ignore">— leave out —</option>
                  {fields.map((f) => (
                    <option key={f.key} value={f.key}>
                      {f.header}
                    </option>
                  ))}
                </select>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {preview.sample.map((row, r) => (
            <tr key={r} className="border-b border-line/50">
              {preview.headers.map((_, c) => (
                <td
                  key={c}
                  className={`max-w-48 truncate px-2 py-0.5 ${preview.mapping[c] === "ignore" ? "text-muted line-through" : ""}`}
                >
                  {row[c]}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

import type { Box } from "@/lib/plot/label-placement";
import { symbolOutline } from "@/lib/plot/symbol";
import { KEY_HEAD_MM, KEY_ROW_MM } from "./paper";
import { clipText, type KeyEntry } from "./sheet-plan";

/** The key of the symbols in use: Throwline's symbol for each type hung, its name, cone range and count. */
export function SymbolKey({
  box,
  entries,
  columns,
  notes,
}: {
  box: Box;
  entries: KeyEntry[];
  columns: number;
  /** Lines under the entries (labels that found no room, say). */
  notes: string[];
}) {
  const colW = box.w / columns;
  const perColumn = Math.max(1, Math.ceil(entries.length / columns));
  const sym = 4.2;
  const total = entries.reduce((n, e) => n + e.count, 0);
  return (
    <g data-testid="symbol-key" fill="#000" stroke="none">
      <rect x={box.x} y={box.y} width={box.w} height={box.h} fill="none" stroke="#000" strokeWidth="0.35" />
      <text x={box.x + 2.5} y={box.y + 5} fontSize="3" fontWeight="600">
        Key of symbols ({total} unit{total === 1 ? "" : "s"})
      </text>
      {entries.length === 0 ? (
        <text x={box.x + 2.5} y={box.y + KEY_HEAD_MM + 4} fontSize="2.4" fill="#444">
          No units hung yet.
        </text>
      ) : null}
      {entries.map((e, i) => {
        const x = box.x + Math.floor(i / perColumn) * colW + 2.5;
        const y = box.y + KEY_HEAD_MM + (i % perColumn) * KEY_ROW_MM;
        const poly = symbolOutline(e.shape)
          .map(([a, b]) => `${(a * sym).toFixed(2)},${(b * sym).toFixed(2)}`)
          .join(" ");
        return (
          <g key={e.typeId} data-testid="key-entry">
            <polygon
              points={poly}
              transform={`translate(${x + sym / 2} ${y + sym / 2}) rotate(-90)`}
              fill="#fff"
              stroke="#000"
              strokeWidth="0.25"
            />
            <text x={x + sym + 2} y={y + 2} fontSize="2.5">
              {clipText(e.name, colW - sym - 16, 2.5)}
            </text>
            <text x={x + sym + 2} y={y + 5} fontSize="2" fill="#444">
              cone {e.cone}
            </text>
            <text x={x + colW - 5} y={y + 3.5} fontSize="2.6" textAnchor="end" data-testid="key-count">
              × {e.count}
            </text>
          </g>
        );
      })}
      {notes.map((n, i) => (
        <text key={n} x={box.x + 2.5} y={box.y + box.h - 2 - (notes.length - 1 - i) * 3} fontSize="2" fill="#444">
          {clipText(n, box.w - 5, 2)}
        </text>
      ))}
    </g>
  );
}

"use client";

import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { NumberingDirection } from "@/lib/plot/along-position";
import { symbolOutline, symbolShape } from "@/lib/plot/symbol";

/** The production's fixture types: drag one onto a position, or pick it and click a position. */
export function TypeShelf({
  types,
  armedTypeId,
  arm,
  direction,
  setDirection,
}: {
  types: FixtureTypeDto[];
  armedTypeId: number | null;
  arm: (id: number | null) => void;
  direction: NumberingDirection;
  setDirection: (d: NumberingDirection) => void;
}) {
  return (
    <aside
      className="no-print flex w-52 shrink-0 flex-col max-xl:h-[40%] max-xl:overflow-y-auto border-r border-line bg-surface"
      aria-label="Fixture types"
    >
      <h2 className="px-3 pt-3 text-xs font-semibold uppercase tracking-wide text-muted">Hang a unit</h2>
      <p className="px-3 pb-2 text-xs text-muted">Drag a type onto a position, or pick it and click the position.</p>
      <ul className="flex-1 overflow-y-auto px-2" data-testid="type-shelf">
        {types.map((t) => (
          <li key={t.id}>
            <button
              type="button"
              draggable
              onDragStart={(e) => {
                e.dataTransfer.setData("text/x-throwline-type", String(t.id));
                e.dataTransfer.effectAllowed = "copy";
              }}
              aria-pressed={armedTypeId === t.id}
              onClick={() => arm(armedTypeId === t.id ? null : t.id)}
              className="mb-1 flex w-full items-center gap-2 rounded-md border border-transparent px-2 py-1.5 text-left text-sm hover:bg-raised aria-pressed:border-accent aria-pressed:bg-raised"
            >
              <MiniSymbol family={t.family} />
              <span className="min-w-0 flex-1 truncate">{t.name}</span>
            </button>
          </li>
        ))}
        {!types.length ? (
          <li className="px-2 text-xs text-muted">No fixture types yet. Add them on the rig tab.</li>
        ) : null}
      </ul>
      <label className="flex flex-col gap-1 border-t border-line p-3 text-xs text-muted">
        Unit numbers run
        <select
          value={direction}
          onChange={(e) => setDirection(e.target.value as NumberingDirection)}
          className="rounded border border-line bg-surface px-1 py-1 text-sm text-ink"
        >
          <option value="from-stage-left">from stage left</option>
          <option value="from-stage-right">from stage right</option>
        </select>
      </label>
    </aside>
  );
}

function MiniSymbol({ family }: { family: string }) {
  const pts = symbolOutline(symbolShape(family))
    .map(([x, y]) => `${x * 18},${y * 18}`)
    .join(" ");
  return (
    <svg width="22" height="22" viewBox="-11 -11 22 22" aria-hidden className="shrink-0">
      <polygon points={pts} transform="rotate(90)" className="fill-surface stroke-ink" strokeWidth="1.2" />
      <line x1="0" y1="9" x2="0" y2="13" transform="" className="stroke-ink" strokeWidth="1.2" />
    </svg>
  );
}

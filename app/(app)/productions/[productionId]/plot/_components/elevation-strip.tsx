"use client";

import { formatLength, type Units } from "@/lib/optics";
import type { PositionDto } from "@/lib/dto/plan";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";

/** Side view of a boom or ladder: the deck, the top (trim) and each unit at its lens height. */
export function ElevationStrip({
  position,
  fixtures,
  units,
}: {
  position: PositionDto;
  fixtures: PlotFixture[];
  units: Units;
}) {
  const top = Math.max(position.trimHeight, ...fixtures.map((f) => f.computed.lensHeight), 1);
  const H = 180;
  const y = (m: number) => 10 + (H - 20) * (1 - m / top);
  return (
    <figure data-testid="elevation-strip" className="rounded-md border border-line p-2">
      <figcaption className="mb-1 text-xs text-muted">Elevation: units by lens height</figcaption>
      <svg width="100%" height={H} viewBox={`0 0 240 ${H}`} role="img" aria-label={`${position.name} elevation`}>
        <line x1="20" x2="220" y1={y(0)} y2={y(0)} className="stroke-muted" strokeWidth="2" />
        <line x1="60" x2="60" y1={y(0)} y2={y(position.trimHeight)} className="stroke-ink" strokeWidth="3" />
        <text x="66" y={y(position.trimHeight) + 4} className="fill-muted" fontSize="10">
          top {formatLength(position.trimHeight, units)}
        </text>
        {fixtures.map((f) => (
          <g key={f.id}>
            <rect
              x="46"
              y={y(f.computed.lensHeight) - 5}
              width="28"
              height="10"
              rx="2"
              className="fill-surface stroke-ink"
            />
            <text x="80" y={y(f.computed.lensHeight) + 4} fontSize="10" className="fill-ink">
              {f.unitNumber}
              {f.channel != null ? ` (${f.channel})` : ""} · {formatLength(f.computed.lensHeight, units)}
            </text>
          </g>
        ))}
        <text x="20" y={y(0) + 12} fontSize="10" className="fill-muted">
          deck
        </text>
      </svg>
    </figure>
  );
}

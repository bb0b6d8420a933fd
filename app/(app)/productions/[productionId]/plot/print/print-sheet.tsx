import type { ProductionDto } from "@/lib/dto/production";
import type { PlotData } from "@/lib/dto/plot";
import { stageOutline } from "@/lib/plot/stage-outline";
import { symbolOutline, symbolShape } from "@/lib/plot/symbol";
import type { Bounds } from "@/lib/plot/view";
import { MARGIN_MM, PAPERS, TITLE_MM, drawingArea, type PaperName } from "./paper";

type Pt = { x: number; y: number };

/** One landscape sheet as SVG in millimetres: the plan at a true scale, and Throwline's title block. */
export function PrintSheet({
  production,
  data,
  paper,
  scale,
  bounds,
}: {
  production: ProductionDto;
  data: PlotData;
  paper: PaperName;
  scale: { ratio: number; label: string };
  bounds: Bounds;
}) {
  const sheet = PAPERS[paper];
  const area = drawingArea(paper);
  const k = 1000 / scale.ratio; // mm on paper per metre on stage
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  const fits = (bounds.maxX - bounds.minX) * k <= area.w && (bounds.maxY - bounds.minY) * k <= area.h;
  // biome-ignore lint/correctness/noComponentHookFactories: X and Y are the sheet's coordinate maps (mm), not components
  const X = (p: Pt) => MARGIN_MM + area.w / 2 + (p.x - cx) * k;
  // biome-ignore lint/correctness/noComponentHookFactories: see X
  const Y = (p: Pt) => MARGIN_MM + area.h / 2 - (p.y - cy) * k;
  const pts = (list: Pt[]) => list.map((p) => `${X(p).toFixed(2)},${Y(p).toFixed(2)}`).join(" ");
  const o = stageOutline(production);
  const sym = Math.max(2.5, 0.45 * k);
  const date = new Date().toISOString().slice(0, 10);
  const tb = { x: MARGIN_MM, y: sheet.h - MARGIN_MM - TITLE_MM + 4, w: sheet.w - 2 * MARGIN_MM, h: TITLE_MM - 4 };
  return (
    <>
      <style>{`@page { size: ${sheet.w}mm ${sheet.h}mm; margin: 0 }`}</style>
      {!fits ? (
        <p className="no-print mb-2 text-sm text-caution">
          The plan does not fit this sheet at {scale.label}; the edges are cut off. Choose a larger sheet or a smaller
          scale.
        </p>
      ) : null}
      <svg
        role="img"
        aria-label="The printed plot"
        data-testid="print-sheet"
        width={`${sheet.w}mm`}
        height={`${sheet.h}mm`}
        viewBox={`0 0 ${sheet.w} ${sheet.h}`}
        className="bg-white text-black"
        fontFamily="IBM Plex Sans, sans-serif"
      >
        <clipPath id="drawing">
          <rect x={MARGIN_MM} y={MARGIN_MM} width={area.w} height={area.h} />
        </clipPath>
        <rect x={MARGIN_MM} y={MARGIN_MM} width={area.w} height={area.h} fill="none" stroke="#000" strokeWidth="0.35" />
        <g clipPath="url(#drawing)" fill="none" stroke="#000">
          <polygon points={pts(o.deck)} strokeWidth="0.35" />
          {o.apron.length ? <polygon points={pts(o.apron)} strokeWidth="0.35" /> : null}
          <polygon points={pts(o.prosceniumLeft)} fill="#999" stroke="none" />
          <polygon points={pts(o.prosceniumRight)} fill="#999" stroke="none" />
          <polyline points={pts(o.backWall)} strokeWidth="0.7" />
          <polyline points={pts(o.centreLine)} strokeWidth="0.2" strokeDasharray="4 1 1 1" />
          <polyline points={pts(o.datumLine)} strokeWidth="0.2" strokeDasharray="2 1" />
          {data.areaZones.map((z) => (
            <polygon key={z.id} points={pts(z.polygon)} strokeWidth="0.2" strokeDasharray="1 1" />
          ))}
          {data.positions.map((p) => (
            <g key={p.id}>
              {p.x2 != null && p.y2 != null ? (
                <polyline
                  points={pts([
                    { x: p.x1, y: p.y1 },
                    { x: p.x2, y: p.y2 },
                  ])}
                  strokeWidth="0.6"
                />
              ) : (
                <circle cx={X({ x: p.x1, y: p.y1 })} cy={Y({ x: p.x1, y: p.y1 })} r="1.5" strokeWidth="0.4" />
              )}
              <text
                x={X({ x: Math.min(p.x1, p.x2 ?? p.x1), y: p.y1 }) - 2}
                y={Y({ x: p.x1, y: p.y1 }) + 1}
                fontSize="2.6"
                textAnchor="end"
                fill="#000"
                stroke="none"
              >
                {p.name}
              </text>
            </g>
          ))}
          {data.fixtures.map((f) => {
            const ang = f.computed.panDeg == null ? 90 : -f.computed.panDeg;
            const poly = symbolOutline(symbolShape(f.family))
              .map(([a, b]) => `${(a * sym).toFixed(2)},${(b * sym).toFixed(2)}`)
              .join(" ");
            return (
              <g key={f.id} transform={`translate(${X(f).toFixed(2)} ${Y(f).toFixed(2)})`}>
                <polygon points={poly} transform={`rotate(${ang.toFixed(1)})`} fill="#fff" strokeWidth="0.25" />
                {f.channel != null ? (
                  <text
                    fontSize={Math.min(2.4, sym * 0.45)}
                    textAnchor="middle"
                    dominantBaseline="central"
                    fill="#000"
                    stroke="none"
                  >
                    {f.channel}
                  </text>
                ) : null}
              </g>
            );
          })}
        </g>
        <g data-testid="title-block" fontSize="3" fill="#000">
          <rect x={tb.x} y={tb.y} width={tb.w} height={tb.h} fill="none" stroke="#000" strokeWidth="0.5" />
          <line
            x1={tb.x + tb.w * 0.45}
            y1={tb.y}
            x2={tb.x + tb.w * 0.45}
            y2={tb.y + tb.h}
            stroke="#000"
            strokeWidth="0.25"
          />
          <text x={tb.x + 4} y={tb.y + 8} fontSize="6" fontWeight="600">
            {production.name}
          </text>
          <text x={tb.x + 4} y={tb.y + 14}>
            {production.venue || "Venue not set"} · light plot
          </text>
          <text x={tb.x + 4} y={tb.y + 20} fontSize="2.4">
            Planning drawing. Check dimensions on site; hanging loads follow the venue&apos;s ratings and a qualified
            person.
          </text>
          {[
            ["Revision", "—"],
            ["Date", date],
            ["Scale", `${scale.label} on ${PAPERS[paper].label}`],
            ["Datum", `${production.datumName} (y = 0), centre line x = 0`],
          ].map(([k2, v], i) => (
            <text key={k2} x={tb.x + tb.w * 0.45 + 4 + (i % 2) * (tb.w * 0.27)} y={tb.y + 8 + Math.floor(i / 2) * 9}>
              <tspan fontSize="2.2" fill="#555">
                {k2.toUpperCase()}{" "}
              </tspan>
              {v}
            </text>
          ))}
          <ScaleRule x={tb.x + tb.w - 60} y={tb.y + tb.h - 4} k={k} units={production.displayUnits} />
        </g>
      </svg>
    </>
  );
}

function ScaleRule({ x, y, k, units }: { x: number; y: number; k: number; units: "metric" | "imperial" }) {
  const unit = units === "metric" ? 1 : 0.3048 * 5; // 1 m, or 5 ft, per segment
  const seg = unit * k;
  const n = Math.max(1, Math.min(5, Math.floor(50 / seg)));
  return (
    <g>
      {Array.from({ length: n }, (_, i) => (
        <rect
          key={i}
          x={x + i * seg}
          y={y - 1.5}
          width={seg}
          height="1.5"
          fill={i % 2 ? "#fff" : "#000"}
          stroke="#000"
          strokeWidth="0.2"
        />
      ))}
      <text x={x} y={y - 2.5} fontSize="2.2">
        0
      </text>
      <text x={x + n * seg} y={y - 2.5} fontSize="2.2" textAnchor="end">
        {units === "metric" ? `${n} m` : `${n * 5} ft`}
      </text>
    </g>
  );
}

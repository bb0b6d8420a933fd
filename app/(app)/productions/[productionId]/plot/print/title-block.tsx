import type { Box } from "@/lib/plot/label-placement";
import { STACK_BELOW_MM } from "./paper";
import { clipText } from "./sheet-plan";

export type TitleFields = {
  production: string;
  venue: string;
  designer: string;
  date: string;
  /** The latest issued revision's label; null until one is issued (the block then shows a dash). */
  revision: string | null;
  scale: string;
  paper: string;
  datum: string;
};

const SCALE_CELL_MM = 66;

/**
 * The sheet's title block along its foot: what and where on the left, the particulars in a grid, and the
 * scale bar in a cell of its own so it never sits on other text.
 */
export function TitleBlock({
  box,
  fields,
  k,
  units,
}: {
  box: Box;
  fields: TitleFields;
  k: number;
  units: "metric" | "imperial";
}) {
  // On a wide sheet: name | particulars (3 × 2) | scale bar. On a narrow one: name | scale bar, then the
  // particulars in a band of their own below, so no value is cut short.
  const stacked = box.w < STACK_BELOW_MM;
  const topH = stacked ? 20 : box.h;
  const nameW = stacked ? box.w - SCALE_CELL_MM : box.w * 0.36;
  const gridX = stacked ? box.x : box.x + nameW;
  const gridY = stacked ? box.y + topH : box.y;
  const gridW = stacked ? box.w : box.w - nameW - SCALE_CELL_MM;
  const colW = gridW / 3;
  const rowH = (box.h - (stacked ? topH : 0)) / 2;
  const scaleX = box.x + box.w - SCALE_CELL_MM;
  const cells: Array<[string, string]> = [
    ["Designer", fields.designer || "—"],
    ["Date", fields.date],
    ["Revision", fields.revision ?? "—"],
    ["Scale", fields.scale],
    ["Paper", fields.paper],
    ["Datum", fields.datum],
  ];
  return (
    <g data-testid="title-block" fill="#000" stroke="none">
      <rect x={box.x} y={box.y} width={box.w} height={box.h} fill="none" stroke="#000" strokeWidth="0.5" />
      {stacked ? (
        <line x1={box.x} y1={gridY} x2={box.x + box.w} y2={gridY} stroke="#000" strokeWidth="0.25" />
      ) : (
        <line x1={gridX} y1={box.y} x2={gridX} y2={box.y + box.h} stroke="#000" strokeWidth="0.25" />
      )}
      <line x1={scaleX} y1={box.y} x2={scaleX} y2={box.y + topH} stroke="#000" strokeWidth="0.25" />
      <line x1={gridX} y1={gridY + rowH} x2={gridX + gridW} y2={gridY + rowH} stroke="#000" strokeWidth="0.15" />
      {[1, 2].map((i) => (
        <line
          key={i}
          x1={gridX + i * colW}
          y1={gridY}
          x2={gridX + i * colW}
          y2={gridY + 2 * rowH}
          stroke="#000"
          strokeWidth="0.15"
        />
      ))}
      <text
        x={box.x + 3}
        y={box.y + (stacked ? 7.5 : 8)}
        fontSize="5.5"
        fontWeight="600"
        data-testid="title-production"
      >
        {clipText(fields.production, nameW - 6, 5.5)}
      </text>
      <text x={box.x + 3} y={box.y + (stacked ? 12 : 14)} fontSize="3">
        {clipText(`${fields.venue || "Venue not set"} · light plot`, nameW - 6, 3)}
      </text>
      <text x={box.x + 3} y={box.y + (stacked ? 15.5 : 20)} fontSize="2.1">
        {clipText("Planning drawing: check dimensions on site. Rigging, hanging loads and electrics", nameW - 6, 2.1)}
      </text>
      <text x={box.x + 3} y={box.y + (stacked ? 18.5 : 23.5)} fontSize="2.1">
        {clipText("follow local codes, the venue's ratings and a qualified person.", nameW - 6, 2.1)}
      </text>
      {cells.map(([label, value], i) => {
        const x = gridX + (i % 3) * colW + 2;
        const y = gridY + Math.floor(i / 3) * rowH;
        return (
          <g key={label} data-testid={`title-${label.toLowerCase()}`}>
            <text x={x} y={y + 4} fontSize="2" fill="#444">
              {label.toUpperCase()}
            </text>
            <text x={x} y={y + Math.min(10, rowH - 2)} fontSize="3.2">
              {clipText(value, colW - 4, 3.2)}
            </text>
          </g>
        );
      })}
      <text x={scaleX + 3} y={box.y + 4} fontSize="2" fill="#444">
        SCALE BAR
      </text>
      <ScaleRule x={scaleX + 5} y={box.y + Math.min(17, topH - 4)} k={k} units={units} maxMm={SCALE_CELL_MM - 12} />
    </g>
  );
}

function ScaleRule({
  x,
  y,
  k,
  units,
  maxMm,
}: {
  x: number;
  y: number;
  k: number;
  units: "metric" | "imperial";
  maxMm: number;
}) {
  const unit = units === "metric" ? 1 : 0.3048 * 5; // 1 m, or 5 ft, per segment
  const seg = unit * k;
  const n = Math.max(1, Math.min(5, Math.floor(maxMm / seg)));
  return (
    <g data-testid="scale-bar">
      {Array.from({ length: n }, (_, i) => (
        <rect
          key={i}
          x={x + i * seg}
          y={y}
          width={seg}
          height="1.6"
          fill={i % 2 ? "#fff" : "#000"}
          stroke="#000"
          strokeWidth="0.2"
        />
      ))}
      <text x={x} y={y - 1.5} fontSize="2.2" textAnchor="middle">
        0
      </text>
      <text x={x + n * seg} y={y - 1.5} fontSize="2.2" textAnchor="middle">
        {units === "metric" ? `${n} m` : `${n * 5} ft`}
      </text>
    </g>
  );
}

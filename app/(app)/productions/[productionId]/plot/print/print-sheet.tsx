import type { ProductionDto } from "@/lib/dto/production";
import type { PlotData } from "@/lib/dto/plot";
import type { Point } from "@/lib/optics";
import { leaderEnd } from "@/lib/plot/label-placement";
import { stageOutline } from "@/lib/plot/stage-outline";
import { symbolOutline } from "@/lib/plot/symbol";
import type { Bounds } from "@/lib/plot/view";
import type { SheetLayout } from "./paper";
import { boxAround, LABEL_FONT_MM, type KeyEntry, sheetLabels, sheetMap, sheetUnits, symbolMm } from "./sheet-plan";
import { SymbolKey } from "./symbol-key";
import { TitleBlock, type TitleFields } from "./title-block";

/**
 * One sheet as SVG in millimetres: the plan at a true scale with its labels placed clear of each other
 * and of the units, the key of symbols in use, and Throwline's title block. On screen the sheet shrinks
 * to the window's width; on paper it is exactly the sheet's size.
 */
export function PrintSheet({
  production,
  data,
  layout,
  scale,
  bounds,
  keyEntries,
  title,
}: {
  production: ProductionDto;
  data: PlotData;
  layout: SheetLayout;
  scale: { ratio: number; label: string };
  bounds: Bounds;
  keyEntries: KeyEntry[];
  title: TitleFields;
}) {
  const { sheet, drawing } = layout;
  const k = 1000 / scale.ratio; // mm on paper per metre on stage
  const fits = (bounds.maxX - bounds.minX) * k <= drawing.w && (bounds.maxY - bounds.minY) * k <= drawing.h;
  const toSheet = sheetMap(drawing, bounds, k);
  const pts = (list: Point[]) =>
    list
      .map(toSheet)
      .map((p) => `${p.x.toFixed(2)},${p.y.toFixed(2)}`)
      .join(" ");
  const o = stageOutline(production);
  const sym = symbolMm(k);
  const units = sheetUnits(data, toSheet, sym);
  const { labels, unplaced } = sheetLabels(
    data,
    toSheet,
    units,
    sym,
    drawing,
    [
      { text: "CL", a: toSheet(o.centreLine[1]), b: toSheet(o.centreLine[0]) },
      { text: production.datumName, a: toSheet(o.datumLine[0]), b: toSheet(o.datumLine[1]) },
    ],
    [boxAround(o.prosceniumLeft.map(toSheet)), boxAround(o.prosceniumRight.map(toSheet))],
  );
  const notes = unplaced.length ? [`No room on the plan to label: ${unplaced.join(", ")}`] : [];
  return (
    <>
      <style>{`@page { size: ${sheet.w}mm ${sheet.h}mm; margin: 0 }
@media print { svg[data-testid="print-sheet"] { width: ${sheet.w}mm !important; height: ${sheet.h}mm !important; max-width: none !important; } }`}</style>
      {!fits ? (
        <p className="no-print mb-2 text-sm text-caution" role="status">
          The plan does not fit this sheet at {scale.label}; the edges are cut off. Choose a larger sheet or a smaller
          scale.
        </p>
      ) : null}
      <svg
        role="img"
        aria-label="The printed plot"
        data-testid="print-sheet"
        viewBox={`0 0 ${sheet.w} ${sheet.h}`}
        style={{ width: "100%", maxWidth: `${sheet.w}mm`, height: "auto", display: "block" }}
        className="bg-white text-black shadow print:shadow-none"
        fontFamily="IBM Plex Sans, sans-serif"
      >
        <clipPath id="drawing">
          <rect x={drawing.x} y={drawing.y} width={drawing.w} height={drawing.h} />
        </clipPath>
        <rect
          x={drawing.x}
          y={drawing.y}
          width={drawing.w}
          height={drawing.h}
          fill="none"
          stroke="#000"
          strokeWidth="0.35"
        />
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
          {data.positions.map((p) => {
            const a = toSheet({ x: p.x1, y: p.y1 });
            return p.x2 != null && p.y2 != null ? (
              <polyline
                key={p.id}
                points={pts([
                  { x: p.x1, y: p.y1 },
                  { x: p.x2, y: p.y2 },
                ])}
                strokeWidth="0.6"
              />
            ) : (
              <circle key={p.id} cx={a.x} cy={a.y} r="1.2" strokeWidth="0.4" />
            );
          })}
          {units.map((u) => {
            const poly = symbolOutline(u.shape)
              .map(([a, b]) => `${(a * sym).toFixed(2)},${(b * sym).toFixed(2)}`)
              .join(" ");
            return (
              <g key={u.id} transform={`translate(${u.at.x.toFixed(2)} ${u.at.y.toFixed(2)})`} data-testid="sheet-unit">
                <polygon points={poly} transform={`rotate(${u.angleDeg.toFixed(1)})`} fill="#fff" strokeWidth="0.25" />
                {u.channel != null ? (
                  <text
                    fontSize={Math.min(2.4, sym * 0.45)}
                    textAnchor="middle"
                    dominantBaseline="central"
                    fill="#000"
                    stroke="none"
                  >
                    {u.channel}
                  </text>
                ) : null}
              </g>
            );
          })}
          {labels.map((l) => {
            const end = leaderEnd(l.box, l.anchor);
            const font = l.kind === "line" ? LABEL_FONT_MM * 0.85 : LABEL_FONT_MM;
            return (
              <g key={l.id} data-testid="sheet-label" data-box={`${l.box.x},${l.box.y},${l.box.w},${l.box.h}`}>
                {l.leader ? (
                  <line x1={l.anchor.x} y1={l.anchor.y} x2={end.x} y2={end.y} stroke="#000" strokeWidth="0.15" />
                ) : null}
                <text
                  x={l.box.x}
                  y={l.box.y + l.box.h * 0.78}
                  fontSize={font}
                  fontStyle={l.kind === "line" ? "italic" : undefined}
                  fill="#000"
                  stroke="none"
                >
                  {l.text}
                </text>
              </g>
            );
          })}
        </g>
        <SymbolKey box={layout.key} entries={keyEntries} columns={layout.keyColumns} notes={notes} />
        <TitleBlock box={layout.title} fields={title} k={k} units={production.displayUnits} />
      </svg>
    </>
  );
}

// Drawing the coverage study on the plan: the heat map as one image stretched over the grid's cells,
// contour lines, the lit units, the line being profiled and the dark spot of the chosen area.
import type { Ctx } from "@/components/plot/draw-stage";
import type { PlotPalette } from "@/components/plot/palette";
import { planToScreen, type View } from "@/lib/plot/view";
import type { GridCells, Point } from "@/lib/optics";
import { contourSegments } from "@/lib/studies/contours";
import { heatPixels } from "@/lib/studies/heat-colours";

/** One pixel a cell, made once per grid; the canvas scales it to the view. */
export function heatImage(
  g: GridCells,
  values: ArrayLike<number>,
  scaleMax: number,
  mode: "light" | "difference",
): HTMLCanvasElement {
  const c = document.createElement("canvas");
  c.width = g.cols;
  c.height = g.rows;
  const px = heatPixels(values, g.cols, g.rows, scaleMax, mode);
  c.getContext("2d")!.putImageData(new ImageData(px as Uint8ClampedArray<ArrayBuffer>, g.cols, g.rows), 0, 0);
  return c;
}

export function drawHeat(ctx: Ctx, v: View, g: GridCells, img: HTMLCanvasElement) {
  const half = g.resolution / 2;
  const tl = planToScreen(v, { x: g.originX - half, y: g.originY + (g.rows - 1) * g.resolution + half });
  const br = planToScreen(v, { x: g.originX + (g.cols - 1) * g.resolution + half, y: g.originY - half });
  ctx.save();
  ctx.imageSmoothingEnabled = true;
  ctx.drawImage(img, tl.x, tl.y, br.x - tl.x, br.y - tl.y);
  ctx.restore();
}

export function drawContours(
  ctx: Ctx,
  v: View,
  g: GridCells,
  values: ArrayLike<number>,
  levels: number[],
  pal: PlotPalette,
) {
  ctx.save();
  ctx.strokeStyle = pal.dark ? "rgba(255,255,255,0.75)" : "rgba(20,20,20,0.7)";
  ctx.lineWidth = 1;
  for (const level of levels) {
    ctx.beginPath();
    for (const [a, b] of contourSegments(g, level, values)) {
      const s = planToScreen(v, a);
      const e = planToScreen(v, b);
      ctx.moveTo(s.x, s.y);
      ctx.lineTo(e.x, e.y);
    }
    ctx.stroke();
  }
  ctx.restore();
}

export function drawUnits(
  ctx: Ctx,
  v: View,
  units: Array<{ source: Point }>,
  pal: PlotPalette,
  highlight: ReadonlySet<number> = new Set(),
) {
  ctx.save();
  units.forEach((u, k) => {
    const s = planToScreen(v, u.source);
    ctx.beginPath();
    ctx.arc(s.x, s.y, highlight.has(k) ? 5 : 2.5, 0, 2 * Math.PI);
    ctx.fillStyle = highlight.has(k) ? pal.selection : pal.muted;
    ctx.fill();
  });
  ctx.restore();
}

export function drawLine(ctx: Ctx, v: View, a: Point, b: Point, pal: PlotPalette) {
  const s = planToScreen(v, a);
  const e = planToScreen(v, b);
  ctx.save();
  ctx.strokeStyle = pal.selection;
  ctx.lineWidth = 2;
  ctx.setLineDash([6, 4]);
  ctx.beginPath();
  ctx.moveTo(s.x, s.y);
  ctx.lineTo(e.x, e.y);
  ctx.stroke();
  ctx.restore();
}

/** The chosen area's dark spot, and thin lines to the units that light it. */
export function drawDarkSpot(ctx: Ctx, v: View, spot: Point, sources: Point[], pal: PlotPalette) {
  const s = planToScreen(v, spot);
  ctx.save();
  ctx.strokeStyle = pal.selection;
  ctx.lineWidth = 1;
  for (const src of sources) {
    const q = planToScreen(v, src);
    ctx.beginPath();
    ctx.moveTo(s.x, s.y);
    ctx.lineTo(q.x, q.y);
    ctx.stroke();
  }
  ctx.lineWidth = 2.5;
  ctx.strokeStyle = pal.danger;
  ctx.beginPath();
  ctx.arc(s.x, s.y, 8, 0, 2 * Math.PI);
  ctx.stroke();
  ctx.restore();
}

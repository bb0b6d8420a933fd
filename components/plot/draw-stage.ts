// Canvas drawing of the static plan: grid, stage outline, acting areas, landmarks, positions.
// Plain 2D-context code called from Konva shapes' sceneFunc (one shape per kind keeps the node count low).
import type { Point } from "@/lib/optics";
import { gridLines, gridStep } from "@/lib/plot/grid";
import type { StageOutline } from "@/lib/plot/stage-outline";
import { planToScreen, visiblePlanBounds, type View } from "@/lib/plot/view";
import type { PlotPalette } from "./palette";
import { fillTextOnBacking } from "./label-backing";
import { planPath } from "./plan-paths";

export type Ctx = CanvasRenderingContext2D;
export type Size = { width: number; height: number };

export function drawGrid(ctx: Ctx, v: View, size: Size, units: "metric" | "imperial", pal: PlotPalette) {
  const step = gridStep(v.scale, units);
  const major = step * (units === "metric" ? (step < 1 ? 1 / step : 5) : 5);
  const b = visiblePlanBounds(v, size);
  ctx.lineWidth = 1;
  for (const [lines, isX] of [
    [gridLines(b.minX, b.maxX, step), true],
    [gridLines(b.minY, b.maxY, step), false],
  ] as const) {
    for (const m of lines) {
      const isMajor = Math.abs(m / major - Math.round(m / major)) < 1e-6;
      ctx.strokeStyle = isMajor ? pal.gridMajor : pal.grid;
      ctx.beginPath();
      if (isX) {
        const x = Math.round(v.ox + v.scale * m) + 0.5;
        ctx.moveTo(x, 0);
        ctx.lineTo(x, size.height);
      } else {
        const y = Math.round(v.oy - v.scale * m) + 0.5;
        ctx.moveTo(0, y);
        ctx.lineTo(size.width, y);
      }
      ctx.stroke();
    }
  }
}

export function drawStageOutline(ctx: Ctx, v: View, o: StageOutline, pal: PlotPalette, labels: boolean) {
  ctx.fillStyle = pal.deck;
  ctx.strokeStyle = pal.muted;
  ctx.lineWidth = 1.5;
  for (const poly of [o.deck, o.apron]) {
    if (!poly.length) continue;
    ctx.beginPath();
    planPath(ctx, v, poly);
    ctx.globalAlpha = 0.55; // the groundplan underneath must show through the deck
    ctx.fill();
    ctx.globalAlpha = 1;
    ctx.stroke();
  }
  ctx.fillStyle = pal.muted;
  for (const wall of [o.prosceniumLeft, o.prosceniumRight]) {
    ctx.beginPath();
    planPath(ctx, v, wall);
    ctx.fill();
  }
  ctx.strokeStyle = pal.ink;
  ctx.lineWidth = 3;
  ctx.beginPath();
  planPath(ctx, v, o.backWall, false);
  ctx.stroke();
  ctx.lineWidth = 1;
  ctx.setLineDash([10, 4, 2, 4]); // centre line: long dash, dot
  ctx.strokeStyle = pal.muted;
  ctx.beginPath();
  planPath(ctx, v, o.centreLine, false);
  ctx.stroke();
  ctx.setLineDash([6, 4]);
  ctx.beginPath();
  planPath(ctx, v, o.datumLine, false);
  ctx.stroke();
  ctx.setLineDash([]);
  if (!labels) return;
  ctx.fillStyle = pal.muted;
  ctx.font = "11px 'IBM Plex Sans', system-ui, sans-serif";
  const d = planToScreen(v, o.datumLine[0]);
  ctx.textAlign = "left";
  ctx.textBaseline = "bottom";
  ctx.fillText(o.datumName, d.x + 4, d.y - 3);
  const c = planToScreen(v, o.centreLine[1]);
  ctx.textAlign = "center";
  ctx.fillText("CL", c.x, c.y - 4);
  const bw = planToScreen(v, o.backWall[1]);
  ctx.textAlign = "right";
  ctx.fillText("back wall", bw.x - 4, bw.y - 4);
  const aud = planToScreen(v, { x: 0, y: o.apron.length ? o.apron[2].y : 0 });
  ctx.textAlign = "center";
  ctx.textBaseline = "top";
  ctx.fillText("AUDIENCE", aud.x, aud.y + 22);
}

/** Small squares on the points a designer can drag (acting-area corners, landmark ends). */
function handles(ctx: Ctx, v: View, pts: Point[], colour: string) {
  ctx.fillStyle = colour;
  for (const p of pts) {
    const s = planToScreen(v, p);
    ctx.fillRect(s.x - 2.5, s.y - 2.5, 5, 5);
  }
}

export function drawAreas(
  ctx: Ctx,
  v: View,
  zones: Array<{ name: string; polygon: Point[] }>,
  pal: PlotPalette,
  labels: boolean,
  editable = false,
) {
  ctx.lineWidth = 1;
  for (const z of zones) {
    if (editable) handles(ctx, v, z.polygon, pal.success);
    ctx.beginPath();
    planPath(ctx, v, z.polygon);
    ctx.fillStyle = pal.area;
    ctx.fill();
    ctx.strokeStyle = pal.success;
    ctx.setLineDash([3, 3]);
    ctx.stroke();
    ctx.setLineDash([]);
    if (labels) {
      const c = z.polygon.reduce((a, p) => ({ x: a.x + p.x / z.polygon.length, y: a.y + p.y / z.polygon.length }), {
        x: 0,
        y: 0,
      });
      const s = planToScreen(v, c);
      ctx.fillStyle = pal.success;
      ctx.font = "italic 12px 'IBM Plex Sans', system-ui, sans-serif";
      ctx.textAlign = "center";
      ctx.textBaseline = "middle";
      fillTextOnBacking(ctx, z.name, s.x, s.y, pal);
    }
  }
}

export function drawLandmarks(
  ctx: Ctx,
  v: View,
  marks: Array<{ name: string; x1: number; y1: number; x2: number; y2: number }>,
  pal: PlotPalette,
  labels: boolean,
  editable = false,
) {
  ctx.strokeStyle = pal.caution;
  ctx.fillStyle = pal.caution;
  ctx.lineWidth = 1.25;
  ctx.font = "11px 'IBM Plex Sans', system-ui, sans-serif";
  for (const l of marks) {
    const a = planToScreen(v, { x: l.x1, y: l.y1 });
    const b = planToScreen(v, { x: l.x2, y: l.y2 });
    ctx.setLineDash([2, 3]);
    ctx.beginPath();
    ctx.moveTo(a.x, a.y);
    ctx.lineTo(b.x, b.y);
    ctx.stroke();
    ctx.setLineDash([]);
    if (editable)
      handles(
        ctx,
        v,
        [
          { x: l.x1, y: l.y1 },
          { x: l.x2, y: l.y2 },
        ],
        pal.caution,
      );
    if (labels) {
      ctx.textAlign = "left";
      ctx.textBaseline = "bottom";
      fillTextOnBacking(ctx, l.name, b.x + 4, b.y - 2, pal);
    }
  }
}

type PositionShape = { id: number; name: string; x1: number; y1: number; x2: number | null; y2: number | null };

export function drawPositions(
  ctx: Ctx,
  v: View,
  positions: PositionShape[],
  pal: PlotPalette,
  labels: boolean,
  selected: ReadonlySet<number>,
) {
  ctx.font = "600 11px 'IBM Plex Sans', system-ui, sans-serif";
  for (const p of positions) {
    const isSel = selected.has(p.id);
    ctx.strokeStyle = isSel ? pal.selection : pal.ink;
    ctx.fillStyle = isSel ? pal.selection : pal.ink;
    const a = planToScreen(v, { x: p.x1, y: p.y1 });
    if (p.x2 != null && p.y2 != null) {
      const b = planToScreen(v, { x: p.x2, y: p.y2 });
      ctx.lineWidth = isSel ? 4 : 2.5;
      ctx.beginPath();
      ctx.moveTo(a.x, a.y);
      ctx.lineTo(b.x, b.y);
      ctx.stroke();
      // end ticks mark the pipe ends
      for (const e of [a, b]) ctx.fillRect(e.x - 2, e.y - 4, 4, 8);
      if (labels) {
        ctx.textAlign = "right";
        ctx.textBaseline = "middle";
        const left = a.x < b.x ? a : b;
        ctx.fillText(p.name, left.x - 8, left.y);
      }
    } else {
      // a vertical position: a small ring with a cross, our own mark for "hangs at a point"
      ctx.lineWidth = isSel ? 3 : 2;
      ctx.beginPath();
      ctx.arc(a.x, a.y, 7, 0, Math.PI * 2);
      ctx.stroke();
      ctx.beginPath();
      ctx.moveTo(a.x - 4, a.y);
      ctx.lineTo(a.x + 4, a.y);
      ctx.moveTo(a.x, a.y - 4);
      ctx.lineTo(a.x, a.y + 4);
      ctx.stroke();
      if (labels) {
        ctx.textAlign = p.x1 >= 0 ? "left" : "right";
        ctx.textBaseline = "middle";
        ctx.fillText(p.name, a.x + (p.x1 >= 0 ? 11 : -11), a.y - 12);
      }
    }
  }
}

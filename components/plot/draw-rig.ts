// Canvas drawing of the rig: pools (outer, 50 % and core, with the soft band shaded and shutter cuts
// clipping them), fixture symbols of Throwline's own design, focus marks and named focus points.
import { clipPoolByCuts, ellipseToPolygon, type Ellipse, type PlanePool, type Point } from "@/lib/optics";
import { symbolOutline, symbolPixels, symbolScreenPoint, labelsFit, type SymbolShape } from "@/lib/plot/symbol";
import { planToScreen, type Bounds, type View } from "@/lib/plot/view";
import { fillTextOnBacking } from "./label-backing";
import type { PlotPalette } from "./palette";
import type { Ctx } from "./draw-stage";
import { diamondPath, planPath, strokeSegment } from "./plan-paths";

export type RigItem = {
  id: number;
  x: number;
  y: number;
  shape: SymbolShape;
  channel: number | null;
  unitNumber: string;
  panDeg: number | null;
  mark: Point | null;
  pool: PlanePool | null;
  cuts: Array<{ a: Point; b: Point }>;
  /** Units sharing one plan point (a boom) are fanned out on screen: index and direction (±1 in x). */
  stack: { index: number; dir: number };
};

function ellipsePath(ctx: Ctx, v: View, e: Ellipse) {
  const c = planToScreen(v, e.centre);
  ctx.ellipse(
    c.x,
    c.y,
    Math.max(0.5, e.semiMajor * v.scale),
    Math.max(0.5, e.semiMinor * v.scale),
    (-e.rotationDeg * Math.PI) / 180,
    0,
    Math.PI * 2,
  );
}

export function intersects(b: Bounds, e: Ellipse) {
  const r = e.semiMajor;
  return e.centre.x + r >= b.minX && e.centre.x - r <= b.maxX && e.centre.y + r >= b.minY && e.centre.y - r <= b.maxY;
}

/** One pool: outer and core filled (their overlap reads as the bright core, the ring as the soft band), 50 % edge dashed. */
/** Adds one pool ellipse to the current path: as an ellipse, or as the polygon its shutter cuts leave. */
export function addPoolPath(ctx: Ctx, v: View, e: Ellipse, cuts: RigItem["cuts"] | null, mark: Point | null) {
  if (cuts && mark) {
    let poly: Point[] = [];
    try {
      poly = clipPoolByCuts(e, cuts, mark);
    } catch {
      poly = ellipseToPolygon(e, 48); // a mark on a cut line: draw the uncut pool rather than nothing
    }
    if (poly.length) planPath(ctx, v, poly);
  } else {
    const c = planToScreen(v, e.centre);
    ctx.moveTo(
      c.x + Math.max(0.5, e.semiMajor * v.scale) * Math.cos((-e.rotationDeg * Math.PI) / 180),
      c.y + Math.max(0.5, e.semiMajor * v.scale) * Math.sin((-e.rotationDeg * Math.PI) / 180),
    );
    ellipsePath(ctx, v, e);
    ctx.closePath();
  }
}

export function drawPool(
  ctx: Ctx,
  v: View,
  item: Pick<RigItem, "pool" | "cuts" | "mark">,
  pal: PlotPalette,
  strong = false,
) {
  const pool = item.pool;
  if (!pool || pool.status !== "ok" || !pool.outer) return;
  const cuts = item.cuts.length && item.mark ? item.cuts : null;
  const shape = (e: Ellipse) => {
    ctx.beginPath();
    addPoolPath(ctx, v, e, cuts, item.mark);
  };
  ctx.fillStyle = strong ? pal.poolOuterStrong : pal.poolOuter;
  shape(pool.outer);
  ctx.fill();
  if (pool.core) {
    ctx.fillStyle = strong ? pal.poolCoreStrong : pal.poolCore;
    shape(pool.core);
    ctx.fill();
  }
  if (pool.half) {
    ctx.strokeStyle = pal.poolEdge;
    ctx.globalAlpha = strong ? 1 : 0.5;
    ctx.lineWidth = strong ? 1.5 : 0.75;
    ctx.setLineDash(strong ? [5, 3] : [3, 3]);
    shape(pool.half);
    ctx.stroke();
    ctx.setLineDash([]);
    ctx.globalAlpha = 1;
  }
  if (strong) {
    ctx.strokeStyle = pal.poolEdge;
    ctx.lineWidth = 1;
    shape(pool.outer);
    ctx.stroke();
  }
  if (cuts) {
    ctx.strokeStyle = pal.danger;
    ctx.lineWidth = 1.25;
    for (const c of cuts) strokeSegment(ctx, planToScreen(v, c.a), planToScreen(v, c.b));
  }
}

const PATHS = new Map<SymbolShape, Path2D>();
function unitPath(shape: SymbolShape): Path2D {
  let p = PATHS.get(shape);
  if (!p) {
    p = new Path2D();
    for (const [i, [x, y]] of symbolOutline(shape).entries()) {
      if (i === 0) p.moveTo(x, y);
      else p.lineTo(x, y);
    }
    p.closePath();
    PATHS.set(shape, p);
  }
  return p;
}

type FixtureDrawOptions = {
  labels: boolean;
  selected: ReadonlySet<number>;
  visible: { width: number; height: number };
};

export function drawFixtures(ctx: Ctx, v: View, items: RigItem[], pal: PlotPalette, o: FixtureDrawOptions) {
  const px = symbolPixels(v.scale);
  const withText = o.labels && labelsFit(px);
  const margin = px * 4;
  ctx.font = `600 ${Math.round(Math.min(14, px * 0.42))}px 'IBM Plex Sans', system-ui, sans-serif`;
  ctx.textAlign = "center";
  ctx.textBaseline = "middle";
  for (const it of items) {
    const s = symbolScreenPoint(v, it);
    if (s.x < -margin || s.y < -margin || s.x > o.visible.width + margin || s.y > o.visible.height + margin) continue;
    const sel = o.selected.has(it.id);
    const angle = it.panDeg == null ? Math.PI / 2 : (-it.panDeg * Math.PI) / 180; // unfocused units point downstage
    ctx.save();
    ctx.translate(s.x, s.y);
    ctx.rotate(angle);
    ctx.scale(px, px);
    ctx.fillStyle = pal.surface;
    ctx.strokeStyle = sel ? pal.selection : pal.ink;
    ctx.lineWidth = (sel ? 2.5 : 1.25) / px;
    const body = unitPath(it.shape);
    ctx.fill(body);
    ctx.stroke(body);
    // the beam nose: a short stroke out of the front, so direction reads on every family's shape
    ctx.beginPath();
    ctx.moveTo(0.5, 0);
    ctx.lineTo(0.78, 0);
    ctx.stroke();
    ctx.restore();
    if (withText && it.channel != null) {
      ctx.fillStyle = sel ? pal.selection : pal.ink;
      ctx.fillText(String(it.channel), s.x, s.y + 0.5);
    }
  }
  if (withText && px >= 22) {
    ctx.font = "10px 'IBM Plex Sans', system-ui, sans-serif";
    ctx.fillStyle = pal.muted;
    for (const it of items) {
      const s = symbolScreenPoint(v, it);
      if (s.x < 0 || s.y < 0 || s.x > o.visible.width || s.y > o.visible.height) continue;
      ctx.fillText(it.unitNumber, s.x, s.y - px * 0.62 - 5);
    }
  }
}

/** Focus marks: a small cross on the deck for each aimed unit; selected units get a line to their mark. */
export function drawMarks(ctx: Ctx, v: View, items: RigItem[], pal: PlotPalette, selected: ReadonlySet<number>) {
  ctx.lineWidth = 1;
  // All unselected crosses as one path: one stroke instead of 1,500 (ten times cheaper to draw).
  ctx.strokeStyle = pal.accent;
  ctx.beginPath();
  for (const it of items) {
    if (!it.mark || selected.has(it.id)) continue;
    const m = planToScreen(v, it.mark);
    cross(ctx, m, 3.5);
  }
  ctx.stroke();
  for (const it of items) {
    if (!it.mark || !selected.has(it.id)) continue;
    const m = planToScreen(v, it.mark);
    ctx.strokeStyle = pal.selection;
    ctx.beginPath();
    cross(ctx, m, 6);
    ctx.stroke();
    const s = symbolScreenPoint(v, it);
    ctx.setLineDash([4, 3]);
    strokeSegment(ctx, s, m);
    ctx.setLineDash([]);
    ctx.beginPath();
    ctx.arc(m.x, m.y, 9, 0, Math.PI * 2);
    ctx.stroke();
  }
}

function cross(ctx: Ctx, m: Point, r: number) {
  ctx.moveTo(m.x - r, m.y - r);
  ctx.lineTo(m.x + r, m.y + r);
  ctx.moveTo(m.x - r, m.y + r);
  ctx.lineTo(m.x + r, m.y - r);
}

export function drawFocusPoints(
  ctx: Ctx,
  v: View,
  points: Array<{ id: number; name: string; x: number; y: number }>,
  pal: PlotPalette,
  labels: boolean,
  selected: number | null,
) {
  ctx.font = "600 11px 'IBM Plex Sans', system-ui, sans-serif";
  ctx.textAlign = "left";
  ctx.textBaseline = "middle";
  for (const p of points) {
    const s = planToScreen(v, p);
    const sel = p.id === selected;
    ctx.fillStyle = sel ? pal.selection : pal.accent;
    ctx.beginPath();
    diamondPath(ctx, s, 7);
    ctx.globalAlpha = 0.85;
    ctx.fill();
    ctx.globalAlpha = 1;
    if (labels) fillTextOnBacking(ctx, p.name, s.x + 10, s.y, pal);
  }
}

// Plan ↔ screen. The audience sits at the bottom of the screen: +y (upstage) points UP, and +x (stage
// left) points to the RIGHT, as the plan is read from the house. `scale` is screen pixels per metre and
// (ox, oy) is where the plan origin (centre line × datum) lands on screen.
import type { Point } from "@/lib/optics";

export type View = { scale: number; ox: number; oy: number };
export type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

export const MIN_SCALE = 2; // px per metre: a 400 m venue still fits
export const MAX_SCALE = 2000; // px per metre: 2 mm per pixel, enough to place a shutter cut

export function planToScreen(v: View, p: Point): Point {
  return { x: v.ox + v.scale * p.x, y: v.oy - v.scale * p.y };
}

export function screenToPlan(v: View, s: Point): Point {
  return { x: (s.x - v.ox) / v.scale, y: (v.oy - s.y) / v.scale };
}

export function clampScale(scale: number): number {
  return Math.min(MAX_SCALE, Math.max(MIN_SCALE, scale));
}

/** Zooms by `factor` keeping the plan point under the pointer where it is on screen. */
export function zoomAbout(v: View, pointer: Point, factor: number): View {
  const scale = clampScale(v.scale * factor);
  const anchor = screenToPlan(v, pointer);
  return { scale, ox: pointer.x - scale * anchor.x, oy: pointer.y + scale * anchor.y };
}

export function panBy(v: View, dx: number, dy: number): View {
  return { ...v, ox: v.ox + dx, oy: v.oy + dy };
}

/** The view that shows `b` whole and centred in a viewport, with a margin in pixels on every side. */
export function fitBounds(b: Bounds, viewport: { width: number; height: number }, margin = 24): View {
  const w = Math.max(b.maxX - b.minX, 1e-3);
  const h = Math.max(b.maxY - b.minY, 1e-3);
  const scale = clampScale(Math.min((viewport.width - 2 * margin) / w, (viewport.height - 2 * margin) / h));
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  return { scale, ox: viewport.width / 2 - scale * cx, oy: viewport.height / 2 + scale * cy };
}

/** The plan rectangle visible in a viewport (for culling what is off screen). */
export function visiblePlanBounds(v: View, viewport: { width: number; height: number }): Bounds {
  const a = screenToPlan(v, { x: 0, y: viewport.height });
  const b = screenToPlan(v, { x: viewport.width, y: 0 });
  return { minX: a.x, minY: a.y, maxX: b.x, maxY: b.y };
}

/** Wheel delta → zoom factor; pinch gestures arrive as ctrl+wheel with small deltas, so the same curve serves both. */
export function wheelZoomFactor(deltaY: number, ctrlKey: boolean): number {
  const k = ctrlKey ? 0.01 : 0.0015;
  return Math.exp(-deltaY * k);
}

/**
 * One step of a two-finger pinch: the plan point under the fingers' old midpoint moves to their new
 * midpoint (the plan follows the hand), and the scale changes by how far the fingers spread.
 */
export function pinchStep(v: View, before: readonly [Point, Point], after: readonly [Point, Point]): View {
  const m0 = midpoint(before[0], before[1]);
  const m1 = midpoint(after[0], after[1]);
  const d0 = Math.hypot(before[1].x - before[0].x, before[1].y - before[0].y);
  const d1 = Math.hypot(after[1].x - after[0].x, after[1].y - after[0].y);
  const factor = d0 > 0 && d1 > 0 ? d1 / d0 : 1; // fingers on one pixel: follow the hand, keep the scale
  return zoomAbout(panBy(v, m1.x - m0.x, m1.y - m0.y), m1, factor);
}

function midpoint(a: Point, b: Point): Point {
  return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
}

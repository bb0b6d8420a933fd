// Picking on the plan without Konva's hit canvas: shapes are drawn in bulk, so picking is plain
// geometry in screen pixels (1,500 fixtures take well under a millisecond to scan).
import type { Point } from "@/lib/optics";
import type { Bounds } from "./view";

/** The item whose screen point is nearest to `p` within `radius` pixels. */
export function nearestOnScreen<T>(items: Iterable<T>, at: (t: T) => Point | null, p: Point, radius: number): T | null {
  let best: T | null = null;
  let bestD = radius;
  for (const item of items) {
    const q = at(item);
    if (!q) continue;
    const d = Math.hypot(q.x - p.x, q.y - p.y);
    if (d <= bestD) {
      bestD = d;
      best = item;
    }
  }
  return best;
}

/** A normalised rectangle from two corners. */
export function boundsOf(a: Point, b: Point): Bounds {
  return { minX: Math.min(a.x, b.x), minY: Math.min(a.y, b.y), maxX: Math.max(a.x, b.x), maxY: Math.max(a.y, b.y) };
}

export function inBounds(b: Bounds, p: Point): boolean {
  return p.x >= b.minX && p.x <= b.maxX && p.y >= b.minY && p.y <= b.maxY;
}

/** Distance in pixels from p to the segment a–b. */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

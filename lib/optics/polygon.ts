import { cross2, type Point } from "./vector";

/** Sutherland–Hodgman against one half-plane: keeps points p with side·cross(a, b, p) >= 0. */
export function clipHalfPlane(poly: Point[], a: Point, b: Point, side: number): Point[] {
  const out: Point[] = [];
  for (let i = 0; i < poly.length; i++) {
    const p = poly[i];
    const q = poly[(i + 1) % poly.length];
    const dp = side * cross2(a, b, p);
    const dq = side * cross2(a, b, q);
    if (dp >= 0) out.push(p);
    if (dp >= 0 !== dq >= 0) {
      const t = dp / (dp - dq);
      out.push({ x: p.x + t * (q.x - p.x), y: p.y + t * (q.y - p.y) });
    }
  }
  return out;
}

/** Convex hull, counter-clockwise, collinear points dropped (Andrew's monotone chain). */
export function convexHull(points: Point[]): Point[] {
  const pts = points.slice().sort((p, q) => p.x - q.x || p.y - q.y);
  if (pts.length < 3) return pts;
  const lower: Point[] = [];
  for (const p of pts) {
    while (lower.length >= 2 && cross2(lower[lower.length - 2], lower[lower.length - 1], p) <= 0) lower.pop();
    lower.push(p);
  }
  const upper: Point[] = [];
  for (let i = pts.length - 1; i >= 0; i--) {
    const p = pts[i];
    while (upper.length >= 2 && cross2(upper[upper.length - 2], upper[upper.length - 1], p) <= 0) upper.pop();
    upper.push(p);
  }
  return lower.slice(0, -1).concat(upper.slice(0, -1));
}

/** Intersection of a polygon with a convex counter-clockwise polygon. */
export function intersectConvex(subject: Point[], convexCcw: Point[]): Point[] {
  let out = subject;
  for (let i = 0; i < convexCcw.length && out.length > 0; i++) {
    out = clipHalfPlane(out, convexCcw[i], convexCcw[(i + 1) % convexCcw.length], 1);
  }
  return out.length >= 3 ? out : [];
}

/** Unsigned area (shoelace). */
export function polygonArea(poly: Point[]): number {
  let s = 0;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) s += poly[j].x * poly[i].y - poly[i].x * poly[j].y;
  return Math.abs(s) / 2;
}

/** Even-odd test; a point exactly on an edge may fall either way. */
export function pointInPolygon(p: Point, poly: Point[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i];
    const b = poly[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

// Flat-array hulls and half-plane clipping for the shadow outlines. The study draws an outline for every lit
// unit against every performer (4,000 pairs in a big show), and the object-per-point versions in polygon.ts
// spent most of that time sorting with a comparator and collecting garbage (bench/studies.ts, profiled with
// node --cpu-prof). Here every point lives in typed arrays that are reused from call to call, hulls of
// shapes that arrive already sorted are merged instead of sorted, and a clip that removes nothing is skipped.
// Same arithmetic as polygon.ts (Andrew's monotone chain, Sutherland–Hodgman), so the shapes agree with it.

/** Points in plan with a tag each (which outline and corner they came from); `n` points are in use. */
export type FlatPoly = { x: Float64Array; y: Float64Array; tag: Int32Array; n: number };

export function flatPoly(capacity: number): FlatPoly {
  return { x: new Float64Array(capacity), y: new Float64Array(capacity), tag: new Int32Array(capacity), n: 0 };
}

/** `p` itself when it holds `capacity` points, else a bigger one (contents not kept). */
export function withRoom(p: FlatPoly, capacity: number): FlatPoly {
  return p.x.length >= capacity ? p : flatPoly(Math.max(capacity, 2 * p.x.length));
}

export function copyPoly(src: FlatPoly, dst: FlatPoly): void {
  dst.x.set(src.x.subarray(0, src.n));
  dst.y.set(src.y.subarray(0, src.n));
  dst.tag.set(src.tag.subarray(0, src.n));
  dst.n = src.n;
}

function push(p: FlatPoly, x: number, y: number, tag: number): void {
  p.x[p.n] = x;
  p.y[p.n] = y;
  p.tag[p.n] = tag;
  p.n++;
}

/** polygon.ts's sort order: x, then y. */
function before(ax: number, ay: number, bx: number, by: number): boolean {
  return ax < bx || (ax === bx && ay < by);
}

/** Insertion sort into (x, y) order: linear when the points come nearly sorted, as a scaled copy of a sorted set does. */
export function sortInPlace(p: FlatPoly): void {
  for (let i = 1; i < p.n; i++) {
    const x = p.x[i];
    const y = p.y[i];
    const t = p.tag[i];
    let j = i - 1;
    while (j >= 0 && before(x, y, p.x[j], p.y[j])) {
      p.x[j + 1] = p.x[j];
      p.y[j + 1] = p.y[j];
      p.tag[j + 1] = p.tag[j];
      j--;
    }
    p.x[j + 1] = x;
    p.y[j + 1] = y;
    p.tag[j + 1] = t;
  }
}

/** Two sorted sets into one sorted set. */
export function mergeSorted(a: FlatPoly, b: FlatPoly, out: FlatPoly): void {
  out.n = 0;
  let i = 0;
  let j = 0;
  while (i < a.n && j < b.n) {
    if (before(b.x[j], b.y[j], a.x[i], a.y[i])) {
      push(out, b.x[j], b.y[j], b.tag[j]);
      j++;
    } else {
      push(out, a.x[i], a.y[i], a.tag[i]);
      i++;
    }
  }
  for (; i < a.n; i++) push(out, a.x[i], a.y[i], a.tag[i]);
  for (; j < b.n; j++) push(out, b.x[j], b.y[j], b.tag[j]);
}

function turn(h: FlatPoly, k: number, x: number, y: number): number {
  const ox = h.x[k - 2];
  const oy = h.y[k - 2];
  return (h.x[k - 1] - ox) * (y - oy) - (h.y[k - 1] - oy) * (x - ox);
}

/**
 * Andrew's monotone chain over points already in (x, y) order: the hull counter-clockwise from the first
 * point, collinear points dropped, exactly as polygon.ts's convexHull orders it.
 */
export function hullOfSorted(s: FlatPoly, out: FlatPoly): void {
  out.n = 0;
  if (s.n < 3) {
    copyPoly(s, out);
    return;
  }
  let k = 0;
  for (let i = 0; i < s.n; i++) {
    while (k >= 2 && turn(out, k, s.x[i], s.y[i]) <= 0) k--;
    out.x[k] = s.x[i];
    out.y[k] = s.y[i];
    out.tag[k] = s.tag[i];
    k++;
  }
  // The upper chain starts from the last point, which the lower chain already holds.
  const lower = k + 1;
  for (let i = s.n - 2; i >= 0; i--) {
    while (k >= lower && turn(out, k, s.x[i], s.y[i]) <= 0) k--;
    out.x[k] = s.x[i];
    out.y[k] = s.y[i];
    out.tag[k] = s.tag[i];
    k++;
  }
  out.n = k - 1;
}

/** A hull from hullOfSorted back into (x, y) order: its lower chain merged with its upper chain reversed. */
export function sortedFromHull(h: FlatPoly, out: FlatPoly): void {
  out.n = 0;
  let r = 0;
  for (let i = 1; i < h.n; i++) if (before(h.x[r], h.y[r], h.x[i], h.y[i])) r = i;
  let i = 0;
  let j = h.n - 1;
  // Lower chain 0..r ascends; the upper chain h.n−1 down to r+1 ascends too.
  while (i <= r && j > r) {
    if (before(h.x[j], h.y[j], h.x[i], h.y[i])) {
      push(out, h.x[j], h.y[j], h.tag[j]);
      j--;
    } else {
      push(out, h.x[i], h.y[i], h.tag[i]);
      i++;
    }
  }
  for (; i <= r; i++) push(out, h.x[i], h.y[i], h.tag[i]);
  for (; j > r; j--) push(out, h.x[j], h.y[j], h.tag[j]);
}

let side = new Float64Array(64);

/**
 * Sutherland–Hodgman against the half-plane left of a→b (polygon.ts's clipHalfPlane with side 1), from `src`
 * into `dst`. Returns false, leaving `dst` untouched, when every point is already inside: nothing to cut.
 */
export function clipLeftOf(src: FlatPoly, ax: number, ay: number, bx: number, by: number, dst: FlatPoly): boolean {
  const n = src.n;
  if (side.length < n) side = new Float64Array(2 * n);
  let allIn = true;
  for (let i = 0; i < n; i++) {
    const d = (bx - ax) * (src.y[i] - ay) - (by - ay) * (src.x[i] - ax);
    side[i] = d;
    if (d < 0) allIn = false;
  }
  if (allIn) return false;
  dst.n = 0;
  for (let i = 0; i < n; i++) {
    const q = i + 1 === n ? 0 : i + 1;
    const dp = side[i];
    const dq = side[q];
    if (dp >= 0) push(dst, src.x[i], src.y[i], src.tag[i]);
    if (dp >= 0 !== dq >= 0) {
      const t = dp / (dp - dq);
      push(dst, src.x[i] + t * (src.x[q] - src.x[i]), src.y[i] + t * (src.y[q] - src.y[i]), -1);
    }
  }
  return true;
}

export function toPoints(p: FlatPoly): { x: number; y: number }[] {
  const out = new Array<{ x: number; y: number }>(p.n);
  for (let i = 0; i < p.n; i++) out[i] = { x: p.x[i], y: p.y[i] };
  return out;
}

import { clipHalfPlane } from "./polygon";
import { occludingEdge, shadowOf, type Occluder, type Shadow, type ShadowInput } from "./shadow";
import {
  clipLeftOf,
  copyPoly,
  type FlatPoly,
  flatPoly,
  hullOfSorted,
  mergeSorted,
  sortedFromHull,
  sortInPlace,
  toPoints,
  withRoom,
} from "./shadow-hulls";
import type { Point, Vec3 } from "./vector";

export type ShadowPolygons = {
  /** Where all of the lens is hidden. Empty when the umbra has closed before reaching the deck. */
  umbra: Point[];
  /** The whole shadow's outline (where any part of the lens is hidden); it contains the umbra. */
  penumbra: Point[];
  reason?: string;
};

export type OutlineOptions = { lensSamples?: number; sides?: number };

/** Samples of the lens rim: the umbra of a convex object is the same for the rim as for the whole disc. */
function lensRim(s: Vec3, toward: Vec3, d: number, n: number): Vec3[] {
  if (d === 0) return [s];
  const fx = toward.x - s.x;
  const fy = toward.y - s.y;
  const fz = toward.z - s.z;
  const fl = Math.sqrt(fx * fx + fy * fy + fz * fz);
  // The disc is taken square to the line of sight to the occluder, as the D·b/a rule assumes.
  const hl = Math.hypot(fx, fy);
  const e1 = hl > 1e-12 ? { x: -fy / hl, y: fx / hl, z: 0 } : { x: 1, y: 0, z: 0 };
  const e2 = {
    x: (fy * e1.z - fz * e1.y) / fl,
    y: (fz * e1.x - fx * e1.z) / fl,
    z: (fx * e1.y - fy * e1.x) / fl,
  };
  const pts: Vec3[] = [];
  for (let k = 0; k < n; k++) {
    const t = (2 * Math.PI * k) / n;
    const c = (d / 2) * Math.cos(t);
    const sn = (d / 2) * Math.sin(t);
    pts.push({ x: s.x + c * e1.x + sn * e2.x, y: s.y + c * e1.y + sn * e2.y, z: s.z + c * e1.z + sn * e2.z });
  }
  return pts;
}

const circles = new Map<number, { cos: Float64Array; sin: Float64Array }>();

/** Corners of a regular n-gon on the unit circle, counter-clockwise from angle 0 (computed once per n). */
function unitCircle(n: number): { cos: Float64Array; sin: Float64Array } {
  let c = circles.get(n);
  if (!c) {
    c = { cos: new Float64Array(n), sin: new Float64Array(n) };
    for (let k = 0; k < n; k++) {
      const t = (2 * Math.PI * k) / n;
      c.cos[k] = Math.cos(t);
      c.sin[k] = Math.sin(t);
    }
    circles.set(n, c);
  }
  return c;
}

// Scratch shapes reused between calls (all of this runs synchronously, so no two calls share them at once).
let base = flatPoly(64);
let top = flatPoly(64);
let merged = flatPoly(128);
let bufA = flatPoly(128);
let bufB = flatPoly(128);
let sortedA = flatPoly(128);
let sortedB = flatPoly(128);
const hulls: FlatPoly[] = [];
let groups = new Float64Array(64 * 4);
let grouped = new Uint8Array(64);
let bridges = new Float64Array(64 * 4);

/**
 * Footprint of the occluder, sorted by (x, y), each corner tagged with its index counter-clockwise round the
 * outline; the top outline is the same shape `height` up.
 */
function fillBase(o: Occluder, sides: number): void {
  base.n = 0;
  if (o.kind === "panel") {
    base.x[0] = o.a.x;
    base.y[0] = o.a.y;
    base.x[1] = o.b.x;
    base.y[1] = o.b.y;
    base.tag[0] = 0;
    base.tag[1] = 1;
    base.n = 2;
  } else {
    const c = unitCircle(sides);
    for (let k = 0; k < sides; k++) {
      base.x[k] = o.x + o.radius * c.cos[k];
      base.y[k] = o.y + o.radius * c.sin[k];
      base.tag[k] = k;
    }
    base.n = sides;
  }
  sortInPlace(base);
}

/**
 * Shadow on the deck from one point of the lens (above the top): the hull of the footprint and the top
 * outline projected from that point. Top corners are tagged corner + m.
 */
function shadowFrom(s: Vec3, h: number, m: number, out: FlatPoly): void {
  const k = s.z / (s.z - h);
  top.n = base.n;
  for (let i = 0; i < base.n; i++) {
    top.x[i] = s.x + k * (base.x[i] - s.x);
    top.y[i] = s.y + k * (base.y[i] - s.y);
    top.tag[i] = base.tag[i] + m;
  }
  // A scaled copy of a sorted set is sorted but for rounding ties, so this pass is linear.
  sortInPlace(top);
  mergeSorted(base, top, merged);
  hullOfSorted(merged, out);
}

/**
 * Where every sample's shadow overlaps. Each shadow's edges are edges of the footprint or of its projected top
 * (parallel, in the same direction, for the same corner: only the tightest of them can cut) or the two
 * bridges between the outlines; so the first shadow is clipped by one edge per corner and every bridge,
 * instead of by every edge of every shadow.
 */
function umbraOf(count: number, m: number): FlatPoly {
  let cur = bufA;
  let next = bufB;
  copyPoly(hulls[0], cur);
  if (cur.n < 3) return cur;
  grouped.fill(0, 0, m);
  let nb = 0;
  for (let s = 1; s < count; s++) {
    const h = hulls[s];
    if (h.n < 3) {
      cur.n = 0;
      return cur;
    }
    for (let i = 0; i < h.n; i++) {
      const j = i + 1 === h.n ? 0 : i + 1;
      const ta = h.tag[i];
      const tb = h.tag[j];
      const ca = ta % m;
      const g = 4 * ca;
      if (ta < m === tb < m && tb % m === (ca + 1) % m) {
        // Same outline, neighbouring corners: keep the line farthest inside (a→b keeps its left side).
        const tighter =
          grouped[ca] === 0 ||
          (groups[g + 2] - groups[g]) * (h.y[i] - groups[g + 1]) -
            (groups[g + 3] - groups[g + 1]) * (h.x[i] - groups[g]) >
            0;
        if (tighter) {
          groups[g] = h.x[i];
          groups[g + 1] = h.y[i];
          groups[g + 2] = h.x[j];
          groups[g + 3] = h.y[j];
          grouped[ca] = 1;
        }
      } else {
        if (bridges.length < 4 * (nb + 1)) {
          const more = new Float64Array(bridges.length * 2);
          more.set(bridges);
          bridges = more;
        }
        bridges[4 * nb] = h.x[i];
        bridges[4 * nb + 1] = h.y[i];
        bridges[4 * nb + 2] = h.x[j];
        bridges[4 * nb + 3] = h.y[j];
        nb++;
      }
    }
  }
  const lines = [groups, bridges];
  const counts = [m, nb];
  for (let l = 0; l < 2; l++) {
    const v = lines[l];
    for (let c = 0; c < counts[l]; c++) {
      if (l === 0 && grouped[c] === 0) continue;
      if (clipLeftOf(cur, v[4 * c], v[4 * c + 1], v[4 * c + 2], v[4 * c + 3], next)) [cur, next] = [next, cur];
      if (cur.n < 3) {
        cur.n = 0;
        return cur;
      }
    }
  }
  return cur;
}

/** The outline of all the samples' shadows together: their hulls merged one by one. */
function penumbraOf(count: number): FlatPoly {
  let acc = bufA;
  let next = bufB;
  copyPoly(hulls[0], acc);
  for (let s = 1; s < count; s++) {
    sortedFromHull(acc, sortedA);
    sortedFromHull(hulls[s], sortedB);
    mergeSorted(sortedA, sortedB, merged);
    hullOfSorted(merged, next);
    [acc, next] = [next, acc];
  }
  return acc;
}

function makeRoom(corners: number, samples: number): void {
  const cap = 4 * corners * (samples + 2) + 8;
  base = withRoom(base, cap);
  top = withRoom(top, cap);
  merged = withRoom(merged, cap);
  bufA = withRoom(bufA, cap);
  bufB = withRoom(bufB, cap);
  sortedA = withRoom(sortedA, cap);
  sortedB = withRoom(sortedB, cap);
  for (let s = 0; s < samples; s++) hulls[s] = withRoom(hulls[s] ?? flatPoly(cap), cap);
  if (grouped.length < corners) {
    grouped = new Uint8Array(corners);
    groups = new Float64Array(4 * corners);
  }
}

/**
 * Umbra and outline of a shadow on the deck, in plan, clipped at the back wall (the part on the wall is
 * not a plan shape). Empty with a reason when the shadow does not land on the deck as a closed shape.
 */
export function shadowPolygons(i: ShadowInput, opts: OutlineOptions = {}): ShadowPolygons {
  return shadowPolygonsOf(i, shadowOf(i), opts);
}

/** shadowPolygons for a shadow already worked out by shadowOf from the same input. */
export function shadowPolygonsOf(i: ShadowInput, sh: Shadow, opts: OutlineOptions = {}): ShadowPolygons {
  if (sh.lands === "none" || sh.lands === "unbounded") return { umbra: [], penumbra: [], reason: sh.reason };
  const o = i.occluder;
  const sides = o.kind === "panel" ? 2 : (opts.sides ?? 32);
  const rim = lensRim(i.source, occludingEdge(i.source, o).top, i.apertureDiameter, opts.lensSamples ?? 24);
  for (const p of rim) {
    if (p.z <= o.height + 1e-9) {
      const reason = "Part of the lens is level with or below the top, so the shadow runs to the horizon.";
      return { umbra: [], penumbra: [], reason };
    }
  }
  makeRoom(sides, rim.length);
  fillBase(o, sides);
  for (let s = 0; s < rim.length; s++) shadowFrom(rim[s], o.height, sides, hulls[s]);
  let umbra = toPoints(umbraOf(rim.length, sides));
  let penumbra = toPoints(penumbraOf(rim.length));
  if (Number.isFinite(i.backWallY)) {
    const w = i.backWallY;
    umbra = umbra.length ? clipHalfPlane(umbra, { x: 0, y: w }, { x: 1, y: w }, -1) : [];
    penumbra = clipHalfPlane(penumbra, { x: 0, y: w }, { x: 1, y: w }, -1);
  }
  return { umbra: umbra.length >= 3 ? umbra : [], penumbra: penumbra.length >= 3 ? penumbra : [] };
}

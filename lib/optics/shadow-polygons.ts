import { clipHalfPlane, convexHull, intersectConvex } from "./polygon";
import { occludingEdge, shadowOf, type Occluder, type ShadowInput } from "./shadow";
import type { Point, Vec3 } from "./vector";

export type ShadowPolygons = {
  /** Where all of the lens is hidden. Empty when the umbra has closed before reaching the deck. */
  umbra: Point[];
  /** The whole shadow's outline (where any part of the lens is hidden); it contains the umbra. */
  penumbra: Point[];
  reason?: string;
};

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

/** Footprint (z = 0) and top outline (z = height) of the occluder. */
function outlines(o: Occluder, n: number): { base: Point[]; top: Point[]; height: number } {
  if (o.kind === "panel") return { base: [o.a, o.b], top: [o.a, o.b], height: o.height };
  const base: Point[] = [];
  for (let k = 0; k < n; k++) {
    const t = (2 * Math.PI * k) / n;
    base.push({ x: o.x + o.radius * Math.cos(t), y: o.y + o.radius * Math.sin(t) });
  }
  return { base, top: base, height: o.height };
}

/** Shadow of the occluder on the deck from one point of the lens (needs the point above the top). */
function shadowFrom(s: Vec3, base: Point[], top: Point[], h: number): Point[] {
  const k = s.z / (s.z - h);
  const projected = top.map((q) => ({ x: s.x + k * (q.x - s.x), y: s.y + k * (q.y - s.y) }));
  return convexHull(base.concat(projected));
}

/**
 * Umbra and outline of a shadow on the deck, in plan, clipped at the back wall (the part on the wall is
 * not a plan shape). Empty with a reason when the shadow does not land on the deck as a closed shape.
 */
export function shadowPolygons(i: ShadowInput, opts: { lensSamples?: number; sides?: number } = {}): ShadowPolygons {
  const sh = shadowOf(i);
  if (sh.lands === "none" || sh.lands === "unbounded") return { umbra: [], penumbra: [], reason: sh.reason };
  const { base, top, height } = outlines(i.occluder, opts.sides ?? 32);
  const rim = lensRim(i.source, occludingEdge(i.source, i.occluder).top, i.apertureDiameter, opts.lensSamples ?? 24);
  if (rim.some((p) => p.z <= height + 1e-9)) {
    const reason = "Part of the lens is level with or below the top, so the shadow runs to the horizon.";
    return { umbra: [], penumbra: [], reason };
  }
  const shadows = rim.map((p) => shadowFrom(p, base, top, height));
  let umbra = shadows[0];
  for (let k = 1; k < shadows.length && umbra.length > 0; k++) umbra = intersectConvex(umbra, shadows[k]);
  let penumbra = convexHull(shadows.flat());
  if (Number.isFinite(i.backWallY)) {
    const w = i.backWallY;
    umbra = umbra.length ? clipHalfPlane(umbra, { x: 0, y: w }, { x: 1, y: w }, -1) : [];
    penumbra = clipHalfPlane(penumbra, { x: 0, y: w }, { x: 1, y: w }, -1);
  }
  return { umbra: umbra.length >= 3 ? umbra : [], penumbra: penumbra.length >= 3 ? penumbra : [] };
}

import { describe, expect, it } from "vitest";
import { seededRandom } from "@/bench/support/numbers";
import {
  type Occluder,
  type Point,
  polygonArea,
  type ShadowInput,
  shadowOf,
  shadowPolygons,
  shadowPolygonsOf,
  type Vec3,
} from "@/lib/optics";
import { clipHalfPlane, convexHull, intersectConvex } from "@/lib/optics/polygon";
import { occludingEdge } from "@/lib/optics/shadow";

/**
 * Reference: the straightforward outlines the fast path replaced. From each of the lens-rim samples, the
 * shadow is the convex hull of the footprint and the top outline projected from that point (similar
 * triangles); the umbra is where all of them overlap (clipped one after another), the penumbra the hull of
 * them all. Written here with plain object points and polygon.ts's generic hull and clipping, so a mistake
 * in the flat-array merging, the grouping of parallel edges or the skipped clips shows as a difference.
 */
function referenceRim(s: Vec3, toward: Vec3, d: number, n: number): Vec3[] {
  if (d === 0) return [s];
  const f = { x: toward.x - s.x, y: toward.y - s.y, z: toward.z - s.z };
  const fl = Math.hypot(f.x, f.y, f.z);
  const hl = Math.hypot(f.x, f.y);
  const e1 = hl > 1e-12 ? { x: -f.y / hl, y: f.x / hl, z: 0 } : { x: 1, y: 0, z: 0 };
  const e2 = {
    x: (f.y * e1.z - f.z * e1.y) / fl,
    y: (f.z * e1.x - f.x * e1.z) / fl,
    z: (f.x * e1.y - f.y * e1.x) / fl,
  };
  return Array.from({ length: n }, (_, k) => {
    const t = (2 * Math.PI * k) / n;
    const c = (d / 2) * Math.cos(t);
    const sn = (d / 2) * Math.sin(t);
    return { x: s.x + c * e1.x + sn * e2.x, y: s.y + c * e1.y + sn * e2.y, z: s.z + c * e1.z + sn * e2.z };
  });
}

function reference(i: ShadowInput, sides: number, samples: number): { umbra: Point[]; penumbra: Point[] } | null {
  const sh = shadowOf(i);
  if (sh.lands === "none" || sh.lands === "unbounded") return null;
  const o = i.occluder;
  const foot: Point[] =
    o.kind === "panel"
      ? [o.a, o.b]
      : Array.from({ length: sides }, (_, k) => {
          const t = (2 * Math.PI * k) / sides;
          return { x: o.x + o.radius * Math.cos(t), y: o.y + o.radius * Math.sin(t) };
        });
  const rim = referenceRim(i.source, occludingEdge(i.source, o).top, i.apertureDiameter, samples);
  if (rim.some((p) => p.z <= o.height + 1e-9)) return null;
  const shadows = rim.map((s) => {
    const k = s.z / (s.z - o.height);
    return convexHull(foot.concat(foot.map((q) => ({ x: s.x + k * (q.x - s.x), y: s.y + k * (q.y - s.y) }))));
  });
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

function toSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const l2 = dx * dx + dy * dy;
  const t = l2 > 0 ? Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / l2)) : 0;
  return Math.hypot(p.x - a.x - t * dx, p.y - a.y - t * dy);
}

/** Largest distance from a corner of either outline to the other's boundary (0 for the same shape). */
function outlineGap(p: Point[], q: Point[]): number {
  const one = (from: Point[], to: Point[]) =>
    Math.max(...from.map((v) => Math.min(...to.map((a, k) => toSegment(v, a, to[(k + 1) % to.length])))));
  return Math.max(one(p, q), one(q, p));
}

function randomCase(r: () => number, k: number): ShadowInput {
  const occluder: Occluder =
    k % 3 === 2
      ? {
          kind: "panel",
          a: { x: -3 + 3 * r(), y: -1 + 3 * r() },
          b: { x: 3 * r(), y: -1 + 3 * r() },
          height: 0.5 + 2.5 * r(),
        }
      : { kind: "performer", x: -3 + 6 * r(), y: -1 + 4 * r(), height: 1.2 + 0.8 * r(), radius: 0.1 + 0.3 * r() };
  // Front, overhead, side and back light, some nearly straight above the occluder.
  const nearlyOver = k % 7 === 0 && occluder.kind === "performer";
  const source = nearlyOver
    ? { x: occluder.x + 0.3 * (r() - 0.5), y: occluder.y + 0.3 * (r() - 0.5), z: 3 + 6 * r() }
    : { x: -10 + 20 * r(), y: -12 + 15 * r(), z: 2.2 + 9 * r() };
  // From a point lens (umbra and outline the same) to a wide soft source; no wall, near walls and far walls.
  const apertureDiameter = [0, 0.1, 0.2, 0.6, 2][k % 5] * r();
  const backWallY = k % 4 === 0 ? Infinity : Math.max(source.y, 3) + 0.5 + 8 * r();
  return { source, apertureDiameter, backWallY, occluder };
}

describe("fast shadow outlines against the per-sample hulls they replaced", () => {
  it("give the same umbra and penumbra on 2,000 random cases", () => {
    // Independent reference: hull and clip of every sample's shadow (geometry, similar triangles), above
    const r = seededRandom(2026);
    let compared = 0;
    let softEdged = 0;
    let clippedAtWall = 0;
    for (let k = 0; k < 2000; k++) {
      const input = randomCase(r, k);
      const sides = [8, 12, 16, 32][k % 4];
      const samples = [1, 6, 8, 24][(k >> 2) % 4];
      let want: ReturnType<typeof reference>;
      try {
        want = reference(input, sides, samples);
      } catch {
        expect(() => shadowPolygons(input, { sides, lensSamples: samples })).toThrow(RangeError);
        continue;
      }
      const got = shadowPolygons(input, { sides, lensSamples: samples });
      if (!want) {
        expect(got.umbra, `case ${k}`).toEqual([]);
        expect(got.penumbra, `case ${k}`).toEqual([]);
        expect(got.reason, `case ${k}`).toBeTruthy();
        continue;
      }
      compared++;
      const scale = Math.max(1, ...want.penumbra.map((v) => Math.hypot(v.x, v.y)));
      expect(got.penumbra.length > 0, `case ${k} penumbra`).toBe(want.penumbra.length > 0);
      expect(got.umbra.length > 0, `case ${k} umbra`).toBe(want.umbra.length > 0);
      if (want.penumbra.length) {
        expect(outlineGap(got.penumbra, want.penumbra), `case ${k} penumbra`).toBeLessThan(1e-9 * scale);
        expect(Math.abs(polygonArea(got.penumbra) - polygonArea(want.penumbra))).toBeLessThan(1e-9 * scale * scale);
      }
      if (want.umbra.length) {
        expect(outlineGap(got.umbra, want.umbra), `case ${k} umbra`).toBeLessThan(1e-9 * scale);
        expect(Math.abs(polygonArea(got.umbra) - polygonArea(want.umbra))).toBeLessThan(1e-9 * scale * scale);
      }
      if (polygonArea(want.umbra) < 0.99 * polygonArea(want.penumbra)) softEdged++;
      if (want.penumbra.some((v) => v.y === input.backWallY)) clippedAtWall++;
    }
    // The cases reach the branches that matter: soft edges (the umbra clipped by many samples' shadows) and
    // outlines cut by the wall. (On the deck the umbra always keeps the footprint, so it never closes.)
    expect(compared).toBeGreaterThan(1000);
    expect(softEdged).toBeGreaterThan(500);
    expect(clippedAtWall).toBeGreaterThan(20);
  });

  it("shadowPolygonsOf with a shadow already worked out gives what shadowPolygons gives", () => {
    // consistency of the two entry points (no outside source needed: same input, same code path)
    const input: ShadowInput = {
      source: { x: 1, y: -7, z: 6 },
      apertureDiameter: 0.15,
      backWallY: 6,
      occluder: { kind: "performer", x: 0, y: 0, height: 1.75, radius: 0.25 },
    };
    const opts = { sides: 16, lensSamples: 8 };
    expect(shadowPolygonsOf(input, shadowOf(input), opts)).toEqual(shadowPolygons(input, opts));
  });

  it("a point lens straight above a performer: the shadow is the footprint scaled from the lens's foot", () => {
    // similar triangles, worked by hand: lens 7 m up over the centre, head 1.75 m: the head's rim projects
    // to radius 0.25·7/(7 − 1.75) = 1/3 m, and the foot (0.25 m) lies inside it, so the outline is that circle.
    const input: ShadowInput = {
      source: { x: 0, y: 0, z: 7 },
      apertureDiameter: 0,
      backWallY: Infinity,
      occluder: { kind: "performer", x: 0, y: 0, height: 1.75, radius: 0.25 },
    };
    const p = shadowPolygons(input, { sides: 64, lensSamples: 1 });
    for (const v of p.penumbra) expect(Math.hypot(v.x, v.y)).toBeCloseTo(1 / 3, 12);
    expect(p.penumbra).toHaveLength(64);
    expect(polygonArea(p.umbra)).toBeCloseTo(polygonArea(p.penumbra), 12);
  });
});

import { describe, expect, it } from "vitest";
import { shadowOf, type Occluder, type ShadowInput, type Vec3 } from "@/lib/optics";

/**
 * Independent reference for shadowOf: cast rays from points of the lens (its centre, or points on its aperture
 * disc) through many points on the occluder's silhouette (the rims of its top and foot and its upright edges),
 * and see where each ray lands first: the deck (z = 0) or the back wall (y = backWallY). Nothing here calls the
 * code under test except shadowOf itself. Geometry only: straight rays and two planes (similar triangles).
 */
type Landing = { on: "deck" | "wall"; p: Vec3 } | null;

function land(s: Vec3, q: Vec3, wallY: number): Landing {
  const d = { x: q.x - s.x, y: q.y - s.y, z: q.z - s.z };
  const tDeck = d.z < 0 ? -s.z / d.z : Infinity;
  const tWall = d.y > 0 ? (wallY - s.y) / d.y : Infinity;
  const t = Math.min(tDeck, tWall);
  if (!Number.isFinite(t) || t < 1) return null;
  const p = { x: s.x + t * d.x, y: s.y + t * d.y, z: s.z + t * d.z };
  return { on: tWall <= tDeck ? "wall" : "deck", p };
}

function silhouette(o: Occluder, n: number): Vec3[] {
  const pts: Vec3[] = [];
  if (o.kind === "performer") {
    for (let k = 0; k < n; k++) {
      const t = (2 * Math.PI * k) / n;
      const x = o.x + o.radius * Math.cos(t);
      const y = o.y + o.radius * Math.sin(t);
      pts.push({ x, y, z: o.height }, { x, y, z: 0 });
    }
    return pts;
  }
  for (let k = 0; k <= n; k++) {
    const u = k / n;
    const x = o.a.x + u * (o.b.x - o.a.x);
    const y = o.a.y + u * (o.b.y - o.a.y);
    pts.push({ x, y, z: o.height }, { x, y, z: 0 });
  }
  for (let k = 0; k <= 50; k++) {
    const z = (o.height * k) / 50;
    pts.push({ ...o.a, z }, { ...o.b, z });
  }
  return pts;
}

type Reference = { lands: "deck" | "wall"; wallHeight: number | null; tip: Vec3 };

/** From one lens point: the highest wall point if any ray reaches the wall, else the deck point farthest in plan. */
function reference(s: Vec3, o: Occluder, wallY: number, n = 6000): Reference | null {
  let wall: Vec3 | null = null;
  let deck: Vec3 | null = null;
  let deckDist = -1;
  for (const q of silhouette(o, n)) {
    const l = land(s, q, wallY);
    if (!l) continue;
    if (l.on === "wall") {
      if (!wall || l.p.z > wall.z) wall = l.p;
    } else {
      const dist = Math.hypot(l.p.x - s.x, l.p.y - s.y);
      if (dist > deckDist) [deck, deckDist] = [l.p, dist];
    }
  }
  if (wall) return { lands: "wall", wallHeight: wall.z, tip: wall };
  return deck ? { lands: "deck", wallHeight: null, tip: deck } : null;
}

/** Deterministic pseudo-random numbers (mulberry32) so a failure can be replayed. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("shadowOf against rays sampled over the occluder's silhouette", () => {
  it("issue repro: a lens below head height climbs the wall from the near side of the head", () => {
    // similar triangles, worked by hand: the ray from the lens (y −8, z 0.5) over the near side of the head
    // (y −0.25, z 1.75) rises 1.25 m in 7.75 m; at the wall (y 8, 16 m from the lens) it is 0.5 + 1.25·16/7.75 up.
    const s = shadowOf({
      source: { x: 0, y: -8, z: 0.5 },
      apertureDiameter: 0.15,
      backWallY: 8,
      occluder: { kind: "performer", x: 0, y: 0, height: 1.75, radius: 0.25 },
    });
    expect(s.lands).toBe("wall");
    expect(s.wallHeight).toBeCloseTo(0.5 + (1.25 * 16) / 7.75, 12);
    expect(s.wallHeight).toBeCloseTo(3.081, 3);
  });

  it("issue repro: a panel set at an angle reaches the wall from its far corner", () => {
    // similar triangles, worked by hand: lens (0, −5, 6), panel top 2 m up, so the deck shadow of a top point
    // is 6/(6 − 2) = 1.5 times as far from the lens's foot: corner (2, 2) → (3, 5.5), past the wall at y = 5.
    // The ray from the lens through (2, 2, 2) runs (2, 7, −4); it meets y = 5 after 10/7 of that step,
    // at x = 20/7 and z = 6 − 40/7 = 2/7 ≈ 0.29 m up the wall.
    const s = shadowOf({
      source: { x: 0, y: -5, z: 6 },
      apertureDiameter: 0.15,
      backWallY: 5,
      occluder: { kind: "panel", a: { x: -2, y: 0 }, b: { x: 2, y: 2 }, height: 2 },
    });
    expect(s.lands).toBe("wall");
    expect(s.wallHeight).toBeCloseTo(2 / 7, 12);
    expect(s.tip!.x).toBeCloseTo(20 / 7, 12);
    expect(s.tip!.y).toBe(5);
    // Along the deck from the corner's foot (2, 2) to the foot of the wall below the tip.
    expect(s.length).toBeCloseTo(Math.hypot(20 / 7 - 2, 3), 12);
  });

  it("the same panel with the wall out of reach: the tip is the far corner's shadow, not the middle's", () => {
    // similar triangles as above: corner (2, 2) lands at (3, 5.5); the middle of the top edge (0, 1) would
    // land at (0, 4), nearer to the lens's foot (0, −5) than (3, 5.5) is.
    const s = shadowOf({
      source: { x: 0, y: -5, z: 6 },
      apertureDiameter: 0.15,
      backWallY: 20,
      occluder: { kind: "panel", a: { x: -2, y: 0 }, b: { x: 2, y: 2 }, height: 2 },
    });
    expect(s.lands).toBe("deck");
    expect(s.tip!.x).toBeCloseTo(3, 12);
    expect(s.tip!.y).toBeCloseTo(5.5, 12);
  });

  it("agrees with the sampled rays from the lens centre across random performers and panels", () => {
    // Independent reference: brute-force rays over 6,000 silhouette points per case (geometry, no source needed)
    const r = rng(12);
    let wallCases = 0;
    let deckCases = 0;
    for (let k = 0; k < 120; k++) {
      const wallY = 4 + 6 * r();
      const source = { x: -8 + 16 * r(), y: -10 + 8 * r(), z: 0.3 + 7 * r() };
      const occluder: Occluder =
        k % 2 === 0
          ? { kind: "performer", x: -3 + 6 * r(), y: -1 + 3 * r(), height: 1.5 + 0.4 * r(), radius: 0.15 + 0.2 * r() }
          : {
              kind: "panel",
              a: { x: -3 + 3 * r(), y: -1 + 2 * r() },
              b: { x: 3 * r(), y: -1 + 3 * r() },
              height: 1 + 2 * r(),
            };
      const input: ShadowInput = { source, apertureDiameter: 0.15, backWallY: wallY, occluder };
      const got = shadowOf(input);
      const ref = reference(source, occluder, wallY);
      if (got.lands === "unbounded") {
        // Below the top and beside the occluder: some rays reach the wall ever higher, so no highest point.
        expect(source.z).toBeLessThan(occluder.height);
        continue;
      }
      expect(ref).not.toBeNull();
      expect(got.lands, `case ${k}`).toBe(ref!.lands);
      const tol = 1e-4 * Math.max(1, Math.hypot(ref!.tip.x - source.x, ref!.tip.y - source.y));
      if (ref!.lands === "wall") {
        wallCases++;
        expect(Math.abs(got.wallHeight! - ref!.wallHeight!), `case ${k}`).toBeLessThan(tol);
      } else {
        deckCases++;
        const gotDist = Math.hypot(got.tip!.x - source.x, got.tip!.y - source.y);
        const refDist = Math.hypot(ref!.tip.x - source.x, ref!.tip.y - source.y);
        expect(Math.abs(gotDist - refDist), `case ${k}`).toBeLessThan(tol);
      }
      expect(Math.abs(got.tip!.x - ref!.tip.x), `case ${k}`).toBeLessThan(0.02);
    }
    expect(wallCases).toBeGreaterThan(10);
    expect(deckCases).toBeGreaterThan(10);
  });

  it("a lens above head height lit at an angle in plan: the wall height from sampled rays", () => {
    // Independent reference: brute-force rays (geometry). The highest wall point comes from the most upstage
    // point of the head's rim, (x, y + r), not from the far side along the line of sight in plan.
    const input: ShadowInput = {
      source: { x: -6, y: -6, z: 4 },
      apertureDiameter: 0.15,
      backWallY: 3,
      occluder: { kind: "performer", x: 0, y: 0, height: 1.75, radius: 0.25 },
    };
    const ref = reference(input.source, input.occluder, 3)!;
    const got = shadowOf(input);
    expect(ref.lands).toBe("wall");
    expect(got.lands).toBe("wall");
    // hand-worked: ray from (−6, −6, 4) through (0, 0.25, 1.75) reaches y = 3 after 9/6.25 of its step:
    // z = 4 − 2.25·9/6.25 = 0.76
    expect(got.wallHeight).toBeCloseTo(4 - (2.25 * 9) / 6.25, 12);
    expect(Math.abs(got.wallHeight! - ref.wallHeight!)).toBeLessThan(1e-6);
  });

  it("the penumbra band on the wall matches rays from points on the lens aperture", () => {
    // Independent reference: rays from points on the aperture disc (square to the line of sight, as the
    // D·b/a rule assumes) over the silhouette. The band between the highest and lowest per-point tops is the
    // penumbra; on the wall it is D·b/a stretched by 1/cos(incidence) (REFERENCE.md, shadows). First order in D/a.
    for (const z of [0.5, 1.0, 3, 4]) {
      const input: ShadowInput = {
        source: { x: 0, y: -8, z },
        apertureDiameter: 0.15,
        backWallY: 6,
        occluder: { kind: "performer", x: 0, y: 0, height: 1.75, radius: 0.25 },
      };
      const got = shadowOf(input);
      expect(got.lands).toBe("wall");
      const tops: number[] = [];
      const sight = { y: got.tip!.y - input.source.y, z: got.tip!.z - input.source.z };
      const sl = Math.hypot(sight.y, sight.z);
      for (let k = 0; k < 72; k++) {
        const t = (2 * Math.PI * k) / 72;
        // Disc in the plane square to the sight line: across (x) and the in-plane normal (−z, y)/|.|.
        const u = 0.075 * Math.cos(t);
        const v = 0.075 * Math.sin(t);
        const p = { x: u, y: input.source.y - (v * sight.z) / sl, z: input.source.z + (v * sight.y) / sl };
        tops.push(reference(p, input.occluder, 6, 4000)!.wallHeight!);
      }
      const band = Math.max(...tops) - Math.min(...tops);
      const centre = got.wallHeight!;
      expect(centre).toBeLessThan(Math.max(...tops));
      expect(centre).toBeGreaterThan(Math.min(...tops));
      const onWall = got.penumbraWidth! / Math.cos((got.incidenceDeg! * Math.PI) / 180);
      expect(Math.abs(band - onWall) / onWall, `lens ${z} m up`).toBeLessThan(0.03);
    }
  });
});

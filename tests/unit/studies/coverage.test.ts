import { describe, expect, it } from "vitest";
import {
  areaCoverage,
  coverageGrid,
  faceLightAt,
  gridPoint,
  illuminanceAt,
  type Bounds,
  type CoverageGrid,
  type LitBeam,
} from "@/lib/optics";
import { seededRandom } from "@/bench/support/numbers";

const SQRT2 = Math.SQRT2;

function beam(over: Partial<LitBeam> = {}): LitBeam {
  return {
    source: { x: 0, y: 0, z: 5 },
    focus: { x: 0, y: 0, z: 0 },
    coneDeg: 30,
    softnessDeg: 5,
    peakCandela: 10_000,
    level: 1,
    ...over,
  };
}

/** Cells of 0.5 m with a centre exactly on the origin: bounds start half a cell off a whole metre. */
const bounds: Bounds = { minX: -7.25, minY: -7.25, maxX: 7.25, maxY: 7.25 };

function valueAt(g: CoverageGrid, x: number, y: number): number {
  const col = Math.round((x - g.originX) / g.resolution);
  const row = Math.round((y - g.originY) / g.resolution);
  const p = gridPoint(g, col, row);
  expect(Math.abs(p.x - x) + Math.abs(p.y - y)).toBeLessThan(1e-9);
  return g.values[row * g.cols + col];
}

describe("deck coverage: one unit straight down", () => {
  const g = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: { kind: "deck" }, beams: [beam()] });

  it("gives I/h² at the centre of the pool", () => {
    // REFERENCE.md: 10,000 cd at 5 m square on → 400 lx (inverse-square law); float32 storage, so 1e-6
    expect(Math.abs(valueAt(g, 0, 0) - 400)).toBeLessThanOrEqual(1e-6 * 400);
  });

  it("falls off by the cosine law off the axis, inside the flat core", () => {
    // E = I·cos(inc)/d² = I·h/d³ (cosine law); at 0.5 m off the axis (5.7°, inside the 10° core), d² = 25.25;
    // hand-worked: 50,000/25.25^1.5 = 394.07 lx
    const expected = (10_000 * 5) / 25.25 ** 1.5;
    expect(Math.abs(expected - 394.07)).toBeLessThan(1e-2);
    expect(Math.abs(valueAt(g, 0.5, 0) - expected)).toBeLessThanOrEqual(1e-6 * expected);
  });

  it("is a circle: equal light at equal distances from the axis in every direction", () => {
    // symmetry of a straight-down cone (geometry, no source needed)
    const e = valueAt(g, 1, 0);
    expect(e).toBeGreaterThan(0);
    for (const [x, y] of [
      [-1, 0],
      [0, 1],
      [0, -1],
    ])
      expect(Math.abs(valueAt(g, x, y) - e)).toBeLessThanOrEqual(1e-6 * e);
    // 30° cone from 5 m: pool radius 5·tan 15° = 1.34 m (REFERENCE.md beam spread), so 1.5 m out is dark
    expect(valueAt(g, 1.5, 0)).toBe(0);
    expect(valueAt(g, 0, -1.5)).toBe(0);
  });

  it("measures every plane from the show deck", () => {
    // A lens 6 m over the stage floor and a show deck 1 m up: 5 m above the deck → 400 lx (inverse-square law)
    const raised = coverageGrid({
      bounds,
      resolution: 0.5,
      deckHeight: 1,
      measure: { kind: "deck" },
      beams: [beam({ source: { x: 0, y: 0, z: 6 }, focus: { x: 0, y: 0, z: 1 } })],
    });
    expect(Math.abs(valueAt(raised, 0, 0) - 400)).toBeLessThanOrEqual(1e-6 * 400);
    // Head height 1 m above that deck: 4 m from the lens → 10,000/16 = 625 lx (inverse-square law)
    const head = coverageGrid({
      bounds,
      resolution: 0.5,
      deckHeight: 1,
      measure: { kind: "plane", height: 1 },
      beams: [beam({ source: { x: 0, y: 0, z: 6 }, focus: { x: 0, y: 0, z: 1 } })],
    });
    expect(Math.abs(valueAt(head, 0, 0) - 625)).toBeLessThanOrEqual(1e-6 * 625);
  });

  it("takes a unit 6 m up aimed 6 m away at 196.419 lx", () => {
    // REFERENCE.md: 20,000 cd from 6 m up onto a floor point 6 m away → 196.419 lx (cosine law)
    const b = beam({ source: { x: 0, y: 0, z: 6 }, focus: { x: 6, y: 0, z: 0 }, peakCandela: 20_000 });
    const g6 = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: { kind: "deck" }, beams: [b] });
    expect(Math.abs(valueAt(g6, 6, 0) - 196.419)).toBeLessThanOrEqual(1e-4 * 196.419);
  });
});

describe("two overlapping pools", () => {
  const left = beam({ source: { x: -1, y: 0, z: 5 }, focus: { x: -1, y: 0, z: 0 }, coneDeg: 60, softnessDeg: 0 });
  const right = beam({ source: { x: 1, y: 0, z: 5 }, focus: { x: 1, y: 0, z: 0 }, coneDeg: 60, softnessDeg: 0 });
  const g = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: { kind: "deck" }, beams: [left, right] });

  it("adds the two pools where they overlap", () => {
    // Midway both lenses are 1 m off: 2·I·h/d³ = 2·377.146 = 754.29 lx (inverse-square and cosine law, hand-worked)
    const expected = (2 * 10_000 * 5) / 26 ** 1.5;
    expect(Math.abs(valueAt(g, 0, 0) - expected)).toBeLessThanOrEqual(1e-6 * expected);
    // Under one lens: its own 400 lx plus the other's at 2 m off, 50,000/29^1.5 (hand-worked)
    const under = 400 + 50_000 / 29 ** 1.5;
    expect(Math.abs(valueAt(g, 1, 0) - under)).toBeLessThanOrEqual(1e-6 * under);
  });

  it("matches a point-by-point sum at every cell (independent brute force)", () => {
    // brute force: illuminanceAt per cell with the exact profile; the grid's table stays within 2e-4 of the peak
    for (let row = 0; row < g.rows; row += 3) {
      for (let col = 0; col < g.cols; col += 3) {
        const p = gridPoint(g, col, row);
        const e = illuminanceAt({ ...p, z: 0 }, [left, right]);
        expect(Math.abs(g.values[row * g.cols + col] - e)).toBeLessThanOrEqual(2e-4 * 800 + 1e-6 * e);
      }
    }
  });
});

describe("acting areas", () => {
  const g = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: { kind: "deck" }, beams: [beam()] });
  const square = (cx: number, cy: number, r: number) => [
    { x: cx - r, y: cy - r },
    { x: cx + r, y: cy - r },
    { x: cx + r, y: cy + r },
    { x: cx - r, y: cy + r },
  ];

  it("gives a zone in full darkness uniformity 0, with no division by zero", () => {
    // definition: U0 = Emin/Eavg (EN 12464-1); with Eavg = 0 the area is reported as 0, never NaN
    const [dark] = areaCoverage(g, [{ id: 1, name: "Dark corner", polygon: square(5, 5, 1) }]);
    expect(dark.count).toBeGreaterThan(0);
    expect(dark.mean).toBe(0);
    expect(dark.uniformity).toBe(0);
    expect(dark.averageToMinimum).toBeNull();
    expect(dark.flags).toContain("uniformity");
  });

  it("computes min, mean, max and U0 against the cells it covers, and says where the dark spot is", () => {
    const poly = square(0, 0, 0.6); // cells at −0.5, 0, 0.5 on each axis: 9 cells, all in the flat core (0.88 m)
    const [a] = areaCoverage(g, [{ id: 2, name: "Centre", polygon: poly }]);
    expect(a.count).toBe(9);
    // brute force over the same 9 cells with illuminanceAt (independent of the grid's table)
    const vals: number[] = [];
    for (const x of [-0.5, 0, 0.5]) for (const y of [-0.5, 0, 0.5]) vals.push(illuminanceAt({ x, y, z: 0 }, [beam()]));
    // hand-worked corner: d² = 25.5, E = I·h/d³ = 50,000/25.5^1.5 = 388.28 lx (cosine law)
    expect(Math.min(...vals)).toBeCloseTo(50_000 / 25.5 ** 1.5, 9);
    const mean = vals.reduce((s, v) => s + v, 0) / vals.length;
    const min = Math.min(...vals);
    expect(Math.abs(a.mean! - mean)).toBeLessThan(0.05);
    expect(Math.abs(a.min! - min)).toBeLessThan(0.05);
    expect(Math.abs(a.max! - 400)).toBeLessThan(1e-3);
    expect(Math.abs(a.uniformity! - min / mean)).toBeLessThan(1e-3);
    expect(Math.abs(a.averageToMinimum! - mean / min)).toBeLessThan(1e-3);
    // the dark spot is a corner, the farthest cell from the axis
    expect(Math.abs(Math.abs(a.minAt!.x) - 0.5) + Math.abs(Math.abs(a.minAt!.y) - 0.5)).toBeLessThan(1e-9);
  });

  it("reproduces the published uniformity example {100, 200, 300, 400} lx → U0 0.40", () => {
    // REFERENCE.md: U0 = Emin/Eavg = 100/250 = 0.40 (EN 12464-1, CIBSE); IES form Eavg:Emin = 2.5
    const grid = {
      values: new Float32Array([100, 200, 300, 400]),
      cols: 2,
      rows: 2,
      originX: 0.5,
      originY: 0.5,
      resolution: 1,
    };
    const [a] = areaCoverage(grid, [{ id: 1, name: "Four", polygon: square(1, 1, 1) }]);
    expect(a.count).toBe(4);
    expect(a.uniformity).toBeCloseTo(0.4, 12);
    expect(a.averageToMinimum).toBeCloseTo(2.5, 12);
    expect(a.flags).toContain("uniformity"); // 0.40 is below the default 0.5
  });

  it("flags an area whose mean differs from the others by more than the chosen ratio", () => {
    // common practice, no source: a mean over twice (or under half) the other areas' stands out
    const grid = {
      values: new Float32Array([100, 100, 100, 500]),
      cols: 4,
      rows: 1,
      originX: 0.5,
      originY: 0.5,
      resolution: 1,
    };
    const cell = (x: number) => square(x, 0.5, 0.4);
    const rows = areaCoverage(
      grid,
      [1, 2, 3, 4].map((k) => ({ id: k, name: `A${k}`, polygon: cell(k - 0.5) })),
    );
    expect(rows[3].meanRatio).toBeCloseTo(5, 9);
    expect(rows[3].flags).toEqual(["brighter"]);
    // against the median of the others (100, 100, 500 → 100), one bright area does not make the rest look dim
    expect(rows[0].meanRatio).toBeCloseTo(1, 9);
    expect(rows[0].flags).toEqual([]);
    const dim = areaCoverage(
      { ...grid, values: new Float32Array([100, 100, 100, 40]) },
      [1, 2, 3, 4].map((k) => ({ id: k, name: `A${k}`, polygon: cell(k - 0.5) })),
    );
    expect(dim[3].flags).toEqual(["dimmer"]);
    const loose = areaCoverage(
      grid,
      [1, 2, 3, 4].map((k) => ({ id: k, name: `A${k}`, polygon: cell(k - 0.5) })),
      { minUniformity: 0.5, meanRatio: 6 },
    );
    expect(loose[3].flags).toEqual([]);
  });
});

describe("face light (vertical illuminance)", () => {
  const face = { x: 0, y: 0, z: 1.55 };

  it("matches the hand-worked case of a source 45° up and 45° off the facing direction", () => {
    // Hand-worked (cosine law on a vertical plane): face looks at the audience (−y). Source 5 m out in plan at 45° off
    // that direction and 5 m higher (elevation 45°): S − P = (5/√2, −5/√2, 5), d² = 50.
    // cos(incidence) = (S − P)·n / d = (5/√2)/(5√2) = 1/2 (incidence 60°). E_v = I·cos/d² = 10,000·0.5/50 = 100 lx.
    const source = { x: face.x + 5 / SQRT2, y: face.y - 5 / SQRT2, z: face.z + 5 };
    const b = beam({ source, focus: face, coneDeg: 40, softnessDeg: 5 });
    const f = faceLightAt(face, -90, [b]);
    expect(Math.abs(f.total - 100)).toBeLessThanOrEqual(1e-9 * 100);
    // the same light on the deck point below it would be E_h = I·cos(inc_h)/d² with its own d (not the face's)
  });

  it("lights nothing from behind the face", () => {
    // a surface is not lit through its back (cos(incidence) ≤ 0)
    const back = beam({ source: { x: 0, y: 5, z: 6 }, focus: face });
    expect(faceLightAt(face, -90, [back]).total).toBe(0);
    // facing upstage (+90°) the same unit does light it
    expect(faceLightAt(face, 90, [back]).total).toBeGreaterThan(0);
  });

  it("names the key and the key-to-fill ratio", () => {
    // Two sources straight out front at 45° elevation, distances 5√2 and 10√2 m: the nearer gives 4× the light
    // (inverse-square law), so key : fill = 4.
    const near = beam({ source: { x: 0, y: -5, z: 1.55 + 5 }, focus: face });
    const far = beam({ source: { x: 0, y: -10, z: 1.55 + 10 }, focus: face });
    const f = faceLightAt(face, -90, [far, near]);
    expect(f.key).toBe(1);
    expect(f.keyToFill).toBeCloseTo(4, 9);
    // E_v of the near one: I·cos/d² with cos = 5/(5√2) → 10,000·(1/√2)/50 = 141.421 lx (cosine law)
    expect(f.keyLux).toBeCloseTo(10_000 / SQRT2 / 50, 9);
  });

  it("agrees cell by cell with faceLightAt over a random rig, culled or not (brute-force reference)", () => {
    const r = seededRandom(16);
    const beams: LitBeam[] = [];
    for (let k = 0; k < 40; k++) {
      beams.push(
        beam({
          source: { x: -7 + 14 * r(), y: -8 + 14 * r(), z: 0.3 + 8 * r() }, // some below face height: footlights
          focus: { x: -6 + 12 * r(), y: -6 + 12 * r(), z: r() < 0.5 ? 1.7 : 0 },
          coneDeg: 10 + 50 * r(),
          softnessDeg: 8 * r(),
          peakCandela: 5000 + 40_000 * r(),
          level: r(),
          family: k % 2 ? "fresnel" : "profile",
        }),
      );
    }
    const m = { kind: "face" as const, height: 1.55, facingDeg: -60 };
    const g = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: m, beams });
    const slow = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: m, beams, cull: false });
    expect(slow.evaluations).toBeGreaterThan(g.evaluations);
    const peak = Math.max(...beams.map((b) => b.peakCandela));
    for (let row = 0; row < g.rows; row++) {
      for (let col = 0; col < g.cols; col++) {
        const k = row * g.cols + col;
        expect(g.values[k]).toBe(slow.values[k]);
        if ((row + col) % 5) continue;
        const f = faceLightAt({ ...gridPoint(g, col, row), z: 1.55 }, -60, beams);
        // the grid's profile table: within 2e-4 of each beam's peak-at-distance; summed, well within 2e-4·peak
        expect(Math.abs(g.values[k] - f.total)).toBeLessThanOrEqual(2e-4 * peak + 1e-5 * f.total);
        // where the key clearly outshines all the rest together, the grid must name the same unit
        if (f.key >= 0 && f.keyLux > 1.01 * f.fillLux) expect(g.key![k]).toBe(f.key);
      }
    }
  });
});

import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  gridPoint,
  illuminanceAt,
  illuminanceGrid,
  zoneStats,
  type Family,
  type GridCells,
  type LitBeam,
} from "@/lib/optics";
import { seededRandom } from "@/bench/support/numbers";

const FAMILIES: Family[] = ["profile", "fresnel", "wash", "par", "led-wash", "cyc", "followspot"];

function rig(n: number, seed: number): LitBeam[] {
  const r = seededRandom(seed);
  const beams: LitBeam[] = [];
  for (let k = 0; k < n; k++) {
    beams.push({
      source: { x: -9 + 18 * r(), y: -6 + 14 * r(), z: 4 + 5 * r() },
      focus: { x: -8 + 16 * r(), y: -6 + 12 * r(), z: r() < 0.3 ? 1.7 : 0 },
      coneDeg: 8 + 50 * r(),
      softnessDeg: 10 * r(),
      peakCandela: 2000 + 60_000 * r(),
      level: r(),
      family: FAMILIES[k % FAMILIES.length],
    });
  }
  // Awkward beams on purpose: an open pool, an upward axis that still spills on the deck, a lens under the plane.
  beams.push({
    source: { x: 0, y: -8, z: 6 },
    focus: { x: 0, y: 20, z: 1 },
    coneDeg: 40,
    softnessDeg: 4,
    peakCandela: 30_000,
    level: 1,
  });
  beams.push({
    source: { x: 7, y: 0, z: 2 },
    focus: { x: -5, y: 0, z: 2.5 },
    coneDeg: 60,
    softnessDeg: 10,
    peakCandela: 20_000,
    level: 1,
  });
  beams.push({
    source: { x: 0, y: 0, z: -1 },
    focus: { x: 0, y: 0, z: 3 },
    coneDeg: 30,
    softnessDeg: 3,
    peakCandela: 10_000,
    level: 1,
  });
  return beams;
}

const bounds = { minX: -8, minY: -6, maxX: 8, maxY: 6 };

describe("illuminance grid", () => {
  it("has 160 × 120 cells for 16 m × 12 m at 0.1 m", () => {
    // the benchmark stage's size: ≈19,000 points (cell centres)
    const g = illuminanceGrid({ bounds, resolution: 0.1, planeZ: 0, beams: [] });
    expect([g.cols, g.rows, g.values.length]).toEqual([160, 120, 19_200]);
    expect(gridPoint(g, 0, 0)).toEqual({ x: -7.95, y: -5.95 });
  });

  it("culling gives the same grid as no culling, with fewer evaluations", () => {
    // house rule: bounding-box culling must not change the result (float32 precision)
    const beams = rig(60, 7);
    const culled = illuminanceGrid({ bounds, resolution: 0.1, planeZ: 0, beams });
    const full = illuminanceGrid({ bounds, resolution: 0.1, planeZ: 0, beams, cull: false });
    let worst = 0;
    for (let k = 0; k < full.values.length; k++) {
      const tol = 2 ** -23 * Math.max(1, Math.abs(full.values[k]));
      worst = Math.max(worst, Math.abs(culled.values[k] - full.values[k]) / tol);
    }
    expect(worst).toBeLessThanOrEqual(1);
    expect(culled.evaluations).toBeLessThan(full.evaluations / 2);
    expect(full.max).toBeGreaterThan(0);
  });

  it("keeps the spill of a beam aimed upward (no pool, but light on the deck)", () => {
    // trigonometry: a 60° cone aimed 2.4° up still reaches 27.6° below the horizon
    const up = rig(0, 1)[1];
    const g = illuminanceGrid({ bounds, resolution: 0.2, planeZ: 0, beams: [up] });
    expect(g.max).toBeGreaterThan(0);
  });

  it("agrees with the exact illuminanceAt at every cell within the profile table's 2e-4 of peak", () => {
    // DESIGN.md: the grid is the same law evaluated at many points; lib/optics/profile-table.ts states the bound
    const beams = rig(25, 11);
    const g = illuminanceGrid({ bounds, resolution: 0.25, planeZ: 1.7, beams });
    let worst = 0;
    for (let r = 0; r < g.rows; r++) {
      for (let c = 0; c < g.cols; c++) {
        const p = gridPoint(g, c, r);
        const exact = illuminanceAt({ ...p, z: 1.7 }, beams);
        // Scale: the illuminance if every beam were at its peak here (cosine and inverse-square only).
        const scale = beams.reduce((sum, b) => {
          const h = b.source.z - 1.7;
          const d2 = (p.x - b.source.x) ** 2 + (p.y - b.source.y) ** 2 + h * h;
          return h > 0 ? sum + (b.peakCandela * b.level * h) / d2 ** 1.5 : sum;
        }, 0);
        if (scale > 0) worst = Math.max(worst, Math.abs(g.values[r * g.cols + c] - exact) / scale);
      }
    }
    expect(worst).toBeLessThan(2e-4);
    expect(worst).toBeGreaterThan(0); // the grid really does use the table, not the exact curve
  });

  it("rejects a zero resolution or an empty area", () => {
    // house rule: readable RangeError for invalid input
    expect(() => illuminanceGrid({ bounds, resolution: 0, planeZ: 0, beams: [] })).toThrow(/resolution/);
    expect(() => illuminanceGrid({ bounds: { ...bounds, maxX: -8 }, resolution: 0.1, planeZ: 0, beams: [] })).toThrow(
      /empty/,
    );
  });
});

describe("culling is exact for any beam", () => {
  it("culled and unculled grids match for random beams, including open pools and upward spill", () => {
    // house rule: culling must not change the grid (float32 precision)
    const coord = fc.double({ min: -12, max: 12, noNaN: true });
    fc.assert(
      fc.property(
        fc.record({ x: coord, y: coord, z: fc.double({ min: 0.2, max: 12, noNaN: true }) }),
        fc.record({ x: coord, y: coord, z: fc.double({ min: -3, max: 12, noNaN: true }) }),
        fc.double({ min: 0.5, max: 170, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.constantFrom<Family>("profile", "wash"),
        fc.constantFrom(0, 1.7),
        (source, focus, coneDeg, share, family, planeZ) => {
          fc.pre(Math.hypot(focus.x - source.x, focus.y - source.y, focus.z - source.z) > 0.01);
          const beams = [
            { source, focus, coneDeg, softnessDeg: (coneDeg / 2) * share, peakCandela: 1e4, level: 1, family },
          ];
          const input = { bounds: { minX: -6, minY: -4, maxX: 6, maxY: 4 }, resolution: 0.25, planeZ, beams };
          const a = illuminanceGrid(input);
          const b = illuminanceGrid({ ...input, cull: false });
          expect(a.values).toEqual(b.values);
        },
      ),
      { numRuns: 400 },
    );
  });
});

describe("zone statistics", () => {
  const cells: GridCells = {
    values: Float32Array.from([100, 200, 300, 400]),
    cols: 2,
    rows: 2,
    originX: 0.5,
    originY: 0.5,
    resolution: 1,
  };

  it("grid {100, 200, 300, 400} lx gives U0 0.40 and Emin/Emax 0.25", () => {
    // REFERENCE.md: U0 = Emin/Eavg (EN 12464-1, CIBSE); diversity Emin/Emax
    const s = zoneStats(cells);
    expect(s.count).toBe(4);
    expect(s.mean).toBe(250);
    expect(s.uniformity).toBeCloseTo(0.4, 12);
    expect(s.diversity).toBeCloseTo(0.25, 12);
  });

  it("counts only cells whose centres are in the polygon", () => {
    // house rule: statistics for any polygon zone
    const bottomRow = [
      { x: 0, y: 0 },
      { x: 2, y: 0 },
      { x: 2, y: 1 },
      { x: 0, y: 1 },
    ];
    expect(zoneStats(cells, bottomRow)).toEqual({
      count: 2,
      min: 100,
      mean: 150,
      max: 200,
      uniformity: 100 / 150,
      diversity: 0.5,
    });
    const none = zoneStats(cells, [
      { x: 5, y: 5 },
      { x: 6, y: 5 },
      { x: 6, y: 6 },
    ]);
    expect(none).toEqual({ count: 0, min: null, mean: null, max: null, uniformity: null, diversity: null });
    const dark = zoneStats({ ...cells, values: new Float32Array(4) });
    expect(dark.uniformity).toBeNull();
  });
});

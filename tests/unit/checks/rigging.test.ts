import { describe, expect, it } from "vitest";
import { checkRigging, liftLineShares, loadStatus, uniformEquivalent, type CheckPosition } from "@/lib/checks";
import { unit } from "./fixtures";

const batten = (rated: number | null, over: Partial<CheckPosition> = {}): CheckPosition => ({
  id: 1,
  name: "1st electric",
  kind: "overhead-pipe",
  lengthM: 10,
  ratedLoadKg: rated,
  liftLines: null,
  counterweighted: false,
  ...over,
});
const none = { cableKgPerM: 0, hardwareKgPerUnit: 0 };

describe("rated load", () => {
  it("a batten at 79 % is fine, at 80 % warned, at 101 % flagged", () => {
    // Thresholds (warn from 80 %, flag over 100 %; common practice, no source)
    expect(loadStatus(79, 100)).toBe("ok");
    expect(loadStatus(80, 100)).toBe("near");
    expect(loadStatus(100, 100)).toBe("near");
    expect(loadStatus(101, 100)).toBe("over");
    expect(loadStatus(50, null)).toBe("no-rating");
    const at = (kg: number) =>
      checkRigging({
        positions: [batten(100)],
        fixtures: [unit({ id: 1, weightKg: kg, alongM: 1 })],
        accessories: [],
        settings: none,
      });
    expect(at(79).positions[0].status).toBe("ok");
    expect(
      at(80).findings.filter((f) => f.severity === "warning" && /close to the rating/.test(f.message)),
    ).toHaveLength(1);
    expect(at(101).findings.filter((f) => f.severity === "error")).toHaveLength(1);
  });

  it("adds accessories, cable per metre over the length and the hardware allowance", () => {
    const r = checkRigging({
      positions: [batten(200)],
      fixtures: [unit({ id: 1, weightKg: 8, alongM: 2 }), unit({ id: 2, weightKg: 9, alongM: 8 })],
      accessories: [
        {
          id: 1,
          fixtureId: 1,
          kind: "scroller",
          universe: null,
          address: null,
          footprint: null,
          wattage: 50,
          weightKg: 2.5,
        },
      ],
      settings: { cableKgPerM: 0.5, hardwareKgPerUnit: 1 },
    });
    // 8 + 9 + 2.5 + 0.5 × 10 + 2 × 1 = 26.5 kg (plain sum)
    expect(r.positions[0]).toMatchObject({ fixturesKg: 17, accessoriesKg: 2.5, cableKg: 5, hardwareKg: 2 });
    expect(r.positions[0].totalKg).toBeCloseTo(26.5, 9);
  });

  it("missing weight is listed as not counted and the total says so", () => {
    const r = checkRigging({
      positions: [batten(100)],
      fixtures: [unit({ id: 1, weightKg: null })],
      accessories: [],
      settings: none,
    });
    expect(r.positions[0].notCounted).toEqual(["unit 1"]);
    expect(r.findings.some((f) => /not counted, the total is incomplete/.test(f.message))).toBe(true);
  });

  it("a multi-cell body weighs once", () => {
    const cells = [1, 2, 3, 4].map((id) => unit({ id, weightKg: 7, bodyKey: "b1" }));
    expect(
      checkRigging({ positions: [batten(null)], fixtures: cells, accessories: [], settings: none }).positions[0]
        .fixturesKg,
    ).toBe(7);
  });
});

describe("lift lines", () => {
  it("three lines: the middle carries 62.5 %", () => {
    const s = liftLineShares(3);
    expect(s[1]).toBeCloseTo(0.625, 9); // REFERENCE.md (from memory): middle of three 62.5 %
    expect(s[0]).toBeCloseTo(0.1875, 9);
  });

  it("four lines: 0.4 wL at the ends and 1.1 wL inside (beam tables, from memory)", () => {
    const s = liftLineShares(4).map((x) => x * 3); // as multiples of wL (three spans)
    s.forEach((x, i) => expect(x).toBeCloseTo([0.4, 1.1, 1.1, 0.4][i], 9));
  });

  it("agrees with an independent flexibility solution for 2–7 lines", () => {
    // Independent reference: a simple span over the outer lines, inner lines as unknown upward forces
    // chosen so the deflection at each inner line is zero (simply supported beam deflection formulas).
    for (let n = 2; n <= 7; n++) {
      const L = 1;
      const xs = Array.from({ length: n }, (_, i) => i / (n - 1));
      const inner = xs.slice(1, -1);
      const uniformDefl = (x: number) => (x * (L ** 3 - 2 * L * x * x + x ** 3)) / 24; // w = 1, EI = 1
      const pointDefl = (x: number, a: number) => {
        const b = L - a;
        return x <= a
          ? (b * x * (L * L - b * b - x * x)) / (6 * L)
          : (a * (L - x) * (L * L - a * a - (L - x) ** 2)) / (6 * L);
      };
      const m = inner.length;
      const A = inner.map((x) => inner.map((a) => pointDefl(x, a)));
      const rhs = inner.map((x) => uniformDefl(x));
      // Gaussian elimination
      for (let i = 0; i < m; i++)
        for (let k = i + 1; k < m; k++) {
          const f = A[k][i] / A[i][i];
          for (let j = i; j < m; j++) A[k][j] -= f * A[i][j];
          rhs[k] -= f * rhs[i];
        }
      const R = new Array(m).fill(0);
      for (let i = m - 1; i >= 0; i--)
        R[i] = (rhs[i] - A[i].slice(i + 1).reduce((s, v, j) => s + v * R[i + 1 + j], 0)) / A[i][i];
      const sumInnerMoment = inner.reduce((s, a, i) => s + R[i] * a, 0);
      const rRight = (0.5 - sumInnerMoment) / L;
      const rLeft = 1 - rRight - R.reduce((s, v) => s + v, 0);
      const expected = [rLeft, ...R, rRight];
      liftLineShares(n).forEach((share, i) => expect(share).toBeCloseTo(expected[i], 9));
    }
  });

  it("a position with lift lines shares its total among them", () => {
    const r = checkRigging({
      positions: [batten(500, { liftLines: 3 })],
      fixtures: [unit({ id: 1, weightKg: 100, alongM: 5 })],
      accessories: [],
      settings: none,
    });
    expect(r.positions[0].liftLineKg!.map((x) => Math.round(x * 1e6) / 1e6)).toEqual([18.75, 62.5, 18.75]);
  });
});

describe("point loads against a distributed rating", () => {
  it("a centre point load P bends a simple span like a uniform 2P (PL/4 vs WL/8)", () => {
    // Beam tables (REFERENCE.md, from memory): centre point load P ≈ uniform 2P
    expect(uniformEquivalent(10, [{ at: 5, kg: 50 }], 0).equivalentKg).toBeCloseTo(100, 9);
    expect(uniformEquivalent(10, [], 40).equivalentKg).toBeCloseTo(40, 9); // uniform is itself
    // Off-centre point load: M = P·a·b/L (beam tables)
    expect(uniformEquivalent(10, [{ at: 2, kg: 50 }], 0).maxMomentKgM).toBeCloseTo((50 * 2 * 8) / 10, 9);
  });

  it("matches a brute-force moment scan for mixed loads", () => {
    const points = [
      { at: 1.3, kg: 9 },
      { at: 4.1, kg: 12 },
      { at: 4.9, kg: 7 },
      { at: 8.8, kg: 20 },
    ];
    const L = 10,
      W = 6;
    const rL = W / 2 + points.reduce((s, p) => s + (p.kg * (L - p.at)) / L, 0);
    let best = 0;
    for (let i = 0; i <= 100000; i++) {
      const x = (i / 100000) * L;
      best = Math.max(
        best,
        rL * x - ((W / L) * x * x) / 2 - points.reduce((s, p) => (p.at < x ? s + p.kg * (x - p.at) : s), 0),
      );
    }
    expect(uniformEquivalent(L, points, W).maxMomentKgM).toBeCloseTo(best, 4);
  });

  it("a heavy unit at mid-span is warned against a rating its plain weight meets", () => {
    const r = checkRigging({
      positions: [batten(100)],
      fixtures: [unit({ id: 1, weightKg: 60, alongM: 5 })],
      accessories: [],
      settings: none,
    });
    expect(r.positions[0].status).toBe("ok");
    expect(r.positions[0].bendingEquivalentKg).toBeCloseTo(120, 9);
    expect(r.findings.some((f) => /bend the pipe/.test(f.message))).toBe(true);
  });
});

describe("counterweight", () => {
  it("a flown electric needs its hung load added to the arbor, with the caution", () => {
    const r = checkRigging({
      positions: [batten(300, { kind: "flying-electric", counterweighted: true })],
      fixtures: [unit({ id: 1, weightKg: 40 }), unit({ id: 2, weightKg: 40 })],
      accessories: [],
      settings: { cableKgPerM: 1, hardwareKgPerUnit: 1 },
    });
    expect(r.positions[0].arborAddKg).toBeCloseTo(92, 9); // 80 + 10 + 2 (plain sum)
    expect(r.findings.some((f) => /Never release an out-of-weight set/.test(f.message))).toBe(true);
  });
});

import { describe, expect, it } from "vitest";
import { freeSpotAlong, nudgeOntoPosition, type Occupant } from "@/lib/plot/nudge";

describe("the next free spot along a position", () => {
  it("keeps a spot that is already clear", () => {
    // worked by hand: 0.45 m bodies, neighbour 1 m away → clear
    expect(freeSpotAlong({ length: 10, wanted: 3, width: 0.45, occupied: [{ along: 4, width: 0.45 }] })).toBe(3);
  });

  it("slides off a unit to the nearer side, one half-width of each away", () => {
    // worked by hand: centres must be (0.45 + 0.5)/2 = 0.475 apart; dropped at 4.1 beside a unit at 4 → 4.475
    expect(freeSpotAlong({ length: 10, wanted: 4.1, width: 0.45, occupied: [{ along: 4, width: 0.5 }] })).toBeCloseTo(
      4.475,
      12,
    );
    // dropped at 3.95 → the lower side, 3.525
    expect(freeSpotAlong({ length: 10, wanted: 3.95, width: 0.45, occupied: [{ along: 4, width: 0.5 }] })).toBeCloseTo(
      3.525,
      12,
    );
  });

  it("skips a row of units to the first gap wide enough", () => {
    // worked by hand: 0.5 m bodies at 2.0, 2.5, 3.0 (touching); dropped on 2.6 → 3.5 is 0.9 away, 1.5 is 1.1 away
    const row: Occupant[] = [2, 2.5, 3].map((along) => ({ along, width: 0.5 }));
    expect(freeSpotAlong({ length: 10, wanted: 2.6, width: 0.5, occupied: row })).toBeCloseTo(3.5, 12);
    // a 0.4 m gap between 2.0 and 2.9 is too narrow for a 0.5 m body: dropped at 2.4 it goes out of the
    // row, to 1.5 (0.9 away) rather than 3.4 (1.0 away)
    const gapped: Occupant[] = [2, 2.9].map((along) => ({ along, width: 0.5 }));
    expect(freeSpotAlong({ length: 10, wanted: 2.4, width: 0.5, occupied: gapped })).toBeCloseTo(1.5, 12);
  });

  it("a drop right on a unit's centre goes further along (either side is as near)", () => {
    expect(freeSpotAlong({ length: 10, wanted: 5, width: 0.4, occupied: [{ along: 5, width: 0.4 }] })).toBeCloseTo(
      5.4,
      12,
    );
  });

  it("stays on the position and answers null when the position is full", () => {
    // a 1 m pipe with units at 0.25 and 0.75 (0.5 m each) has no room for a third
    const full: Occupant[] = [0.25, 0.75].map((along) => ({ along, width: 0.5 }));
    expect(freeSpotAlong({ length: 1, wanted: 0.5, width: 0.5, occupied: full })).toBeNull();
    // near the end: the spot past the last unit would be off the pipe, so it goes the other way
    expect(freeSpotAlong({ length: 3, wanted: 2.95, width: 0.5, occupied: [{ along: 2.9, width: 0.5 }] })).toBeCloseTo(
      2.4,
      12,
    );
  });

  it("agrees with a brute-force search over 1 mm steps on random pipes", () => {
    // independent reference: every millimetre along the pipe, the nearest one that clears every unit
    let seed = 7;
    const rand = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    for (let trial = 0; trial < 200; trial++) {
      const length = 2 + Math.round(rand() * 8000) / 1000;
      const width = 0.2 + Math.round(rand() * 500) / 1000;
      const occupied: Occupant[] = Array.from({ length: Math.floor(rand() * 8) }, () => ({
        along: Math.round(rand() * length * 1000) / 1000,
        width: 0.2 + Math.round(rand() * 500) / 1000,
      }));
      const wanted = Math.round(rand() * length * 1000) / 1000;
      let bestMm: number | null = null;
      for (let mm = 0; mm <= Math.round(length * 1000); mm++) {
        const s = mm / 1000;
        const free = occupied.every((o) => Math.abs(s - o.along) >= (width + o.width) / 2 - 1e-9);
        if (free && (bestMm === null || Math.abs(s - wanted) < Math.abs(bestMm / 1000 - wanted))) bestMm = mm;
      }
      const got = freeSpotAlong({ length, wanted, width, occupied });
      if (bestMm === null) expect(got).toBeNull();
      else {
        expect(got).not.toBeNull();
        // the exact spot is within a millimetre of the sampled one, and no farther from the drop
        expect(Math.abs(got! - wanted)).toBeLessThanOrEqual(Math.abs(bestMm / 1000 - wanted) + 1e-9);
        expect(Math.abs(Math.abs(got! - wanted) - Math.abs(bestMm / 1000 - wanted))).toBeLessThan(0.0011);
        for (const o of occupied) expect(Math.abs(got! - o.along)).toBeGreaterThanOrEqual((width + o.width) / 2 - 1e-9);
      }
    }
  });
});

describe("nudging in plan onto a line position", () => {
  const pipe = { x1: -5, y1: 2, x2: 5, y2: 2 }; // 10 m across the stage at 2 m upstage

  it("moves the point along the pipe, never off it", () => {
    const r = nudgeOntoPosition(pipe, { x: 1.1, y: 2 }, 0.45, [{ x: 1, y: 2, width: 0.45 }])!;
    expect(r.moved).toBe(true);
    expect(r.point.y).toBeCloseTo(2, 12);
    expect(r.point.x).toBeCloseTo(1.45, 12); // 1 + (0.45 + 0.45)/2, by hand
  });

  it("leaves a free drop where it was", () => {
    const r = nudgeOntoPosition(pipe, { x: -3, y: 2 }, 0.45, [{ x: 1, y: 2, width: 0.45 }])!;
    expect(r).toEqual({ point: { x: -3, y: 2 }, moved: false });
  });

  it("works along a diagonal pipe (a 3-4-5 triangle)", () => {
    const diag = { x1: 0, y1: 0, x2: 3, y2: 4 }; // 5 m long
    const r = nudgeOntoPosition(diag, { x: 1.5, y: 2 }, 0.5, [{ x: 1.5, y: 2, width: 0.5 }])!;
    // centre at 2.5 m along → 3.0 m along: (3·0.6, 3·0.8) = (1.8, 2.4), by hand
    expect(r.point.x).toBeCloseTo(1.8, 12);
    expect(r.point.y).toBeCloseTo(2.4, 12);
  });

  it("answers null when a short position is full", () => {
    const stub = { x1: 0, y1: 0, x2: 0.9, y2: 0 };
    expect(
      nudgeOntoPosition(stub, { x: 0.45, y: 0 }, 0.45, [
        { x: 0.2, y: 0, width: 0.45 },
        { x: 0.7, y: 0, width: 0.45 },
      ]),
    ).toBeNull();
  });
});

// The look on the plan: pools add up, and one exposure keeps the busiest spot short of white.
import { describe, expect, it } from "vitest";
import { insideEllipse, lookExposure, peakLevelSum, WHITE_AT } from "@/lib/cues/look-exposure";

const circle = (x: number, y: number, r: number) => ({ centre: { x, y }, semiMajor: r, semiMinor: r, rotationDeg: 0 });
const stage = { minX: -5, minY: 0, maxX: 5, maxY: 8 };

describe("inside a pool", () => {
  it("follows the ellipse's rotation", () => {
    const long = { centre: { x: 0, y: 0 }, semiMajor: 3, semiMinor: 1, rotationDeg: 90 }; // long axis upstage
    expect(insideEllipse(long, 0, 2.5)).toBe(true); // ellipse equation (u/a)² + (v/b)² ≤ 1, from memory: (2.5/3)² < 1
    expect(insideEllipse(long, 2.5, 0)).toBe(false); // (2.5/1)² > 1 across the short axis
  });
});

describe("exposure", () => {
  it("leaves sparse looks alone", () => {
    expect(lookExposure([{ outer: circle(0, 4, 1), level: 0.5 }], stage)).toBe(1);
    expect(lookExposure([], stage)).toBe(1);
  });

  it("scales down where pools pile up, keeping levels in proportion", () => {
    const pile = [0.9, 0.8, 0.7, 0.6].map((level) => ({ outer: circle(0, 4, 2), level }));
    expect(peakLevelSum(pile, stage)).toBeCloseTo(3.0, 6); // every grid point in the shared circle sees all four
    expect(lookExposure(pile, stage)).toBeCloseTo(WHITE_AT / 3.0, 6);
  });

  it("counts only pools that overlap at one spot", () => {
    const apart = [
      { outer: circle(-3, 4, 1), level: 1 },
      { outer: circle(3, 4, 1), level: 1 },
    ];
    expect(peakLevelSum(apart, stage)).toBe(1);
    expect(peakLevelSum([{ outer: circle(0, 4, 1), level: 0 }], stage)).toBe(0); // a pool at 0 adds no light
  });
});

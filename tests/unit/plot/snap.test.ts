import { describe, expect, it } from "vitest";
import { METRES_PER_FOOT } from "@/lib/optics";
import { gridStep } from "@/lib/plot/grid";
import { snapPoint } from "@/lib/plot/snap";

describe("grid snapping while drawing", () => {
  it("moves a point to the nearest crossing of the metric grid", () => {
    // nearest multiple of 0.5 m on each axis; arithmetic, no source
    expect(snapPoint({ x: 3.26, y: -1.74 }, 0.5)).toEqual({ x: 3.5, y: -1.5 });
    expect(snapPoint({ x: -0.24, y: 0.26 }, 0.5)).toEqual({ x: 0, y: 0.5 });
  });

  it("snaps to whole feet on an imperial grid", () => {
    const step = gridStep(40 / METRES_PER_FOOT, "imperial"); // 40 px a foot: the 1 ft step
    expect(step).toBeCloseTo(METRES_PER_FOOT, 12); // NIST SP 811: 1 ft = 0.3048 m
    const p = snapPoint({ x: 10.1 * METRES_PER_FOOT, y: 2.6 * METRES_PER_FOOT }, step);
    expect(p.x / METRES_PER_FOOT).toBeCloseTo(10, 6);
    expect(p.y / METRES_PER_FOOT).toBeCloseTo(3, 6);
  });

  it("leaves the point alone without a usable step", () => {
    expect(snapPoint({ x: 1.234, y: 5.678 }, 0)).toEqual({ x: 1.234, y: 5.678 });
  });
});

import { describe, expect, it } from "vitest";
import {
  fitBounds,
  planToScreen,
  screenToPlan,
  visiblePlanBounds,
  zoomAbout,
  MAX_SCALE,
  MIN_SCALE,
} from "@/lib/plot/view";

const v = { scale: 50, ox: 400, oy: 300 };

describe("plan ↔ screen with the audience at the bottom", () => {
  // DESIGN.md coordinates: +x is stage left (right of the plan seen from the house), +y upstage.
  it("draws stage left to the right and upstage toward the top of the screen", () => {
    const origin = planToScreen(v, { x: 0, y: 0 });
    const sl = planToScreen(v, { x: 2, y: 0 });
    const us = planToScreen(v, { x: 0, y: 3 });
    expect(sl.x).toBeGreaterThan(origin.x); // common practice, no source: plan read from the house
    expect(us.y).toBeLessThan(origin.y);
    expect(sl).toEqual({ x: 500, y: 300 });
    expect(us).toEqual({ x: 400, y: 150 });
  });
  it("round-trips any point", () => {
    for (const p of [
      { x: -7.25, y: 11.5 },
      { x: 0.001, y: -12 },
      { x: 3, y: 3 },
    ]) {
      const back = screenToPlan(v, planToScreen(v, p));
      expect(back.x).toBeCloseTo(p.x, 12);
      expect(back.y).toBeCloseTo(p.y, 12);
    }
  });
});

describe("zoom about the pointer", () => {
  it("keeps the plan point under the pointer where it was", () => {
    const pointer = { x: 123, y: 456 };
    const before = screenToPlan(v, pointer);
    const z = zoomAbout(v, pointer, 1.7);
    expect(z.scale).toBeCloseTo(85, 12);
    const after = screenToPlan(z, pointer);
    expect(after.x).toBeCloseTo(before.x, 10);
    expect(after.y).toBeCloseTo(before.y, 10);
  });
  it("stops at the zoom limits", () => {
    expect(zoomAbout(v, { x: 0, y: 0 }, 1e6).scale).toBe(MAX_SCALE);
    expect(zoomAbout(v, { x: 0, y: 0 }, 1e-6).scale).toBe(MIN_SCALE);
  });
});

describe("fit to stage", () => {
  it("shows the whole rectangle, centred, within the margin", () => {
    const b = { minX: -8, minY: -3, maxX: 8, maxY: 11 };
    const size = { width: 1000, height: 600 };
    const f = fitBounds(b, size, 20);
    const seen = visiblePlanBounds(f, size);
    expect(seen.minX).toBeLessThanOrEqual(b.minX);
    expect(seen.maxX).toBeGreaterThanOrEqual(b.maxX);
    expect(seen.minY).toBeLessThanOrEqual(b.minY + 1e-9);
    expect(seen.maxY).toBeGreaterThanOrEqual(b.maxY - 1e-9);
    // height limits here: (600 − 40) / 14 m = 40 px per metre
    expect(f.scale).toBeCloseTo(40, 12);
    const centre = planToScreen(f, { x: 0, y: 4 });
    expect(centre.x).toBeCloseTo(500, 9);
    expect(centre.y).toBeCloseTo(300, 9);
  });
});

// The pure maths behind the view navigation shared by the plot and the cue plan: wheel zoom about the
// pointer and the two-finger pinch. Checked by sampling many views and pointers (seeded, so a failure
// repeats) against what the hand expects, computed here from plan ↔ screen alone.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  MAX_SCALE,
  MIN_SCALE,
  pinchStep,
  planToScreen,
  screenToPlan,
  wheelZoomFactor,
  zoomAbout,
  type View,
} from "@/lib/plot/view";

const SEED = 20261205;
const viewArb = fc.record({
  scale: fc.double({ min: 5, max: 500, noNaN: true }),
  ox: fc.double({ min: -2000, max: 2000, noNaN: true }),
  oy: fc.double({ min: -2000, max: 2000, noNaN: true }),
});
const screenArb = fc.record({
  x: fc.double({ min: 0, max: 1600, noNaN: true }),
  y: fc.double({ min: 0, max: 1000, noNaN: true }),
});
const near = (a: { x: number; y: number }, b: { x: number; y: number }, tol: number) =>
  Math.hypot(a.x - b.x, a.y - b.y) <= tol;

describe("zoom about a point keeps that point fixed", () => {
  it("leaves the plan point under the pointer under the pointer, for any view, pointer and wheel turn", () => {
    fc.assert(
      fc.property(viewArb, screenArb, fc.integer({ min: -600, max: 600 }), fc.boolean(), (v, s, deltaY, ctrl) => {
        const before = screenToPlan(v, s);
        const z = zoomAbout(v, s, wheelZoomFactor(deltaY, ctrl));
        // back on screen, the same plan point lands where the pointer is (to a thousandth of a pixel)
        return near(
          planToScreen(z, before),
          s,
          1e-6 * Math.max(1, Math.abs(s.x) + Math.abs(s.y) + Math.abs(v.ox) + Math.abs(v.oy)),
        );
      }),
      { seed: SEED, numRuns: 2000 },
    );
  });

  it("keeps the point fixed even where the scale stops at its limits", () => {
    const v = { scale: 1500, ox: 300, oy: 700 };
    const s = { x: 811, y: 123 };
    const before = screenToPlan(v, s);
    const z = zoomAbout(v, s, 10);
    expect(z.scale).toBe(MAX_SCALE);
    expect(near(planToScreen(z, before), s, 1e-9)).toBe(true);
    expect(zoomAbout(v, s, 1e-9).scale).toBe(MIN_SCALE);
  });

  it("undoes itself: zooming in and out by the same turn about one point gives the view back", () => {
    fc.assert(
      fc.property(viewArb, screenArb, fc.integer({ min: -300, max: 300 }), (v, s, d) => {
        const back = zoomAbout(zoomAbout(v, s, wheelZoomFactor(d, false)), s, wheelZoomFactor(-d, false));
        return (
          Math.abs(back.scale - v.scale) < 1e-9 * v.scale &&
          Math.abs(back.ox - v.ox) < 1e-6 &&
          Math.abs(back.oy - v.oy) < 1e-6
        );
      }),
      { seed: SEED, numRuns: 500 },
    );
  });

  it("zooms in when the wheel turns away from the user (negative deltaY), out when toward", () => {
    // exp(0.0015 × 100) = 1.161834…: hand-worked from the curve's constant
    expect(wheelZoomFactor(-100, false)).toBeCloseTo(1.161834, 6);
    expect(wheelZoomFactor(100, false)).toBeCloseTo(1 / 1.161834, 6);
    // a trackpad pinch arrives as ctrl+wheel with small steps: exp(0.01 × 10) = 1.105171…
    expect(wheelZoomFactor(-10, true)).toBeCloseTo(1.105171, 6);
  });
});

describe("two-finger pinch", () => {
  const finger = fc.record({
    x: fc.double({ min: 0, max: 1200, noNaN: true }),
    y: fc.double({ min: 0, max: 900, noNaN: true }),
  });

  it("keeps each finger on its own plan point when the hand only spreads and moves (no turn)", () => {
    // Independent reference: each finger's plan point, read before, must be under that finger after.
    fc.assert(
      fc.property(
        viewArb,
        finger,
        finger,
        fc.double({ min: 0.6, max: 1.6, noNaN: true }),
        fc.double({ min: -80, max: 80, noNaN: true }),
        fc.double({ min: -80, max: 80, noNaN: true }),
        (v, a, b, k, dx, dy) => {
          fc.pre(Math.hypot(b.x - a.x, b.y - a.y) > 20); // two distinct fingers
          fc.pre(v.scale * k > MIN_SCALE && v.scale * k < MAX_SCALE);
          const c = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
          const moved = (p: { x: number; y: number }) => ({
            x: c.x + k * (p.x - c.x) + dx,
            y: c.y + k * (p.y - c.y) + dy,
          });
          const [a2, b2] = [moved(a), moved(b)];
          const next = pinchStep(v, [a, b], [a2, b2]);
          const tol = 1e-6 * (1 + Math.abs(v.ox) + Math.abs(v.oy));
          return (
            near(planToScreen(next, screenToPlan(v, a)), a2, tol) &&
            near(planToScreen(next, screenToPlan(v, b)), b2, tol)
          );
        },
      ),
      { seed: SEED, numRuns: 1000 },
    );
  });

  it("scales by how far the fingers spread: 200 px apart to 300 px is 1.5 times the scale", () => {
    const v: View = { scale: 40, ox: 500, oy: 400 };
    const next = pinchStep(
      v,
      [
        { x: 400, y: 300 },
        { x: 600, y: 300 },
      ],
      [
        { x: 350, y: 300 },
        { x: 650, y: 300 },
      ],
    );
    expect(next.scale).toBeCloseTo(60, 12);
    // the midpoint (500, 300) did not move, so its plan point stays put
    const m = screenToPlan(v, { x: 500, y: 300 });
    expect(planToScreen(next, m).x).toBeCloseTo(500, 9);
    expect(planToScreen(next, m).y).toBeCloseTo(300, 9);
  });

  it("follows the hand's midpoint when the fingers turn or stop at a zoom limit", () => {
    fc.assert(
      fc.property(viewArb, finger, finger, finger, finger, (v, a, b, a2, b2) => {
        fc.pre(Math.hypot(b.x - a.x, b.y - a.y) > 1 && Math.hypot(b2.x - a2.x, b2.y - a2.y) > 1);
        const m0 = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
        const m1 = { x: (a2.x + b2.x) / 2, y: (a2.y + b2.y) / 2 };
        const next = pinchStep(v, [a, b], [a2, b2]);
        return near(planToScreen(next, screenToPlan(v, m0)), m1, 1e-6 * (1 + Math.abs(v.ox) + Math.abs(v.oy)));
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  it("changes nothing when the fingers rest, and never divides by zero when they touch", () => {
    const v: View = { scale: 33, ox: 120, oy: 640 };
    const a = { x: 10, y: 20 };
    const b = { x: 210, y: 20 };
    expect(pinchStep(v, [a, b], [a, b])).toEqual(v);
    const touching = pinchStep(
      v,
      [a, a],
      [
        { x: 15, y: 25 },
        { x: 15, y: 25 },
      ],
    );
    expect(touching.scale).toBe(33);
    expect(touching.ox).toBeCloseTo(125, 12);
    expect(touching.oy).toBeCloseTo(645, 12);
  });
});

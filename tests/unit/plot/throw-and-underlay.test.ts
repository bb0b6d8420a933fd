import { describe, expect, it } from "vitest";
import { beamAim } from "@/lib/optics";
import { markForThrow } from "@/lib/plot/throw-to-mark";
import { alignPoint, calibrate, imageToPlan, planToImage } from "@/lib/plot/underlay";

const describe_ = (m: number) => `${m.toFixed(2)} m`;

describe("typing a throw moves the mark along the bearing", () => {
  const source = { x: 0, y: -7, z: 7.5 };
  it("gives exactly that throw at the aim height, on the same bearing", () => {
    const r = markForThrow({ source, mark: { x: 2, y: 1 }, aimZ: 1.7, throwM: 12, describe: describe_ });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // Pythagoras, checked through the optics module's own throw
    expect(beamAim({ source, focus: { ...r.mark, z: 1.7 } }).throw).toBeCloseTo(12, 9);
    const before = Math.atan2(1 - -7, 2 - 0);
    const after = Math.atan2(r.mark.y - source.y, r.mark.x - source.x);
    expect(after).toBeCloseTo(before, 12);
  });
  it("refuses a throw shorter than the drop and says why", () => {
    const r = markForThrow({ source, mark: { x: 2, y: 1 }, aimZ: 0, throwM: 5, describe: describe_ });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/shorter than the drop.*7\.50 m/);
  });
  it("refuses when the beam points straight down (no bearing)", () => {
    const r = markForThrow({ source, mark: { x: 0, y: -7 }, aimZ: 0, throwM: 9, describe: describe_ });
    expect(r.ok).toBe(false);
  });
});

describe("underlay placement and two-point calibration", () => {
  const u = { metresPerPixel: 0.01, offsetX: -5, offsetY: 12, rotationDeg: 0 };
  it("maps image pixels down the image to downstage", () => {
    expect(imageToPlan(u, { x: 100, y: 200 })).toEqual({ x: -4, y: 10 });
  });
  it("round-trips with rotation", () => {
    const r = { ...u, rotationDeg: 17 };
    const back = planToImage(r, imageToPlan(r, { x: 321, y: 654 }));
    expect(back.x).toBeCloseTo(321, 9);
    expect(back.y).toBeCloseTo(654, 9);
  });
  it("rescales so the two picked points are the typed distance apart, keeping the first one put", () => {
    const a = imageToPlan(u, { x: 100, y: 100 });
    const b = imageToPlan(u, { x: 500, y: 400 }); // 500 px apart → 5 m shown
    const c = calibrate(u, a, b, 10);
    expect(c.metresPerPixel).toBeCloseTo(0.02, 12);
    const a2 = imageToPlan(c, { x: 100, y: 100 });
    const b2 = imageToPlan(c, { x: 500, y: 400 });
    expect(a2.x).toBeCloseTo(a.x, 9);
    expect(a2.y).toBeCloseTo(a.y, 9);
    expect(Math.hypot(b2.x - a2.x, b2.y - a2.y)).toBeCloseTo(10, 9);
  });
  it("refuses a zero distance or two identical points", () => {
    expect(() => calibrate(u, { x: 0, y: 0 }, { x: 1, y: 0 }, 0)).toThrow(RangeError);
    expect(() => calibrate(u, { x: 1, y: 1 }, { x: 1, y: 1 }, 3)).toThrow(/two different points/);
  });
  it("aligns a picked image point onto the datum × centre line", () => {
    const from = imageToPlan(u, { x: 500, y: 1200 });
    const moved = alignPoint(u, from, { x: 0, y: 0 });
    const p = imageToPlan(moved, { x: 500, y: 1200 });
    expect(p.x).toBeCloseTo(0, 12);
    expect(p.y).toBeCloseTo(0, 12);
  });
});

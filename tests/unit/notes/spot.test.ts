import { describe, expect, it } from "vitest";
import { rankSpotContributions, type SpotSource } from "@/lib/notes/spot";

// Hand-worked point-source cases: E = I·cos θ / d² on a horizontal surface (inverse-square and cosine law,
// IES Lighting Handbook, "point method"). Every beam is aimed at the point itself, so the unit sends its
// peak intensity I toward it; the surface faces straight up, so cos θ = height / distance.
const point = { x: 0, y: 0, z: 0 };
const aimedAt = (fixtureId: number, x: number, y: number, h: number, candela: number, level = 1): SpotSource => ({
  fixtureId,
  label: `unit ${fixtureId}`,
  channel: fixtureId,
  beam: { source: { x, y, z: h }, focus: point, coneDeg: 20, softnessDeg: 2, peakCandela: candela, level },
});

describe("what lights this spot: ranking by lux", () => {
  it("ranks hand-worked inverse-square cases", () => {
    const { total, contributions } = rankSpotContributions(point, [
      // Straight down from 5 m, 10,000 cd: E = 10,000 / 5² = 400 lx.
      aimedAt(1, 0, 0, 5, 10_000),
      // 3 m off to the side and 4 m up (d = 5 m, cos θ = 4/5), 20,000 cd: E = 20,000 · 0.8 / 25 = 640 lx.
      aimedAt(2, 3, 0, 4, 20_000),
      // Straight down from 10 m at half output, 10,000 cd: E = 5,000 / 100 = 50 lx.
      aimedAt(3, 0, 0, 10, 10_000, 0.5),
      // 6 m off and 8 m up (d = 10 m, cos θ = 0.8), 50,000 cd: E = 50,000 · 0.8 / 100 = 400 lx (ties unit 1).
      aimedAt(4, 0, 6, 8, 50_000),
    ]);
    expect(contributions.map((c) => c.fixtureId)).toEqual([2, 1, 4, 3]);
    expect(contributions[0].lux).toBeCloseTo(640, 6);
    expect(contributions[1].lux).toBeCloseTo(400, 6);
    expect(contributions[2].lux).toBeCloseTo(400, 6);
    expect(contributions[3].lux).toBeCloseTo(50, 6);
    expect(total).toBeCloseTo(1490, 6);
    expect(contributions[0].share).toBeCloseTo(640 / 1490, 9);
  });

  it("leaves out a unit aimed elsewhere whose beam does not reach the point, and one at level 0", () => {
    // Aimed 4 m away from 5 m up: the point is ~38.7° off axis (atan(4/5)), far outside a 20° cone.
    const elsewhere: SpotSource = {
      ...aimedAt(5, 0, 0, 5, 10_000),
      beam: { ...aimedAt(5, 0, 0, 5, 10_000).beam, focus: { x: 4, y: 0, z: 0 } },
    };
    const { contributions, total } = rankSpotContributions(point, [
      elsewhere,
      aimedAt(6, 0, 0, 5, 10_000, 0),
      aimedAt(7, 0, 0, 2, 1_000),
    ]);
    // Only unit 7: 1,000 / 2² = 250 lx.
    expect(contributions.map((c) => c.fixtureId)).toEqual([7]);
    expect(total).toBeCloseTo(250, 6);
    expect(contributions[0].share).toBe(1);
  });

  it("doubling the distance straight down quarters the light (inverse-square law)", () => {
    const near = rankSpotContributions(point, [aimedAt(1, 0, 0, 3, 9_000)]).total;
    const far = rankSpotContributions(point, [aimedAt(1, 0, 0, 6, 9_000)]).total;
    expect(near).toBeCloseTo(1000, 6); // 9,000 / 3²
    expect(far).toBeCloseTo(250, 6); // 9,000 / 6²
  });
});

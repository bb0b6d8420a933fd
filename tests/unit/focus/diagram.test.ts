import { describe, expect, it } from "vitest";
import { clipSegment } from "@/lib/focus/diagram";
import { outlineLandmarks } from "@/lib/focus/landmarks";
import { makeFixture, PRODUCTION } from "./fixture-builder";
import { diagramMarkup } from "./render-markup";

/** The x extent of the dashed outer outline (an unrotated <ellipse>), in plan metres (1 SVG unit = 1 m). */
function outlineXs(svg: string): number[] {
  const [, cx, rx] = svg
    .match(/<ellipse cx="([^"]+)" cy="[^"]+" rx="([^"]+)" ry="[^"]+" class="fc-outline"(?:\/>|><\/ellipse>)/)!
    .map(Number);
  return [cx - rx, cx + rx];
}

describe("the chart diagram is drawn to scale", () => {
  it("a straight-down 26° beam from 6 m draws a pool 1.38521 m in radius", () => {
    const f = makeFixture({ lens: { x: 2, y: 3, z: 6 }, mark: { x: 2, y: 3 }, coneDeg: 26 });
    const xs = outlineXs(diagramMarkup({ fixture: f, landmarks: outlineLandmarks(PRODUCTION), units: "metric" }));
    // REFERENCE.md pool ellipse table: h 6, φ 0°, α 13° → a = 1.38521 (rounded to 1 mm in the SVG)
    expect(Math.max(...xs) - 2).toBeCloseTo(1.38521, 2);
    expect(2 - Math.min(...xs)).toBeCloseTo(1.38521, 2);
  });

  it("draws the mark, the cut, the arrow and the stage lines, and escapes names", () => {
    const f = makeFixture({
      lens: { x: 0, y: -8, z: 7 },
      mark: { x: 0, y: 0.5 },
      focusPointName: "<Area & 1>",
      shutterCuts: [{ label: "bottom", a: { x: -4, y: -1.5 }, b: { x: 4, y: -1.5 } }],
    });
    const svg = diagramMarkup({
      fixture: f,
      landmarks: outlineLandmarks(PRODUCTION),
      units: "metric",
      cutLabels: ["T"],
    });
    expect(svg).toContain('class="fc-cut"');
    expect(svg).toContain('marker-end="url(#fc-head)"');
    expect(svg).toContain("&lt;Area &amp; 1&gt;");
    expect(svg).toMatch(/>lip<\/text>/);
    expect(svg).toMatch(/>T<\/text>/);
    expect(svg).toContain("pool at the deck");
  });

  it("an open pool shows the beam's width at the mark instead", () => {
    const f = makeFixture({ lens: { x: -6.5, y: 5, z: 2.4 }, mark: { x: 2.6, y: 5 }, aim: "head", coneDeg: 36 });
    const svg = diagramMarkup({ fixture: f, landmarks: [], units: "metric" });
    expect(svg).toContain("pool open: beam width at the mark");
    const r = Number(svg.match(/<circle cx="[^"]+" cy="[^"]+" r="([^"]+)" class="fc-outline"/)![1]);
    // trigonometry: radius = throw · tan(θ/2), throw = hypot(9.1, 0.7)
    expect(r).toBeCloseTo(Math.hypot(9.1, 0.7) * Math.tan((18 * Math.PI) / 180), 2);
  });
});

describe("stage lines are cut to the diagram's view", () => {
  const box = { minX: 0, minY: 0, maxX: 4, maxY: 4 };
  it("keeps the part of a long line inside the box", () => {
    // plane geometry (Liang–Barsky clipping): y = 2 from x −10 to 10 meets the box at x 0 and 4
    expect(clipSegment({ x: -10, y: 2 }, { x: 10, y: 2 }, box)).toEqual([
      { x: 0, y: 2 },
      { x: 4, y: 2 },
    ]);
    // the diagonal y = x from (−2,−2) to (6,6) enters at (0,0) and leaves at (4,4)
    expect(clipSegment({ x: -2, y: -2 }, { x: 6, y: 6 }, box)).toEqual([
      { x: 0, y: 0 },
      { x: 4, y: 4 },
    ]);
  });
  it("drops a line that misses the box and keeps one wholly inside", () => {
    expect(clipSegment({ x: -5, y: 5 }, { x: 10, y: 5 }, box)).toBeNull(); // plane geometry: y = 5 is above the box
    expect(clipSegment({ x: 1, y: 1 }, { x: 3, y: 2 }, box)).toEqual([
      { x: 1, y: 1 },
      { x: 3, y: 2 },
    ]);
  });
});

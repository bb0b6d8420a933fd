import { describe, expect, it } from "vitest";
import { buildFocusChart } from "@/lib/focus/chart-model";
import { offsetFromMark } from "@/lib/focus/words";
import { makeFixture, PRODUCTION } from "./fixture-builder";

const value = (rows: { key: string; value: string }[], key: string) => rows.find((r) => r.key === key)?.value;

describe("focus chart: the mark in deck words", () => {
  it('one wording for the datum on the whole chart: mark, lens and cuts all say "of the setting line"', () => {
    // DESIGN.md, coordinates: "1.50 m US of the setting line" (the design's example wording)
    const f = makeFixture({
      mark: { x: 1.2, y: 2.5 },
      shutterCuts: [{ label: "top", a: { x: -3, y: 3.4 }, b: { x: 3, y: 3.4 } }],
    });
    const chart = buildFocusChart(f, PRODUCTION);
    const text = [...chart.focus.map((r) => r.value), ...chart.cuts.map((c) => c.words)].join(" | ");
    expect(text).toContain("2.50 m US of the setting line");
    expect(text).toContain("8.00 m DS of the setting line");
    expect(text).toContain("upstage edge cut at 3.40 m US of the setting line");
    expect(text).not.toMatch(/of setting line|on setting line/);
  });

  it("metric: 1.20 m SL of CL, 2.50 m US of the setting line", () => {
    const chart = buildFocusChart(makeFixture({ mark: { x: 1.2, y: 2.5 } }), PRODUCTION);
    // common practice, no source: deck words as the design states them (x > 0 stage left, y > 0 upstage)
    expect(value(chart.focus, "mark")).toBe("1.20 m SL of CL, 2.50 m US of the setting line");
  });

  it("stage right and downstage of the datum, with a named focus point", () => {
    const chart = buildFocusChart(makeFixture({ mark: { x: -3, y: -0.75 }, focusPointName: "Area 1" }), PRODUCTION);
    expect(value(chart.focus, "mark")).toBe("Area 1: 3.00 m SR of CL, 0.75 m DS of the setting line");
  });

  it("imperial, to the half inch: 1.20 m = 3' 11 1/2\", 2.50 m = 8' 2 1/2\"", () => {
    const chart = buildFocusChart(makeFixture({ mark: { x: 1.2, y: 2.5 } }), {
      ...PRODUCTION,
      displayUnits: "imperial",
      datumName: "plaster line",
    });
    // NIST SP 811: 1 in = 25.4 mm exactly. 1.2 m = 47.244 in, nearest half inch 47.0 → 3' 11"
    // 2.5 m = 98.425 in → 98.5 in → 8' 2 1/2"
    expect(value(chart.focus, "mark")).toBe(`3' 11" SL of CL, 8' 2 1/2" US of the plaster line`);
  });

  it("on the centre line and on the datum", () => {
    const chart = buildFocusChart(makeFixture({ mark: { x: 0, y: 0 } }), PRODUCTION);
    expect(value(chart.focus, "mark")).toBe("on CL, on the setting line");
  });

  it("pool centre relative to the mark sits beyond it, away from the lens", () => {
    // A front-of-house lens (downstage of the mark) throws the pool's centre upstage of the mark:
    // the conic section's centre lies beyond the axis hit (REFERENCE.md, the pool ellipse).
    const chart = buildFocusChart(makeFixture({ lens: { x: 0, y: -8, z: 7 }, mark: { x: 0, y: 2 } }), PRODUCTION);
    // REFERENCE.md: centre lies h·tanφ·sin²α/A beyond the axis hit; h 7, tanφ 10/7, α 13°:
    // A = cos²13° − 100/149 = 0.278256 → 7·(10/7)·0.050603/0.278256 = 1.8186 m → "1.82 m US"
    expect(value(chart.focus, "deckPool")).toMatch(/; centre 1\.82 m US of the mark$/);
    expect(offsetFromMark({ x: 0.5, y: -0.25 }, { x: 0, y: 0 }, "metric")).toBe("0.25 m DS, 0.50 m SL of the mark");
  });

  it("straight-down pool at 6 m, 26° cone: 2.77 m across (REFERENCE: a = 1.38521)", () => {
    const chart = buildFocusChart(
      makeFixture({ lens: { x: 0, y: 3, z: 6 }, mark: { x: 0, y: 3 }, coneDeg: 26 }),
      PRODUCTION,
    );
    // REFERENCE.md pool ellipse table: h 6, φ 0°, α 13° → a = b = 1.38521, so 2a = 2.77042 → "2.77 m"
    expect(value(chart.focus, "deckPool")).toBe("2.77 m along × 2.77 m across; centre on the mark");
    expect(value(chart.focus, "lightFrom")).toBe("from directly above, 90° down");
  });

  it("names the light's direction and the edge word", () => {
    const chart = buildFocusChart(
      makeFixture({ lens: { x: -4, y: -6, z: 8 }, mark: { x: 0, y: 0 }, coneDeg: 20, softnessDeg: 1 }),
      PRODUCTION,
    );
    // atan2(4, 6) = 33.7° off the centre line; elevation atan(8 / 7.211) = 47.97° → 48° down (trigonometry)
    expect(value(chart.focus, "lightFrom")).toBe("from DSR, 34° off the centre line, 48° down");
    // house convention in lib/optics/beam-words.ts: softness under 10 % of the cone reads "sharp"
    expect(value(chart.beam, "edge")).toBe("sharp");
  });
});

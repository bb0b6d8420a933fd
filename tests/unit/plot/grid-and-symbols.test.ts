import { describe, expect, it } from "vitest";
import { gridLines, gridStep, scaleBar } from "@/lib/plot/grid";
import { stageOutline } from "@/lib/plot/stage-outline";
import { symbolPixels, labelsFit } from "@/lib/plot/symbol";
import { nearestOnScreen, distanceToSegment } from "@/lib/plot/pick";

describe("grid and scale bar in the production's units", () => {
  it("picks round metric steps at least 28 px apart", () => {
    expect(gridStep(40, "metric")).toBe(1); // 0.5 m would be 20 px
    expect(gridStep(300, "metric")).toBe(0.1);
  });
  it("picks whole feet in imperial", () => {
    // NIST SP 811: 1 ft = 0.3048 m exactly
    expect(gridStep(40, "imperial")).toBeCloseTo(5 * 0.3048, 12); // 2 ft would be 24.4 px
    expect(gridStep(100, "imperial")).toBeCloseTo(0.3048, 12);
  });
  it("lists lines anchored at the datum", () => {
    expect(gridLines(-1.2, 2.1, 1)).toEqual([-1, 0, 1, 2]);
  });
  it("labels the scale bar in m or ft", () => {
    expect(scaleBar(40, "metric")).toMatchObject({ metres: 2, px: 80, label: "2 m" });
    expect(scaleBar(40, "imperial").label).toBe("5 ft");
  });
});

describe("stage outline from the settings", () => {
  it("puts the opening on the datum and the back wall at its depth", () => {
    const o = stageOutline({
      prosceniumWidth: 10,
      stageWidth: 17,
      stageDepth: 9,
      apronDepth: 1.5,
      backWallY: 9.5,
      datumName: "setting line",
    });
    expect(o.apron).toContainEqual({ x: 5, y: -1.5 });
    expect(o.prosceniumLeft[0]).toEqual({ x: 5, y: 0 });
    expect(o.backWall).toEqual([
      { x: -8.5, y: 9.5 },
      { x: 8.5, y: 9.5 },
    ]);
    expect(o.deck[2]).toEqual({ x: 8.5, y: 9 });
  });
});

describe("symbols stay readable", () => {
  it("never shrinks below the minimum and shows labels only when they fit", () => {
    expect(symbolPixels(2)).toBe(14);
    expect(symbolPixels(100)).toBe(45);
    expect(labelsFit(symbolPixels(20))).toBe(false);
    expect(labelsFit(symbolPixels(60))).toBe(true);
  });
  it("picks the nearest item within the radius", () => {
    const items = [
      { id: 1, p: { x: 0, y: 0 } },
      { id: 2, p: { x: 10, y: 0 } },
    ];
    expect(nearestOnScreen(items, (i) => i.p, { x: 7, y: 1 }, 5)?.id).toBe(2);
    expect(nearestOnScreen(items, (i) => i.p, { x: 5, y: 9 }, 5)).toBeNull();
    expect(distanceToSegment({ x: 5, y: 3 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(3);
  });
});

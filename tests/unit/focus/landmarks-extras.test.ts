import { describe, expect, it } from "vitest";
import { cutPreposition, landmarksFromRows, mergeLandmarks, outlineLandmarks } from "@/lib/focus/landmarks";
import { extrasByFixture } from "@/lib/focus/extras";
import { readCut } from "@/lib/focus/shutters";
import { PRODUCTION } from "./fixture-builder";

describe("landmarks from the plot and from the stage outline", () => {
  it("the outline gives lip, datum, proscenium, centre line and back wall where the production puts them", () => {
    const byName = Object.fromEntries(outlineLandmarks(PRODUCTION).map((l) => [l.name, l]));
    expect(byName["lip"].a.y).toBe(-1.5); // apron depth 1.5 m downstage of the datum
    expect(byName["SL proscenium"].a.x).toBe(5); // half of a 10 m proscenium
    expect(byName["back wall"].a.y).toBe(9.5);
  });

  it("a drawn leg wins over the outline and words a side cut", () => {
    // A leg drawn in plan as a short line across the stage, its onstage end at x = 4.2 m.
    const drawn = landmarksFromRows([{ name: "SL leg 1", x1: 4.2, y1: 1, x2: 6, y2: 1 }]);
    const landmarks = mergeLandmarks(drawn, outlineLandmarks(PRODUCTION));
    const r = readCut(
      { label: "left", a: { x: 4.25, y: -1 }, b: { x: 4.25, y: 4 } },
      {
        mark: { x: 2, y: 1 },
        panDeg: 90,
        tiltDeg: 40,
        family: "profile",
        landmarks,
        units: "metric",
        datumName: "setting line",
      },
    );
    expect(r.words).toBe("stage-left edge to the SL leg 1");
    // common practice, no source: light is cut "off" an edge, "to" a leg
    expect(cutPreposition("lip")).toBe("off");
    expect(cutPreposition("SL leg 1")).toBe("to");
  });
});

describe("accessories on the chart", () => {
  it("lists accessories and calls out barn doors", () => {
    const e = extrasByFixture([
      { fixtureId: 7, kind: "barn doors", notes: "4-leaf" },
      { fixtureId: 7, kind: "gobo rotator", notes: "slot A, text upright from the stage" },
      { fixtureId: 8, kind: "iris", notes: null },
    ]);
    expect(e[7].accessories).toEqual(["barn doors (4-leaf)", "gobo rotator (slot A, text upright from the stage)"]);
    expect(e[7].barnDoors).toBe("fitted: 4-leaf");
    expect(e[7].goboOrientation).toBe("slot A, text upright from the stage");
    expect(e[8]).toEqual({ accessories: ["iris"] });
  });
});

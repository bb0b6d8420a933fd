import { describe, expect, it } from "vitest";
import { BARN_DOOR_FOR_BEAM_SIDE, beamSideOf, readCut, SHUTTER_FOR_BEAM_SIDE } from "@/lib/focus/shutters";
import { outlineLandmarks } from "@/lib/focus/landmarks";
import { buildFocusChart } from "@/lib/focus/chart-model";
import { makeFixture, PRODUCTION } from "./fixture-builder";

const landmarks = outlineLandmarks(PRODUCTION);
const base = { landmarks, units: "metric" as const, datumName: "setting line" };

describe("shutter inversion", () => {
  it("a lens turns the image half a turn: top↔bottom, left↔right", () => {
    // thin-lens optics: the real image of a single converging lens is inverted (from memory); the near edge of
    // a downward-tilted beam is its bottom, so the top shutter cuts it (common practice, no source)
    expect(SHUTTER_FOR_BEAM_SIDE).toEqual({ near: "top", far: "bottom", left: "right", right: "left" });
    // barn doors sit in front of the lens: no inversion (common practice, no source)
    expect(BARN_DOOR_FOR_BEAM_SIDE).toEqual({ near: "bottom", far: "top", left: "left", right: "right" });
  });

  it("beam sides for a beam travelling upstage (pan 90°)", () => {
    // plan geometry: facing +y, your left is −x (stage right)
    expect(beamSideOf({ x: 0, y: -1 }, 90)).toBe("near");
    expect(beamSideOf({ x: 0, y: 1 }, 90)).toBe("far");
    expect(beamSideOf({ x: -1, y: 0 }, 90)).toBe("left");
    expect(beamSideOf({ x: 1, y: 0 }, 90)).toBe("right");
  });

  it("front light: downstage edge off the lip is the top shutter", () => {
    const r = readCut({ label: "bottom", a: { x: -3, y: -1.5 }, b: { x: 3, y: -1.5 } }, { ...base, mark: { x: 0, y: 1 }, panDeg: 90, tiltDeg: 35, family: "profile" });
    expect(r.words).toBe("downstage edge off the lip");
    expect(r.beamSide).toBe("near");
    expect(r.physical).toBe("top");
    expect(r.cutterWords).toBe("top shutter");
  });

  it("front light: upstage edge off the back wall is the bottom shutter", () => {
    const r = readCut({ label: "top", a: { x: -3, y: 9.45 }, b: { x: 3, y: 9.45 } }, { ...base, mark: { x: 0, y: 7 }, panDeg: 90, tiltDeg: 35, family: "profile" });
    expect(r.words).toBe("upstage edge off the back wall");
    expect(r.physical).toBe("bottom");
  });

  it("front light: stage-left edge to the proscenium is the left shutter (right side of the beam)", () => {
    const r = readCut({ label: "left", a: { x: 5.1, y: -1 }, b: { x: 5.1, y: 4 } }, { ...base, mark: { x: 3, y: 2 }, panDeg: 90, tiltDeg: 40, family: "profile" });
    expect(r.words).toBe("stage-left edge to the SL proscenium");
    expect(r.beamSide).toBe("right");
    expect(r.physical).toBe("left");
  });

  it("side light from a stage-left boom: the upstage edge is the beam's right side, so the left shutter", () => {
    // beam travels toward stage right (pan 180°): facing −x, upstage (+y) is on the right
    const r = readCut({ label: "right", a: { x: -2, y: 3.2 }, b: { x: 2, y: 3.2 } }, { ...base, mark: { x: 0, y: 2 }, panDeg: 180, tiltDeg: 20, family: "profile" });
    expect(r.deckEdge).toBe("upstage");
    expect(r.beamSide).toBe("right");
    expect(r.physical).toBe("left");
    expect(r.words).toBe("upstage edge cut at 3.20 m US of the setting line");
  });

  it("a fresnel's barn door cuts its own side", () => {
    const r = readCut({ label: "top", a: { x: -3, y: -1.5 }, b: { x: 3, y: -1.5 } }, { ...base, mark: { x: 0, y: 1 }, panDeg: 90, tiltDeg: 35, family: "fresnel" });
    expect(r.cutterWords).toBe("bottom barn door");
  });

  it("straight down: no top to the beam, so the stored label stands", () => {
    const r = readCut({ label: "left", a: { x: -3, y: -1.5 }, b: { x: 3, y: -1.5 } }, { ...base, mark: { x: 0, y: 1 }, panDeg: 0, tiltDeg: 90, family: "profile" });
    expect(r.physical).toBeNull();
    expect(r.cutterWords).toMatch(/^left shutter \(as labelled/);
  });

  it("a chart computes pan and tilt itself and words its cuts", () => {
    const f = makeFixture({ lens: { x: 0, y: -8, z: 7 }, mark: { x: 0, y: 0.5 }, shutterCuts: [{ label: "bottom", a: { x: -4, y: -1.5 }, b: { x: 4, y: -1.5 } }] });
    const chart = buildFocusChart(f, PRODUCTION);
    expect(chart.cuts.map((c) => `${c.words} — ${c.cutterWords}`)).toEqual(["downstage edge off the lip — top shutter"]);
  });

  it("a cut through the mark is a warning on the chart, not a crash", () => {
    const f = makeFixture({ mark: { x: 0, y: 1 }, shutterCuts: [{ label: "top", a: { x: -1, y: 1 }, b: { x: 1, y: 1 } }] });
    const chart = buildFocusChart(f, PRODUCTION);
    expect(chart.cuts).toHaveLength(0);
    expect(chart.warnings.join(" ")).toMatch(/Cut 1: The focus mark lies on a shutter cut/);
  });
});

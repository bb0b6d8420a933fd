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
    // Geometry: the cut y = −1.5 lies downstage of the mark (0, 1), so it removes the downstage side, which for a
    // beam travelling upstage (pan 90°) is its near side; the lens inverts the image, so the top shutter cuts
    // the near edge (thin-lens inversion, from memory). The line coincides with the lip (y = −apron depth).
    const r = readCut(
      { label: "bottom", a: { x: -3, y: -1.5 }, b: { x: 3, y: -1.5 } },
      { ...base, mark: { x: 0, y: 1 }, panDeg: 90, tiltDeg: 35, family: "profile" },
    );
    expect(r.words).toBe("downstage edge off the lip");
    expect(r.beamSide).toBe("near");
    expect(r.physical).toBe("top");
    expect(r.cutterWords).toBe("top shutter");
  });

  it("front light: upstage edge off the back wall is the bottom shutter", () => {
    // Geometry: the cut y = 9.45 is upstage of the mark (0, 7): it removes the far side of an upstage-travelling
    // beam, which the inverted image puts on the bottom shutter; it runs 0.05 m from the back wall (y = 9.5).
    const r = readCut(
      { label: "top", a: { x: -3, y: 9.45 }, b: { x: 3, y: 9.45 } },
      { ...base, mark: { x: 0, y: 7 }, panDeg: 90, tiltDeg: 35, family: "profile" },
    );
    expect(r.words).toBe("upstage edge off the back wall");
    expect(r.physical).toBe("bottom");
  });

  it("front light: stage-left edge to the proscenium is the left shutter (right side of the beam)", () => {
    // Geometry: the cut x = 5.1 is stage left (+x) of the mark (3, 2); facing upstage (+y), +x is on your right,
    // so it removes the beam's right side, which the inverted image puts on the left shutter. The SL
    // proscenium (x = 5) runs parallel 0.1 m away, within the pool's reach, so it names the cut.
    const r = readCut(
      { label: "left", a: { x: 5.1, y: -1 }, b: { x: 5.1, y: 4 } },
      { ...base, mark: { x: 3, y: 2 }, panDeg: 90, tiltDeg: 40, family: "profile" },
    );
    expect(r.words).toBe("stage-left edge to the SL proscenium");
    expect(r.beamSide).toBe("right");
    expect(r.physical).toBe("left");
  });

  it("side light from a stage-left boom: the upstage edge is the beam's right side, so the left shutter", () => {
    // beam travels toward stage right (pan 180°): facing −x, upstage (+y) is on the right
    const r = readCut(
      { label: "right", a: { x: -2, y: 3.2 }, b: { x: 2, y: 3.2 } },
      { ...base, mark: { x: 0, y: 2 }, panDeg: 180, tiltDeg: 20, family: "profile" },
    );
    expect(r.deckEdge).toBe("upstage");
    expect(r.beamSide).toBe("right");
    expect(r.physical).toBe("left");
    expect(r.words).toBe("upstage edge cut at 3.20 m US of the setting line");
  });

  it('a cut whose nearest point to the mark lies on the datum reads "cut on the setting line"', () => {
    // plan geometry, worked by hand: the cut runs (0.5, 0)→(2.5, 1), direction (2, 1); the mark (0, 1) projects
    // onto it at t = ((−0.5)·2 + 1·1)/5 = 0, i.e. at (0.5, 0), which lies on the setting line (y = 0). The mark
    // is on the (−1, 2) side of the line, so the cut removes the (1, −2) side: mostly downstage.
    const r = readCut(
      { label: "top", a: { x: 0.5, y: 0 }, b: { x: 2.5, y: 1 } },
      { ...base, mark: { x: 0, y: 1 }, panDeg: 90, tiltDeg: 40, family: "profile" },
    );
    expect(r.words).toBe("downstage edge cut on the setting line");
  });

  it("a cut is worded against a landmark only when the landmark is near the pool", () => {
    // plan geometry, worked by hand: the cut (0, 0.5)→(1, 2.5) runs along x = (y − 0.5)/2. With a 9 m
    // proscenium the SL proscenium's upstage end (4.5, 9.5) lies exactly on that line's extension, but it is
    // √(5.5² + 8.5²) = 10.1 m from the mark (−1, 1), far outside a pool reaching 2.5 m. The mark projects onto
    // the cut at t = ((−1)·1 + 0.5·2)/5 = 0, i.e. (0, 0.5), on the centre line; the removed side is (2, −1),
    // mostly stage left.
    const narrow = outlineLandmarks({ ...PRODUCTION, prosceniumWidth: 9 });
    const cut = { label: "left" as const, a: { x: 0, y: 0.5 }, b: { x: 1, y: 2.5 } };
    const o = { ...base, landmarks: narrow, mark: { x: -1, y: 1 }, panDeg: 90, tiltDeg: 40, family: "profile" };
    expect(readCut(cut, { ...o, poolReach: 2.5 }).words).toBe("stage-left edge cut on the centre line");
    // Without a pool size the house reach (3 m) applies, and the far wall is still not named.
    expect(readCut(cut, o).words).toBe("stage-left edge cut on the centre line");
    // A pool big enough to reach that corner does take the proscenium's end as the landmark.
    expect(readCut(cut, { ...o, poolReach: 11 }).words).toBe("stage-left edge to the SL proscenium");
  });

  it("a parallel landmark counts only along its drawn length, not its endless extension", () => {
    // plan geometry: a leg drawn from (3, 4) to (3, 6) is parallel to the cut x = 3.1 but ends 3 m upstage of
    // the cut's foot (3.1, 1) nearest the mark (2, 1), so it is not what this cut runs along.
    const leg = { name: "SL leg 2", a: { x: 3, y: 4 }, b: { x: 3, y: 6 } };
    const cut = { label: "left" as const, a: { x: 3.1, y: -1 }, b: { x: 3.1, y: 3 } };
    const o = { ...base, landmarks: [leg], mark: { x: 2, y: 1 }, panDeg: 90, tiltDeg: 40, family: "profile" };
    expect(readCut(cut, o).words).toBe("stage-left edge cut at 3.10 m SL of CL");
    const near = { ...leg, a: { x: 3, y: 0 }, b: { x: 3, y: 2 } };
    expect(readCut(cut, { ...o, landmarks: [near] }).words).toBe("stage-left edge to the SL leg 2");
  });

  it("a fresnel's barn door cuts its own side", () => {
    // Geometry as the lip case: the near (downstage) side of the beam. Barn doors are outside the lens, so no
    // inversion: the door on the near side is the bottom door (common practice, no source).
    const r = readCut(
      { label: "top", a: { x: -3, y: -1.5 }, b: { x: 3, y: -1.5 } },
      { ...base, mark: { x: 0, y: 1 }, panDeg: 90, tiltDeg: 35, family: "fresnel" },
    );
    expect(r.cutterWords).toBe("bottom barn door");
  });

  it("straight down: no top to the beam, so the stored label stands", () => {
    // Geometry: at a 90° tilt the beam has no near or far side (its cross-section is symmetric about the axis),
    // so which shutter cuts which deck edge depends only on how the unit is turned in its yoke: keep the label.
    const r = readCut(
      { label: "left", a: { x: -3, y: -1.5 }, b: { x: 3, y: -1.5 } },
      { ...base, mark: { x: 0, y: 1 }, panDeg: 0, tiltDeg: 90, family: "profile" },
    );
    expect(r.physical).toBeNull();
    expect(r.cutterWords).toMatch(/^left shutter \(as labelled/);
  });

  it("a chart computes pan and tilt itself and words its cuts", () => {
    // Geometry: lens (0, −8, 7) to mark (0, 0.5) pans 90° (straight upstage) and tilts 39.5° down
    // (atan(7/8.5)); the lip cut is then the near side, as in the lip case above.
    const f = makeFixture({
      lens: { x: 0, y: -8, z: 7 },
      mark: { x: 0, y: 0.5 },
      shutterCuts: [{ label: "bottom", a: { x: -4, y: -1.5 }, b: { x: 4, y: -1.5 } }],
    });
    const chart = buildFocusChart(f, PRODUCTION);
    expect(chart.cuts.map((c) => `${c.words} — ${c.cutterWords}`)).toEqual([
      "downstage edge off the lip — top shutter",
    ]);
  });

  it("a cut through the mark is a warning on the chart, not a crash", () => {
    // Geometry: the mark (0, 1) lies on the cut y = 1, so neither side of the line is "the side with the mark".
    const f = makeFixture({
      mark: { x: 0, y: 1 },
      shutterCuts: [{ label: "top", a: { x: -1, y: 1 }, b: { x: 1, y: 1 } }],
    });
    const chart = buildFocusChart(f, PRODUCTION);
    expect(chart.cuts).toHaveLength(0);
    expect(chart.warnings.join(" ")).toMatch(/Cut 1: The focus mark lies on a shutter cut/);
  });
});

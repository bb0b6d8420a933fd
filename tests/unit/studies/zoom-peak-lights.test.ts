import { describe, expect, it } from "vitest";
import { studyLights, type StudyFixture } from "@/lib/studies/lights";

const zoomUnit = (coneDeg: number | null): StudyFixture => ({
  id: 1,
  unitNumber: "1",
  positionName: "1st Electric",
  channel: 1,
  colour: null,
  x: 0,
  y: 0,
  lensHeight: 6,
  trimHeight: 7,
  focus: { x: 0, y: 0 },
  aim: "deck",
  coneDeg,
  softnessDeg: null,
  type: {
    family: "profile",
    coneMinDeg: 15,
    coneMaxDeg: 40,
    defaultSoftnessDeg: 3,
    lensDropM: 0.5,
    lensApertureM: 0.12,
    peakCandela: 20_000,
    peakCandelaNarrow: 90_000,
  },
});
const setup = { headHeight: 1.7, deckHeight: 0, colours: new Map<string, number>() };

describe("a study's beams follow the zoom's peak", () => {
  it("uses the stored peak at each end of the range and the 1/tan²(θ/2) interpolation between", () => {
    // from memory: peak ∝ 1/tan²(θ/2) between the stored ends; hand-worked at 25° in datasheet-zoom.test.ts:
    // 20,000 + 0.255208·70,000 = 37,864.5 cd
    const at = (cone: number | null) => studyLights([zoomUnit(cone)], "full", setup).beams[0].peakCandela;
    expect(at(40)).toBe(20_000);
    expect(at(null)).toBe(20_000); // no zoom setting: the widest cone, the type's default
    expect(at(15)).toBeCloseTo(90_000, 6);
    expect(at(25)).toBeCloseTo(37_864.5, 0);
  });

  it("a type with one figure keeps it at any setting", () => {
    const fixed = { ...zoomUnit(20), type: { ...zoomUnit(20).type, peakCandelaNarrow: null } };
    expect(studyLights([fixed], "full", setup).beams[0].peakCandela).toBe(20_000);
  });
});

import { describe, expect, it } from "vitest";
import { formatLength } from "@/lib/optics";
import { roundDefaultLength } from "@/lib/optics/round-length";
import { defaultTrimFor, stageDefaultsFor } from "@/lib/plot/stage-defaults";

const FT = 0.3048; // NIST SP 811: 1 ft = 0.3048 m exactly

describe("defaults in round figures of the production's units", () => {
  it("leaves metric defaults as they are", () => {
    expect(roundDefaultLength(7, "metric")).toBe(7);
    expect(stageDefaultsFor("metric").headHeight).toBe(1.7);
  });

  it("rounds to whole feet from 10 ft up and to half feet below", () => {
    // 10 m = 32.808 ft → 33 ft; 1.7 m = 5.577 ft → 5.5 ft (NIST SP 811 foot)
    expect(roundDefaultLength(10, "imperial")).toBeCloseTo(33 * FT, 12);
    expect(roundDefaultLength(1.7, "imperial")).toBeCloseTo(5.5 * FT, 12);
  });

  it("an imperial production's stage reads in round feet and inches, not converted metres", () => {
    const s = stageDefaultsFor("imperial");
    // REFERENCE.md: 5'6" = 1.6764 m, the low end of common head height
    expect(s.headHeight).toBeCloseTo(1.6764, 12);
    expect(formatLength(s.headHeight, "imperial")).toBe(`5' 6"`);
    expect(formatLength(s.backWallY, "imperial")).toBe(`33' 0"`); // not 32' 9 1/2"
    expect(formatLength(s.prosceniumHeight, "imperial")).toBe(`20' 0"`);
    expect(formatLength(s.stageWidth, "imperial")).toBe(`52' 0"`);
    expect(formatLength(s.apronDepth, "imperial")).toBe(`5' 0"`);
    for (const v of Object.values(s)) expect((v / FT) % 0.5).toBeCloseTo(0, 9);
  });

  it("a new position's trim is round too", () => {
    expect(formatLength(defaultTrimFor("imperial", false), "imperial")).toBe(`23' 0"`); // not 22' 11 1/2"
    expect(formatLength(defaultTrimFor("imperial", true), "imperial")).toBe(`13' 0"`);
    expect(defaultTrimFor("metric", false)).toBe(7);
  });
});

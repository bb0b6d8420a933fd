import { describe, expect, it } from "vitest";
import { computeFixtureGeometry, defaultLensHeight, type GeometryInput } from "@/lib/rig/fixture-geometry";
import { mountingFromText } from "@/lib/rig/mounting";
import { parseTypeCell, TYPE_COLUMNS, typeCellText } from "@/lib/rig/type-fields";
import { studyLights, type StudyFixture } from "@/lib/studies/lights";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";

const col = (key: string) => TYPE_COLUMNS.find((c) => c.key === key)!;
const FT = 0.3048; // NIST SP 811: 1 ft = 0.3048 m exactly
const IN = 0.0254; // NIST SP 811: 1 in = 25.4 mm exactly

describe("lens height follows the type's mounting", () => {
  const type = { lensDropM: 0.45, lensRiseM: 0.3 };

  it("under-hung: trim less the lens drop (a 6.5 m pipe, 0.45 m drop → 6.05 m)", () => {
    // worked by hand: 6.5 − 0.45 = 6.05
    expect(defaultLensHeight(6.5, { ...type, mounting: "under-hung" })).toBeCloseTo(6.05, 12);
  });

  it("a type stored before mountings existed is under-hung", () => {
    expect(defaultLensHeight(6.5, { lensDropM: 0.45 })).toBeCloseTo(6.05, 12);
  });

  it("over-hung on a rail: trim plus the rise (a 22' 0\" rail, 1' 0\" rise → 23' 0\" = 7.0104 m)", () => {
    // NIST SP 811 foot: 23 × 0.3048 = 7.0104 m
    expect(defaultLensHeight(22 * FT, { lensDropM: 0.45, lensRiseM: 1 * FT, mounting: "over-hung" })).toBeCloseTo(
      7.0104,
      12,
    );
  });

  it("side arm: level with the pipe, whatever the drop and rise", () => {
    // common practice, no source: a side arm holds the yoke beside the pipe, lens at about pipe height
    expect(defaultLensHeight(5.2, { ...type, mounting: "side-arm" })).toBeCloseTo(5.2, 12);
  });

  it('floor: the rise above the deck or platform the position names (a 0.6 m platform, 10" rise → 0.854 m)', () => {
    // worked by hand: 0.6 + 10 × 0.0254 = 0.854
    expect(defaultLensHeight(0.6, { lensDropM: 0.45, lensRiseM: 10 * IN, mounting: "floor" })).toBeCloseTo(0.854, 12);
  });

  it("never puts a lens below the deck", () => {
    expect(defaultLensHeight(0.2, { lensDropM: 0.45, mounting: "under-hung" })).toBe(0);
  });
});

describe("the fixture's computed geometry and the studies use the same lens height", () => {
  const input = (mounting: "under-hung" | "over-hung", lensHeight: number | null = null): GeometryInput => ({
    x: 0,
    y: 0,
    lensHeight,
    focusX: 0,
    focusY: 4,
    aim: "deck",
    coneDeg: null,
    softnessDeg: null,
    focusPoint: null,
    position: { trimHeight: 6 },
    type: {
      coneMinDeg: 26,
      coneMaxDeg: 26,
      defaultSoftnessDeg: 2,
      lensDropM: 0.5,
      lensRiseM: 0.3,
      mounting,
    },
  });

  it("an over-hung unit's throw is worked from trim + rise (6.3 m up, 4 m away → 7.4626 m)", () => {
    const g = computeFixtureGeometry(input("over-hung"), 1.7);
    expect(g.lensHeight).toBeCloseTo(6.3, 12);
    expect(g.lensHeightIsDefault).toBe(true);
    // Pythagoras: √(6.3² + 4²) = √(39.69 + 16) = √55.69 = 7.46257…
    expect(g.throw!).toBeCloseTo(Math.sqrt(55.69), 12);
    expect(g.throw!).toBeCloseTo(7.46257, 5);
  });

  it("a unit's own lens height wins over any mounting", () => {
    const g = computeFixtureGeometry(input("over-hung", 4.2), 1.7);
    expect(g.lensHeight).toBe(4.2);
    expect(g.lensHeightIsDefault).toBe(false);
  });

  it("the studies' lit units stand at the same height as the API's", () => {
    const f: StudyFixture = {
      id: 1,
      unitNumber: "1",
      positionName: "FOH rail",
      channel: 1,
      colour: null,
      x: 0,
      y: -6,
      lensHeight: null,
      trimHeight: 7,
      focus: { x: 0, y: 2 },
      aim: "deck",
      coneDeg: null,
      softnessDeg: null,
      type: {
        family: "profile",
        coneMaxDeg: 26,
        defaultSoftnessDeg: 2,
        lensDropM: 0.45,
        lensRiseM: 0.35,
        mounting: "over-hung",
        lensApertureM: 0.15,
        peakCandela: 40000,
      },
    };
    const { lights } = studyLights([f], "full", { headHeight: 1.7, deckHeight: 0, colours: new Map() });
    expect(lights[0].source.z).toBeCloseTo(7.35, 12); // 7 + 0.35, by hand
  });
});

describe("the types table's mounting and body-width cells", () => {
  const base = {
    id: 1,
    productionId: 1,
    name: "Profile 26",
    family: "profile",
    coneMinDeg: 26,
    coneMaxDeg: 26,
    defaultSoftnessDeg: 2,
    peakCandela: 40000,
    peakCandelaNarrow: null,
    wattage: 750,
    weightKg: 7,
    dmxModes: [{ name: "dimmer", footprint: 1 }],
    lensApertureM: 0.13,
    frameSize: null,
    goboSize: null,
    lensDropM: 0.45,
    mounting: "over-hung",
    lensRiseM: 0.3,
    bodyWidthM: 18 * IN,
    cells: 1,
    version: 1,
    updatedAt: "2026-12-05T10:00:00.000Z",
  } as unknown as FixtureTypeDto;

  it("shows the mounting in words and the body width in the production's units", () => {
    expect(typeCellText(base, col("mounting"), "metric")).toMatch(/^Over-hung/);
    // NIST SP 811: 18 in = 0.4572 m
    expect(typeCellText(base, col("bodyWidthM"), "imperial")).toBe(`1' 6"`);
    expect(typeCellText(base, col("bodyWidthM"), "metric")).toMatch(/^0\.46 m$/);
  });

  it("reads a mounting from its value or its words, and refuses anything else by name", () => {
    expect(mountingFromText("side arm")).toBe("side-arm");
    expect(mountingFromText("Over-hung (rail or truss top)")).toBe("over-hung");
    expect(mountingFromText("over")).toBe("over-hung");
    expect(mountingFromText("FLOOR")).toBe("floor");
    expect(mountingFromText("sideways")).toBeNull();
    expect(parseTypeCell(col("mounting"), "floor", "metric")).toEqual({ ok: true, patch: { mounting: "floor" } });
    const bad = parseTypeCell(col("mounting"), "sideways", "metric");
    expect(bad.ok ? "" : bad.message).toMatch(/^Mounting: choose one of Under-hung, /);
  });

  it("reads a body width in feet and inches and refuses one under 5 cm", () => {
    const w = parseTypeCell(col("bodyWidthM"), `1' 8"`, "imperial");
    // NIST SP 811: 20 in = 0.508 m
    expect(w.ok && (w.patch.bodyWidthM as number)).toBeCloseTo(0.508, 12);
    const tiny = parseTypeCell(col("bodyWidthM"), "2 cm", "metric");
    expect(tiny.ok ? "" : tiny.message).toMatch(/Body width: at least 5 cm/);
    const rise = parseTypeCell(col("lensRiseM"), "30 cm", "metric");
    expect(rise.ok && (rise.patch.lensRiseM as number)).toBeCloseTo(0.3, 12);
  });
});

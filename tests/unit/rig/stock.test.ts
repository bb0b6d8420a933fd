import { describe, expect, it } from "vitest";
import { cutsPerSheet, frameInches, stockCounts } from "@/lib/rig/stock";
import { parseColour, formatColour } from "@/lib/rig/colour";

describe("parseColour", () => {
  it("splits colour and diffusion on +, and reads empty-frame words as no cut", () => {
    expect(parseColour("pale blue + light frost")).toEqual(["pale blue", "light frost"]); // Throwline's convention
    expect(parseColour("straw+heavy frost")).toEqual(["straw", "heavy frost"]);
    expect(parseColour("N/C")).toEqual([]);
    expect(parseColour(" open ")).toEqual([]);
    expect(parseColour(null)).toEqual([]);
    expect(formatColour(["pale blue", "light frost"])).toBe("pale blue + light frost");
  });
});

describe("frame sizes and cuts per sheet", () => {
  it("reads inches, fractions and millimetres", () => {
    expect(frameInches("7.5 in")).toBe(7.5);
    expect(frameInches('6 1/4"')).toBe(6.25);
    expect(frameInches("254 mm")).toBeCloseTo(10, 12); // NIST SP 811: 1 in = 25.4 mm
    expect(frameInches("B size")).toBeNull();
  });

  it("counts square cuts from a 20 × 24 in sheet", () => {
    // common practice, from memory: 20 × 24 in sheet; 7.5 in → 2 × 3, 6.25 in → 3 × 3, 10 in → 2 × 2, 12 in → 1 × 2
    expect(cutsPerSheet(7.5)).toBe(6);
    expect(cutsPerSheet(6.25)).toBe(9);
    expect(cutsPerSheet(10)).toBe(4);
    expect(cutsPerSheet(12)).toBe(2);
    expect(cutsPerSheet(null)).toBeNull();
  });
});

describe("stockCounts", () => {
  const f = (over: Partial<Parameters<typeof stockCounts>[0][number]>) => ({
    fixtureTypeId: 1,
    typeName: "Profile 26",
    colour: null,
    gobo: null,
    circuit: null,
    bodyKey: null,
    positionId: 1,
    unitNumber: "1",
    ...over,
  });
  const types = [
    { id: 1, frameSize: "6.25 in", goboSize: "B" },
    { id: 2, frameSize: "7.5 in", goboSize: null },
  ];

  it("counts units, cuts by colour and frame, sheets, gobos, accessories and Y-cables", () => {
    const fixtures = [
      ...Array.from({ length: 10 }, (_, i) =>
        f({ unitNumber: String(i + 1), colour: "pale blue + light frost", circuit: i < 3 ? "12" : String(100 + i) }),
      ),
      f({ fixtureTypeId: 2, typeName: "Fresnel", colour: "pale blue", gobo: "breakup", circuit: "7" }),
      f({ gobo: "breakup" }),
    ];
    const s = stockCounts(fixtures, types, [{ kind: "scroller" }, { kind: "scroller" }, { kind: "iris" }]);
    expect(s.units).toEqual([
      { type: "Profile 26", count: 11 },
      { type: "Fresnel", count: 1 },
    ]);
    // common practice, from memory: 9 cuts of 6.25 in per sheet → 10 cuts need 2 sheets
    expect(s.cuts).toEqual([
      { colour: "light frost", frameSize: "6.25 in", cuts: 10, perSheet: 9, sheets: 2 },
      { colour: "pale blue", frameSize: "6.25 in", cuts: 10, perSheet: 9, sheets: 2 },
      { colour: "pale blue", frameSize: "7.5 in", cuts: 1, perSheet: 6, sheets: 1 },
    ]);
    expect(s.gobos).toEqual(
      expect.arrayContaining([
        { gobo: "breakup", size: "B", count: 1 },
        { gobo: "breakup", size: "size not set", count: 1 },
      ]),
    );
    expect(s.accessories).toEqual([
      { kind: "scroller", count: 2 },
      { kind: "iris", count: 1 },
    ]);
    // common practice, no source: three units on one circuit need two Y-cables
    expect(s.yCables).toEqual([{ circuit: "12", fixtures: 3, yCables: 2 }]);
  });
});

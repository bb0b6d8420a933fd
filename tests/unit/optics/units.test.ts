import { add, unit } from "mathjs";
import { describe, expect, it } from "vitest";
import {
  footcandlesToLux,
  formatIlluminance,
  formatLength,
  LUX_PER_FOOTCANDLE,
  luxToFootcandles,
  METRES_PER_FOOT,
  METRES_PER_INCH,
  parseAngle,
  parseLength,
} from "@/lib/optics";

describe("length constants and light units", () => {
  it("1 ft = 0.3048 m and 1 in = 25.4 mm exactly", () => {
    // NIST SP 811 (international yard and pound agreement, 1959)
    expect(METRES_PER_FOOT).toBe(0.3048);
    expect(METRES_PER_INCH).toBe(0.0254);
    expect(parseLength(`5'6"`, "m")).toBeCloseTo(1.6764, 12); // REFERENCE.md: 5'6" = 1.6764 m
    expect(parseLength(`6'0"`, "m")).toBeCloseTo(1.8288, 12); // REFERENCE.md: 6'0" = 1.8288 m
  });

  it("1 fc = 1/0.09290304 lx = 10.763910416709722 lx", () => {
    // REFERENCE.md: derived from the foot (NIST SP 811)
    expect(LUX_PER_FOOTCANDLE).toBeCloseTo(10.763910416709722, 13);
    expect(luxToFootcandles(1)).toBe(0.09290304);
    expect(footcandlesToLux(25)).toBeCloseTo(269.097760417743, 10);
    expect(luxToFootcandles(footcandlesToLux(37.161))).toBeCloseTo(37.161, 12);
  });

  it("agrees with mathjs for lux and footcandle defined as cd/m² and cd/ft²", () => {
    // REFERENCE.md: mathjs has no lux or footcandle; define them (the steradian is dimensionless)
    const lxPerFc = unit(1, "cd/ft^2").toNumber("cd/m^2");
    expect(Math.abs(lxPerFc - LUX_PER_FOOTCANDLE)).toBeLessThanOrEqual(1e-12 * LUX_PER_FOOTCANDLE);
  });
});

describe("parseLength", () => {
  // Independent converter: mathjs (REFERENCE.md: converts lengths exactly)
  const m = (v: number, u: string) => unit(v, u).toNumber("m");
  const cases: Array<[string, "m" | "ft", number]> = [
    ["3.2", "m", 3.2],
    ["3.2", "ft", m(3.2, "ft")],
    ["3.2 m", "ft", 3.2],
    ["320 cm", "m", m(320, "cm")],
    ["320cm", "m", m(320, "cm")],
    ["25 mm", "m", m(25, "mm")],
    [`10'6"`, "m", add(unit(10, "ft"), unit(6, "inch")).toNumber("m")],
    [`10' 6 1/2"`, "m", add(unit(10, "ft"), unit(6.5, "inch")).toNumber("m")],
    ["10ft 6in", "m", add(unit(10, "ft"), unit(6, "inch")).toNumber("m")],
    [`10'-6"`, "m", add(unit(10, "ft"), unit(6, "inch")).toNumber("m")],
    [`10' 6`, "m", add(unit(10, "ft"), unit(6, "inch")).toNumber("m")],
    [`126"`, "m", m(126, "inch")],
    ["126 in", "m", m(126, "inch")],
    [`1/2"`, "m", m(0.5, "inch")],
    [`12'`, "m", m(12, "ft")],
    ["2.5 feet", "m", m(2.5, "ft")],
    ["-3.2 m", "m", -3.2],
    [`-10' 6 1/2"`, "m", -add(unit(10, "ft"), unit(6.5, "inch")).toNumber("m")],
    ["  3.2 M ", "m", 3.2],
    ["10′ 6″", "m", add(unit(10, "ft"), unit(6, "inch")).toNumber("m")],
    // A dash before the fraction, as paperwork often writes it (common practice, no source)
    [`6'-3-1/2"`, "m", add(unit(6, "ft"), unit(3.5, "inch")).toNumber("m")],
    [`6' 3-1/2"`, "m", add(unit(6, "ft"), unit(3.5, "inch")).toNumber("m")],
    [`3-1/2"`, "m", m(3.5, "inch")],
  ];
  it.each(cases)("reads %s (bare numbers in %s)", (text, def, metres) => {
    expect(Math.abs(parseLength(text, def) - metres)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(metres)));
  });

  it.each(["abc", "", "   ", "3..2", `10' 13"`, `1/0"`, "5 furlongs", "3 m m", `10.5' 6"`, `6 3/2"`, "-", "1e3"])(
    "rejects %j with a RangeError that quotes the text",
    (text) => {
      // house rule: invalid text gets a clear error, not a silent 0
      expect(() => parseLength(text, "m")).toThrow(RangeError);
      expect(() => parseLength(text, "m")).toThrow(`"${text}"`);
    },
  );

  it("refuses an improper fraction of an inch with the same clear message, with or without feet", () => {
    // common practice, no source: a fraction of an inch is written proper (1 1/2", not 3/2")
    for (const text of [`6' 3/2"`, `10' 6 3/2"`, `3/2"`, `6'-3-3/2"`]) {
      expect(() => parseLength(text, "m")).toThrow(RangeError);
      expect(() => parseLength(text, "m")).toThrow(`"${text}"`);
      expect(() => parseLength(text, "m")).toThrow(/must be less than one/);
    }
    // A proper fraction after feet still reads: 6' 1/2" = 72.5 in (NIST SP 811: 1 in = 25.4 mm)
    expect(parseLength(`6' 1/2"`, "m")).toBeCloseTo(72.5 * 0.0254, 12);
  });

  it("explains the 12-inch rule and the empty case", () => {
    // common practice, no source: inches after feet run 0–11
    expect(() => parseLength(`10' 13"`, "m")).toThrow(/less than 12/);
    expect(() => parseLength("", "m")).toThrow(/empty/);
  });
});

describe("formatLength", () => {
  it("metric to two decimals", () => {
    // DESIGN.md: metric display, two decimals
    expect(formatLength(3.2, "metric")).toBe("3.20 m");
    expect(formatLength(-2.5, "metric")).toBe("-2.50 m");
    expect(formatLength(-0.001, "metric")).toBe("0.00 m");
    expect(formatLength(12.345, "metric", { decimals: 1 })).toBe("12.3 m");
  });

  it("imperial to the half inch as 10' 6 1/2\"", () => {
    // DESIGN.md: imperial display to the half inch; NIST SP 811 for the inch
    expect(formatLength(add(unit(10, "ft"), unit(6.5, "inch")).toNumber("m"), "imperial")).toBe(`10' 6 1/2"`);
    expect(formatLength(unit(126, "inch").toNumber("m"), "imperial")).toBe(`10' 6"`);
    expect(formatLength(unit(11.8, "inch").toNumber("m"), "imperial")).toBe(`1' 0"`);
    expect(formatLength(unit(0.2, "inch").toNumber("m"), "imperial")).toBe(`0' 0"`);
    expect(formatLength(-1.8288, "imperial")).toBe(`-6' 0"`);
    expect(() => formatLength(Number.NaN, "metric")).toThrow(RangeError);
  });
});

describe("angles and illuminance text", () => {
  it("parses degrees", () => {
    // DESIGN.md: angles in degrees at the API boundary
    expect(parseAngle("25")).toBe(25);
    expect(parseAngle("25°")).toBe(25);
    expect(parseAngle(" 12.5 deg")).toBe(12.5);
    expect(parseAngle("-10 degrees")).toBe(-10);
    expect(() => parseAngle("north")).toThrow(/"north"/);
    expect(() => parseAngle("")).toThrow(RangeError);
  });

  it("formats lux, with footcandles beside it for imperial productions", () => {
    // DESIGN.md: lux, also footcandles when imperial; REFERENCE.md: 400 lx = 37.161 fc
    expect(formatIlluminance(400, "metric")).toBe("400 lx");
    expect(formatIlluminance(400, "imperial")).toBe("400 lx (37.2 fc)");
    expect(formatIlluminance(7.25, "metric")).toBe("7.3 lx");
  });
});

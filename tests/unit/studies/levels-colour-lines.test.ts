import { describe, expect, it } from "vitest";
import {
  coverageGrid,
  differenceGrid,
  dimmerCurveOf,
  illuminanceAt,
  lightFromLevel,
  lineProfile,
  transmissionOf,
  tungstenColourTemperature,
  type LitBeam,
} from "@/lib/optics";

describe("level → light per type family", () => {
  it("is linear for LED units", () => {
    // common practice, no source: LED drivers are set to a linear output curve
    expect(dimmerCurveOf("led-wash")).toBe("linear");
    expect(lightFromLevel(0.5, "linear")).toBe(0.5);
  });

  it("rises much faster than the level for tungsten, as the stated power law", () => {
    // from memory: light ∝ level^2.3 (between a square law and the lamp law's V^3.4)
    expect(dimmerCurveOf("profile")).toBe("tungsten");
    expect(lightFromLevel(0.5, "tungsten")).toBeCloseTo(0.5 ** 2.3, 12);
    expect(lightFromLevel(0.5, "tungsten")).toBeLessThan(0.21);
    expect(lightFromLevel(1, "tungsten")).toBe(1);
    expect(lightFromLevel(0, "tungsten")).toBe(0);
    expect(() => lightFromLevel(1.2, "tungsten")).toThrow(/between 0 and 1/);
  });

  it("warms as it dims", () => {
    // lamp law, from memory: CCT ∝ V^0.42, lumens ∝ V^3.4; at a quarter of the light V = 0.25^(1/3.4) = 0.665,
    // so 3200 K · 0.665^0.42 = 2697 K
    expect(tungstenColourTemperature(1)).toBeCloseTo(3200, 9);
    const quarter = 0.25 ** (1 / 2.3); // the level that gives a quarter of the light
    expect(tungstenColourTemperature(quarter)).toBeCloseTo(3200 * (0.25 ** (1 / 3.4)) ** 0.42, 6);
    expect(Math.abs(tungstenColourTemperature(quarter) - 2697)).toBeLessThan(1);
  });
});

describe("colour transmission", () => {
  const list = new Map([
    ["pale lavender", 60],
    ["light frost", 90],
    ["full CTB", 36],
  ]);

  it("uses the colour text exactly as typed", () => {
    expect(transmissionOf("pale lavender", list)).toEqual({ factor: 0.6, missing: [] });
    // not the same text: flagged and counted at 100 %
    expect(transmissionOf("Pale Lavender", list)).toEqual({ factor: 1, missing: ["Pale Lavender"] });
  });

  it("multiplies stacked filters and reports the ones it does not know", () => {
    // thin filters in series multiply their transmissions (Beer–Lambert; common practice, no source)
    expect(transmissionOf("pale lavender + light frost", list).factor).toBeCloseTo(0.54, 12);
    expect(transmissionOf("full CTB + mystery blue", list)).toEqual({ factor: 0.36, missing: ["mystery blue"] });
  });

  it("treats an open frame as 100 % without a warning", () => {
    expect(transmissionOf("N/C", list)).toEqual({ factor: 1, missing: [] });
    expect(transmissionOf(null, list)).toEqual({ factor: 1, missing: [] });
  });
});

describe("difference map and line profile", () => {
  const bounds = { minX: -6, minY: -1, maxX: 6, maxY: 1 };
  const unit = (x: number): LitBeam => ({
    source: { x, y: 0, z: 5 },
    focus: { x, y: 0, z: 0 },
    coneDeg: 36,
    softnessDeg: 8,
    peakCandela: 10_000,
    level: 1,
  });

  it("shows the dip an actor walks through between two pools", () => {
    const g = coverageGrid({
      bounds,
      resolution: 0.1,
      deckHeight: 0,
      measure: { kind: "deck" },
      beams: [unit(-2.5), unit(2.5)],
    });
    const line = lineProfile(g, { x: -2.5, y: 0.05 }, { x: 2.5, y: 0.05 });
    expect(line.length).toBe(51);
    expect(line[0].distance).toBe(0);
    expect(line[50].distance).toBeCloseTo(5, 12);
    // at the ends the line is under a lens: 400 lx plus the other pool's (zero) light (inverse-square law)
    const ends = illuminanceAt({ x: -2.5, y: 0.05, z: 0 }, [unit(-2.5), unit(2.5)]);
    expect(Math.abs(line[0].value - ends)).toBeLessThan(0.2);
    // midway (2.5 m off each axis, 26.6° > the 18° cone edge) is dark: the dip
    expect(line[25].value).toBe(0);
    // sampled between cells, bilinear: a reading on a cell centre equals that cell
    const c = Math.round((0.05 - g.originY) / g.resolution) * g.cols + Math.round((-2.5 - g.originX) / g.resolution);
    expect(line[0].value).toBeCloseTo(g.values[c], 3);
  });

  it("interpolates a linear field exactly (bilinear reference)", () => {
    // a plane E = 10x + 3y + 50 is reproduced exactly by bilinear interpolation (numerical analysis, no source)
    const cols = 5,
      rows = 4;
    const values = new Float32Array(cols * rows);
    for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) values[r * cols + c] = 10 * c + 3 * r + 50;
    const g = { values, cols, rows, originX: 0, originY: 0, resolution: 1 };
    for (const s of lineProfile(g, { x: 0.3, y: 0.2 }, { x: 3.7, y: 2.9 }, 0.25)) {
      expect(s.value).toBeCloseTo(10 * s.x + 3 * s.y + 50, 4);
    }
  });

  it("subtracts cue A from cue B cell by cell", () => {
    const a = coverageGrid({ bounds, resolution: 0.5, deckHeight: 0, measure: { kind: "deck" }, beams: [unit(-2.5)] });
    const b = coverageGrid({
      bounds,
      resolution: 0.5,
      deckHeight: 0,
      measure: { kind: "deck" },
      beams: [unit(-2.5), unit(2.5)],
    });
    const diff = differenceGrid(a, b);
    const only = coverageGrid({
      bounds,
      resolution: 0.5,
      deckHeight: 0,
      measure: { kind: "deck" },
      beams: [unit(2.5)],
    });
    for (let k = 0; k < diff.length; k++) expect(Math.abs(diff[k] - only.values[k])).toBeLessThan(1e-3);
    const coarse = coverageGrid({ bounds, resolution: 1, deckHeight: 0, measure: { kind: "deck" }, beams: [] });
    expect(() => differenceGrid(a, coarse)).toThrow(/different cells/);
  });
});

import { describe, expect, it } from "vitest";
import { parseTypeCell, TYPE_COLUMNS, typeCellText } from "@/lib/rig/type-fields";

const col = (key: string) => TYPE_COLUMNS.find((c) => c.key === key)!;

describe("typed fixture-type cells", () => {
  it("reads a fixed cone and a zoom range", () => {
    expect(parseTypeCell(col("cone"), "26", "metric")).toEqual({ ok: true, patch: { coneMinDeg: 26, coneMaxDeg: 26 } });
    expect(parseTypeCell(col("cone"), "15–30°", "metric")).toEqual({
      ok: true,
      patch: { coneMinDeg: 15, coneMaxDeg: 30 },
    });
    const backwards = parseTypeCell(col("cone"), "30-15", "metric");
    expect(backwards.ok).toBe(false);
  });
  it("reads DMX modes and refuses a footprint past 512 slots", () => {
    expect(parseTypeCell(col("dmxModes"), "dimmer 1, extended (4)", "metric")).toEqual({
      ok: true,
      patch: {
        dmxModes: [
          { name: "dimmer", footprint: 1 },
          { name: "extended", footprint: 4 },
        ],
      },
    });
    // ANSI E1.11: a universe has 512 slots
    const big = parseTypeCell(col("dmxModes"), "huge 600", "metric");
    expect(big.ok ? "" : big.message).toMatch(/1–512/);
  });
  it("names the column of a bad number and reads a lens drop in feet", () => {
    const bad = parseTypeCell(col("wattage"), "lots", "metric");
    expect(bad.ok ? "" : bad.message).toMatch(/^Power \(W\)/);
    const neg = parseTypeCell(col("weightKg"), "-2", "metric");
    expect(neg.ok).toBe(false);
    const drop = parseTypeCell(col("lensDropM"), "1'", "imperial");
    // NIST SP 811: 1 ft = 0.3048 m
    expect(drop.ok && (drop.patch.lensDropM as number)).toBeCloseTo(0.3048, 6);
  });
});

describe("a zoom's peak at both ends of its range", () => {
  it("reads the narrow-end peak, clears it when emptied, and refuses a negative one", () => {
    expect(parseTypeCell(col("peakCandelaNarrow"), "90000", "metric")).toEqual({
      ok: true,
      patch: { peakCandelaNarrow: 90000 },
    });
    expect(parseTypeCell(col("peakCandelaNarrow"), " ", "metric")).toEqual({
      ok: true,
      patch: { peakCandelaNarrow: null },
    });
    const neg = parseTypeCell(col("peakCandelaNarrow"), "-5", "metric");
    expect(neg.ok ? "" : neg.message).toMatch(/^Peak at narrowest \(cd\): .*cannot be negative/);
    expect(col("peakCandela").header).toBe("Peak at widest (cd)");
  });
});

describe("a datasheet's beam and field angles typed into the types table", () => {
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
    mounting: "under-hung" as const,
    lensRiseM: 0.35,
    bodyWidthM: 0.45,
    cells: 1,
    loadKind: null,
    version: 1,
    updatedAt: "2026-12-05T10:00:00.000Z",
  };

  it("maps beam/field onto cone and softness so the model's 50 % and 10 % points land on them", () => {
    // DESIGN.md beam model: s = (F − B)/0.59, θ = B + s; hand-worked for B 22°, F 30°: s = 8/0.590334 = 13.55°,
    // θ = 35.55° (two decimals kept); a fixed-angle type gets the same cone at both ends.
    const r = parseTypeCell(col("datasheet"), "22 / 30", "metric", base);
    expect(r).toEqual({ ok: true, patch: { coneMinDeg: 35.55, coneMaxDeg: 35.55, defaultSoftnessDeg: 13.55 } });
  });

  it("a zoom's datasheet figures set its widest end; a peaked family keeps cone = field", () => {
    // DESIGN.md: peaked families are ½ at (θ − s)/2 and 1/10 at θ/2 by construction
    const fresnel = { ...base, family: "fresnel", coneMinDeg: 15, coneMaxDeg: 60 };
    expect(parseTypeCell(col("datasheet"), "40/55", "metric", fresnel)).toEqual({
      ok: true,
      patch: { coneMaxDeg: 55, defaultSoftnessDeg: 15 },
    });
  });

  it("shows the model's own 50 % and 10 % angles and refuses text that is not two angles", () => {
    // Flat model: 50 % full angle θ − s = 24°, 10 % full angle θ − 0.4097·s = 25.2° for θ 26°, s 2°
    expect(typeCellText(base, col("datasheet"), "metric")).toBe("24 / 25.2");
    const bad = parseTypeCell(col("datasheet"), "wide", "metric", base);
    expect(bad.ok ? "" : bad.message).toMatch(/beam and field angles, e.g. "22 \/ 30"/);
    const wider = parseTypeCell(col("datasheet"), "30/22", "metric", base);
    expect(wider.ok ? "" : wider.message).toMatch(/cannot be wider than the field angle/);
  });
});

import { describe, expect, it } from "vitest";
import { parseTypeCell, TYPE_COLUMNS } from "@/lib/rig/type-fields";

const col = (key: string) => TYPE_COLUMNS.find((c) => c.key === key)!;

describe("typed fixture-type cells", () => {
  it("reads a fixed cone and a zoom range", () => {
    expect(parseTypeCell(col("cone"), "26", "metric")).toEqual({ ok: true, patch: { coneMinDeg: 26, coneMaxDeg: 26 } });
    expect(parseTypeCell(col("cone"), "15–30°", "metric")).toEqual({ ok: true, patch: { coneMinDeg: 15, coneMaxDeg: 30 } });
    const backwards = parseTypeCell(col("cone"), "30-15", "metric");
    expect(backwards.ok).toBe(false);
  });
  it("reads DMX modes and refuses a footprint past 512 slots", () => {
    expect(parseTypeCell(col("dmxModes"), "dimmer 1, extended (4)", "metric")).toEqual({ ok: true, patch: { dmxModes: [{ name: "dimmer", footprint: 1 }, { name: "extended", footprint: 4 }] } });
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
    expect(parseTypeCell(col("peakCandelaNarrow"), "90000", "metric")).toEqual({ ok: true, patch: { peakCandelaNarrow: 90000 } });
    expect(parseTypeCell(col("peakCandelaNarrow"), " ", "metric")).toEqual({ ok: true, patch: { peakCandelaNarrow: null } });
    const neg = parseTypeCell(col("peakCandelaNarrow"), "-5", "metric");
    expect(neg.ok ? "" : neg.message).toMatch(/^Peak at narrowest \(cd\): .*cannot be negative/);
    expect(col("peakCandela").header).toBe("Peak at widest (cd)");
  });
});

import { describe, expect, it } from "vitest";
import { buildFocusChart, spotFloodWords } from "@/lib/focus/chart-model";
import { focusColumns, focusRow } from "@/lib/focus/excel";
import { computeFixtureGeometry } from "@/lib/rig/fixture-geometry";
import type { FixtureDto } from "@/lib/dto/fixture";
import { makeFixture, PRODUCTION } from "./fixture-builder";

/** A unit of `family` whose type's cone runs min..max (equal ends: a fixed lens), with its own cone or the type's. */
function unitOf(family: string, min: number, max: number, coneDeg: number | null = null): FixtureDto {
  const base = makeFixture({ family, coneDeg, softnessDeg: null });
  const computed = computeFixtureGeometry(
    {
      ...base,
      focusPoint: null,
      position: { trimHeight: 8 },
      type: { coneMinDeg: min, coneMaxDeg: max, defaultSoftnessDeg: 2, lensDropM: 0.4 },
    },
    PRODUCTION.headHeight,
  );
  return { ...base, computed };
}
const keys = (f: FixtureDto) => buildFocusChart(f, PRODUCTION).beam.map((r) => r.key);
const value = (f: FixtureDto, key: string) => buildFocusChart(f, PRODUCTION).beam.find((r) => r.key === key)?.value;

// common practice, no source: what each kind of unit has to set at the focus call.
describe("the chart's beam fields follow the unit's family", () => {
  it("a zoom profile: edge (barrel), zoom, iris and gobo", () => {
    const k = keys(unitOf("profile", 25, 50));
    expect(k).toEqual(expect.arrayContaining(["edge", "zoom", "iris", "goboOrientation"]));
    expect(k).not.toContain("spotFlood");
  });

  it("a fixed-angle profile shows its lens, no zoom", () => {
    const f = unitOf("profile", 26, 26);
    expect(keys(f)).not.toContain("zoom");
    expect(keys(f)).toEqual(expect.arrayContaining(["edge", "iris", "cone"]));
    expect(value(f, "cone")).toBe("fixed, 26° cone");
  });

  it("a 150 mm fresnel: spot/flood and barn doors, never zoom, iris or edge", () => {
    const f = unitOf("fresnel", 15, 60, 33);
    const k = keys(f);
    expect(k).toEqual(expect.arrayContaining(["spotFlood", "barnDoors"]));
    for (const gone of ["zoom", "iris", "edge", "goboOrientation"]) expect(k).not.toContain(gone);
    // arithmetic: (33 − 15) / (60 − 15) = 40 % of the travel
    expect(value(f, "spotFlood")).toBe("40 % toward flood, 33° cone");
    const words = buildFocusChart(f, PRODUCTION)
      .beam.map((r) => `${r.label} ${r.value}`)
      .join(" | ");
    expect(words).not.toMatch(/Zoom|Iris|Edge/);
  });

  it("a PAR: lamp rotation and barn doors; an LED wash: zoom", () => {
    expect(keys(unitOf("par", 12, 12))).toEqual(expect.arrayContaining(["lampRotation", "barnDoors"]));
    expect(keys(unitOf("par", 12, 12))).not.toContain("iris");
    const led = keys(unitOf("led-wash", 10, 60));
    expect(led).toContain("zoom");
    for (const gone of ["iris", "edge", "spotFlood", "lampRotation"]) expect(led).not.toContain(gone);
  });

  it("spot/flood words at the ends of the travel", () => {
    expect(spotFloodWords(15, { min: 15, max: 60 })).toBe("full spot, 15° cone");
    expect(spotFloodWords(60, { min: 15, max: 60 })).toBe("full flood, 60° cone");
    expect(spotFloodWords(40, { min: 40, max: 40 })).toBe("fixed, 40° cone");
  });

  it("the Excel sheet has a column for every family's fields, filled where the family has them", () => {
    const charts = [unitOf("profile", 25, 50), unitOf("fresnel", 15, 60, 60)].map((f) =>
      buildFocusChart(f, PRODUCTION),
    );
    const columns = focusColumns(charts).map((c) => c.key);
    expect(columns).toEqual(expect.arrayContaining(["zoom", "iris", "spotFlood"]));
    expect(new Set(columns).size).toBe(columns.length);
    expect(focusRow(charts[1]).spotFlood).toBe("full flood, 60° cone");
    expect(focusRow(charts[1]).iris).toBeUndefined();
  });
});

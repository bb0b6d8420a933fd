// The starter shelf a new production is offered: generic types of our own, each a valid type with the
// figures a plot needs. Plausibility bounds are common practice for each class of unit (no source);
// the figures themselves are from memory, as lib/rig/starter-types.ts says.
import { describe, expect, it } from "vitest";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import { createFixtureTypeSchema } from "@/lib/validation/rig";

const byFamily = (f: string) => STARTER_TYPES.filter((t) => t.family === f);

describe("starter types", () => {
  it("are all valid fixture types with unique names (letter case aside)", () => {
    for (const t of STARTER_TYPES) expect(createFixtureTypeSchema.safeParse(t).success, t.name).toBe(true);
    const names = STARTER_TYPES.map((t) => t.name.toLowerCase());
    expect(new Set(names).size).toBe(names.length);
  });

  it("cover the classes a rig starts from: fixed profiles at several angles, a zoom profile, fresnel, PC, PAR, LED wash, cyc, followspot", () => {
    const fixedProfiles = byFamily("profile").filter((t) => t.coneMinDeg === t.coneMaxDeg);
    expect(new Set(fixedProfiles.map((t) => t.coneMaxDeg)).size).toBeGreaterThanOrEqual(3);
    expect(byFamily("profile").some((t) => t.coneMaxDeg > t.coneMinDeg)).toBe(true);
    expect(byFamily("fresnel").some((t) => /fresnel/i.test(t.name))).toBe(true);
    expect(byFamily("fresnel").some((t) => /\bPC\b/.test(t.name))).toBe(true);
    for (const f of ["par", "led-wash", "cyc", "followspot"]) expect(byFamily(f).length, f).toBeGreaterThan(0);
  });

  it("give each type a cone, softness, weight, wattage and DMX footprint in a plausible range", () => {
    for (const t of STARTER_TYPES) {
      expect(t.coneMinDeg, t.name).toBeGreaterThan(0);
      expect(t.coneMaxDeg, t.name).toBeLessThanOrEqual(120); // common practice, no source: a flood's field angle
      expect(t.defaultSoftnessDeg, t.name).toBeGreaterThanOrEqual(0);
      // The soft band cannot be wider than the beam's half-angle at its widest (DESIGN.md: core = θ − 2s).
      expect(2 * (t.defaultSoftnessDeg ?? 0), t.name).toBeLessThanOrEqual(t.coneMaxDeg);
      expect(t.weightKg, t.name).toBeGreaterThan(0);
      expect(t.weightKg, t.name).toBeLessThan(60); // common practice, no source: one person can hang or carry it
      expect(t.wattage, t.name).toBeGreaterThan(0);
      expect(t.dmxModes.length, t.name).toBeGreaterThan(0);
      for (const m of t.dmxModes) expect(m.footprint, `${t.name} ${m.name}`).toBeGreaterThanOrEqual(1);
    }
  });

  it("carry generic names of our own, never a maker's model name", () => {
    // Every name says it is generic and names the class of unit in trade words.
    for (const t of STARTER_TYPES) expect(t.name, t.name).toMatch(/^Generic /);
  });
});

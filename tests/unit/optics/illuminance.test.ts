import { describe, expect, it } from "vitest";
import {
  FIXTURE_FAMILIES,
  fromDatasheet,
  illuminanceAt,
  luxToFootcandles,
  relativeIntensity,
  type LitBeam,
} from "@/lib/optics";
import { D2R } from "./helpers";

const FT = 0.3048;

function beam(over: Partial<LitBeam> = {}): LitBeam {
  return {
    source: { x: 0, y: 0, z: 5 },
    focus: { x: 0, y: 0, z: 0 },
    coneDeg: 30,
    softnessDeg: 5,
    peakCandela: 10_000,
    level: 1,
    ...over,
  };
}

describe("inverse-square and cosine law", () => {
  it("10,000 cd at 5 m square on gives 400 lx (37.161 fc)", () => {
    // REFERENCE.md: illuminance worked example (inverse-square law)
    const e = illuminanceAt({ x: 0, y: 0, z: 0 }, [beam()]);
    expect(Math.abs(e - 400)).toBeLessThanOrEqual(1e-9 * 400);
    expect(Math.abs(luxToFootcandles(e) - 37.161)).toBeLessThanOrEqual(1e-4 * 37.161);
  });

  it("10,000 cd at 20 ft gives 25 fc (269.098 lx)", () => {
    // REFERENCE.md: illuminance worked example; NIST SP 811 for the foot
    const e = illuminanceAt({ x: 0, y: 0, z: 0 }, [beam({ source: { x: 0, y: 0, z: 20 * FT } })]);
    expect(Math.abs(e - 269.098)).toBeLessThanOrEqual(1e-4 * 269.098);
    expect(Math.abs(luxToFootcandles(e) - 25)).toBeLessThanOrEqual(1e-9 * 25);
  });

  it("20,000 cd from 6 m up onto a floor point 6 m away gives 196.419 lx", () => {
    // REFERENCE.md: d = 8.48528 m, E = I·cos(45°)/d² (cosine law)
    const b = beam({ source: { x: 0, y: 0, z: 6 }, focus: { x: 6, y: 0, z: 0 }, peakCandela: 20_000 });
    const e = illuminanceAt({ x: 6, y: 0, z: 0 }, [b]);
    expect(Math.abs(e - 196.419)).toBeLessThanOrEqual(1e-4 * 196.419);
    const closed = (20_000 * Math.cos(45 * D2R)) / 72;
    expect(Math.abs(e - closed)).toBeLessThanOrEqual(1e-9 * closed);
  });

  it("doubling the distance quarters the illuminance", () => {
    // REFERENCE.md: inverse-square law
    const near = illuminanceAt({ x: 0, y: 0, z: 0 }, [beam({ source: { x: 0, y: 0, z: 4 } })]);
    const far = illuminanceAt({ x: 0, y: 0, z: 0 }, [beam({ source: { x: 0, y: 0, z: 8 } })]);
    expect(near / far).toBeCloseTo(4, 12);
  });

  it("sums over fixtures and scales with level", () => {
    // DESIGN.md: E = I0 · level · profile(β) · cos(incidence) / d², summed over fixtures
    const p = { x: 0, y: 0, z: 0 };
    const one = illuminanceAt(p, [beam()]);
    const other = beam({ source: { x: 3, y: -4, z: 5 }, focus: { x: 0, y: 0, z: 0 }, peakCandela: 5000 });
    const two = illuminanceAt(p, [beam(), other]);
    expect(two).toBeCloseTo(one + illuminanceAt(p, [other]), 9);
    expect(illuminanceAt(p, [beam({ level: 0.3 })])).toBeCloseTo(0.3 * one, 9);
    expect(illuminanceAt(p, [])).toBe(0);
  });

  it("measures on a horizontal surface at the point's height, and gives 0 instead of infinity at the lens", () => {
    // DESIGN.md: lux on a horizontal surface; never NaN/Infinity
    const head = illuminanceAt({ x: 0, y: 0, z: 1.7 }, [beam()]);
    expect(head).toBeCloseTo(10_000 / 3.3 ** 2, 9);
    expect(illuminanceAt({ x: 0, y: 0, z: 5 }, [beam()])).toBe(0);
    expect(illuminanceAt({ x: 0, y: 0, z: 6 }, [beam()])).toBe(0);
  });

  it("falls to nothing outside the cone", () => {
    // DESIGN.md: profile 0 beyond the outer half-angle
    const edge = 5 * Math.tan(15.01 * D2R);
    expect(illuminanceAt({ x: edge, y: 0, z: 0 }, [beam()])).toBe(0);
    expect(illuminanceAt({ x: 5 * Math.tan(14.9 * D2R), y: 0, z: 0 }, [beam()])).toBeGreaterThan(0);
  });

  it("rejects out-of-range levels and intensities", () => {
    // DESIGN.md: level 0..1; candela cannot be negative
    expect(() => illuminanceAt({ x: 0, y: 0, z: 0 }, [beam({ level: 1.5 })])).toThrow(/Level/);
    expect(() => illuminanceAt({ x: 0, y: 0, z: 0 }, [beam({ peakCandela: -1 })])).toThrow(RangeError);
    expect(() => illuminanceAt({ x: 0, y: Number.NaN, z: 0 }, [beam()])).toThrow(RangeError);
  });
});

describe("intensity profiles", () => {
  it("profile spot: flat core, ½ at the 50 % edge, cosine fade to 0 at the cone", () => {
    // DESIGN.md: profile formula ½·(1 + cos(π·(β−βc)/(βo−βc)))
    const [cone, soft] = [36, 8];
    expect(relativeIntensity(0, cone, soft)).toBe(1);
    expect(relativeIntensity(9.999, cone, soft)).toBe(1); // core half-angle (36 − 16)/2 = 10°
    expect(relativeIntensity((cone - soft) / 2, cone, soft)).toBeCloseTo(0.5, 12);
    expect(relativeIntensity(12, cone, soft)).toBeCloseTo(0.5 * (1 + Math.cos((Math.PI * 2) / 8)), 12);
    expect(relativeIntensity(18, cone, soft)).toBeCloseTo(0, 12);
    expect(relativeIntensity(18.01, cone, soft)).toBe(0);
  });

  it("peaked families: ½ at the beam half-angle and 1/10 at the field half-angle of a datasheet", () => {
    // REFERENCE.md: beam angle 50 %, field angle 10 % (IES definitions); DESIGN.md: cone = field, softness = field − beam
    const d = fromDatasheet({ beamDeg: 30, fieldDeg: 50, family: "fresnel" });
    expect(d).toEqual({ coneDeg: 50, softnessDeg: 20 });
    for (const family of ["fresnel", "wash", "par", "led-wash", "cyc"] as const) {
      expect(relativeIntensity(0, d.coneDeg, d.softnessDeg, family)).toBe(1);
      expect(relativeIntensity(15, d.coneDeg, d.softnessDeg, family)).toBeCloseTo(0.5, 12);
      expect(relativeIntensity(25, d.coneDeg, d.softnessDeg, family)).toBeCloseTo(0.1, 12);
      expect(relativeIntensity(25.01, d.coneDeg, d.softnessDeg, family)).toBe(0);
      // Peaked: already below full at 5° off axis, unlike the flat profile spot.
      expect(relativeIntensity(5, d.coneDeg, d.softnessDeg, family)).toBeLessThan(1);
    }
    expect(relativeIntensity(5, d.coneDeg, d.softnessDeg, "profile")).toBe(1);
  });

  it("the peaked curve falls steadily from the axis", () => {
    // from memory: fresnel and wash beams fall monotonically from a central hot spot
    let last = 2;
    for (let b = 0; b <= 25; b += 0.25) {
      const v = relativeIntensity(b, 50, 20, "fresnel");
      expect(v).toBeLessThan(last);
      last = v;
    }
  });

  it("a datasheet with a beam under half the field is flagged; a wider beam than field is rejected", () => {
    // DESIGN.md: softness above half the cone is clamped (house rule: clamp or report)
    expect(fromDatasheet({ beamDeg: 10, fieldDeg: 40, family: "fresnel" }).warning).toMatch(/no even core/);
    expect(() => fromDatasheet({ beamDeg: 50, fieldDeg: 40 })).toThrow(RangeError);
    expect(() => fromDatasheet({ beamDeg: 0, fieldDeg: 40 })).toThrow(RangeError);
  });

  it("lists every family with a plain label", () => {
    // house rule: Family union and FIXTURE_FAMILIES list
    expect(FIXTURE_FAMILIES.map((f) => f.value).sort()).toEqual([
      "cyc",
      "followspot",
      "fresnel",
      "led-wash",
      "par",
      "profile",
      "wash",
    ]);
    for (const f of FIXTURE_FAMILIES) expect(f.label).toMatch(/^[A-Z][A-Za-z ]+$/);
  });
});

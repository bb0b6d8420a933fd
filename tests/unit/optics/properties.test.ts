// Property tests (fast-check) for the beam model's invariants.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  formatLength,
  illuminanceAt,
  parseLength,
  poolAtPlane,
  relativeIntensity,
  shadowOf,
  type Ellipse,
} from "@/lib/optics";
import { aimed, D2R, numbersIn } from "./helpers";

const height = fc.double({ min: 0.5, max: 30, noNaN: true });
const cone = fc.double({ min: 0.5, max: 120, noNaN: true });
const share = fc.double({ min: 0, max: 0.5, noNaN: true });
const pan = fc.double({ min: -180, max: 180, noNaN: true });

/** Value of the ellipse's equation at a point: ≤ 1 inside. */
function level(e: Ellipse, x: number, y: number): number {
  const r = e.rotationDeg * D2R;
  const u = (x - e.centre.x) * Math.cos(r) + (y - e.centre.y) * Math.sin(r);
  const v = -(x - e.centre.x) * Math.sin(r) + (y - e.centre.y) * Math.cos(r);
  return (u / e.semiMajor) ** 2 + (v / e.semiMinor) ** 2;
}

function boundary(e: Ellipse, n = 64): Array<[number, number]> {
  const r = e.rotationDeg * D2R;
  return Array.from({ length: n }, (_, k) => {
    const t = (2 * Math.PI * k) / n;
    const u = e.semiMajor * Math.cos(t);
    const v = e.semiMinor * Math.sin(t);
    return [e.centre.x + u * Math.cos(r) - v * Math.sin(r), e.centre.y + u * Math.sin(r) + v * Math.cos(r)];
  });
}

describe("pool invariants", () => {
  it("the core lies inside the 50 % ellipse, which lies inside the outer one", () => {
    // DESIGN.md: nested cones θ−2s ⊂ θ−s ⊂ θ meet the plane in nested ellipses
    fc.assert(
      fc.property(height, fc.double({ min: 0, max: 85, noNaN: true }), cone, share, pan, (h, phi, c, sh, p) => {
        const pool = poolAtPlane({ ...aimed(h, phi, p), coneDeg: c, softnessDeg: c * sh, planeZ: 0 });
        fc.pre(pool.status === "ok" && pool.core !== null);
        for (const [x, y] of boundary(pool.core!)) expect(level(pool.half!, x, y)).toBeLessThanOrEqual(1 + 1e-9);
        for (const [x, y] of boundary(pool.half!)) expect(level(pool.outer!, x, y)).toBeLessThanOrEqual(1 + 1e-9);
      }),
      { numRuns: 300 },
    );
  });

  it("as tilt → 0 the ellipse becomes the circle of radius h·tan(α)", () => {
    // REFERENCE.md: a = h·sinα·cosα/A → h·tanα as φ → 0 (trigonometry)
    fc.assert(
      fc.property(
        height,
        fc.double({ min: 0, max: 1e-4, noNaN: true }),
        fc.double({ min: 0.5, max: 150, noNaN: true }),
        pan,
        (h, phiRad, c, p) => {
          const pool = poolAtPlane({ ...aimed(h, phiRad / D2R, p), coneDeg: c, softnessDeg: 0, planeZ: 0 });
          const r = h * Math.tan((c / 2) * D2R);
          expect(Math.abs(pool.outer!.semiMajor - r)).toBeLessThanOrEqual(1e-6 * r);
          expect(Math.abs(pool.outer!.semiMinor - r)).toBeLessThanOrEqual(1e-6 * r);
          // The centre's offset vanishes with the tilt (linearly: h·sinφ·cosφ/K ≤ 15·h·φ for α ≤ 75°).
          expect(Math.hypot(pool.outer!.centre.x, pool.outer!.centre.y)).toBeLessThanOrEqual(20 * h * phiRad);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("the far band is never narrower than the near band", () => {
    // DESIGN.md: the far side is always the widest on a tilted beam
    fc.assert(
      fc.property(height, fc.double({ min: 0, max: 89, noNaN: true }), cone, share, pan, (h, phi, c, sh, p) => {
        const pool = poolAtPlane({ ...aimed(h, phi, p), coneDeg: c, softnessDeg: c * sh, planeZ: 0 });
        fc.pre(pool.status === "ok");
        expect(pool.band!.far).toBeGreaterThanOrEqual(pool.band!.near);
        expect(pool.band!.near).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 500 },
    );
  });

  it("never puts NaN or Infinity in a pool, an illuminance or a shadow", () => {
    // house rule: never NaN/Infinity in output
    const coord = fc.double({ min: -50, max: 50, noNaN: true });
    const point = fc.record({ x: coord, y: coord, z: coord });
    fc.assert(
      fc.property(
        point,
        point,
        fc.double({ min: 1e-6, max: 179.999, noNaN: true }),
        fc.double({ min: 0, max: 200, noNaN: true }),
        fc.double({ min: -5, max: 60, noNaN: true }),
        fc.constantFrom("profile", "fresnel", "wash", "cyc" as const),
        (source, focus, c, s, planeZ, family) => {
          fc.pre(Math.hypot(focus.x - source.x, focus.y - source.y, focus.z - source.z) > 1e-3);
          const pool = poolAtPlane({ source, focus, coneDeg: c, softnessDeg: s, planeZ });
          expect(numbersIn(pool).every(Number.isFinite)).toBe(true);
          const e = illuminanceAt({ x: focus.x, y: focus.y, z: planeZ }, [
            { source, focus, coneDeg: c, softnessDeg: s, peakCandela: 50_000, level: 1, family },
          ]);
          expect(Number.isFinite(e) && e >= 0).toBe(true);
          expect(Number.isFinite(relativeIntensity(c / 3, c, s, family))).toBe(true);
          fc.pre(source.y < 60 && Math.hypot(source.x - 1, source.y - 1) > 0.3);
          const sh = shadowOf({
            source,
            apertureDiameter: 0.15,
            backWallY: 60,
            occluder: { kind: "performer", x: 1, y: 1, height: 1.75, radius: 0.25 },
          });
          expect(numbersIn(sh).every(Number.isFinite)).toBe(true);
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe("length text round-trips", () => {
  it("imperial: parse(format(x)) is within half an inch (in fact a quarter)", () => {
    // DESIGN.md: imperial shown to the half inch; NIST SP 811: 1 in = 0.0254 m
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (x) => {
        const back = parseLength(formatLength(x, "imperial"), "ft");
        expect(Math.abs(back - x)).toBeLessThanOrEqual(0.25 * 0.0254 + 1e-12);
      }),
      { numRuns: 2000 },
    );
  });

  it("metric: parse(format(x)) is within half a centimetre", () => {
    // DESIGN.md: metric shown to two decimals
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (x) => {
        expect(Math.abs(parseLength(formatLength(x, "metric"), "ft") - x)).toBeLessThanOrEqual(0.005 + 1e-12);
      }),
      { numRuns: 2000 },
    );
  });
});

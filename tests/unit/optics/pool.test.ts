import { describe, expect, it } from "vitest";
import { beamAim, poolAtPlane } from "@/lib/optics";
import { aimed, D2R, numbersIn } from "./helpers";

const FT = 0.3048;

describe("pool on a surface square to the beam", () => {
  // REFERENCE.md: beam spread table, lighting handbooks' multiplying factor (trigonometry), rounded to 5 places
  const table: Array<[number, number]> = [
    [5, 0.08732],
    [10, 0.17498],
    [14, 0.24557],
    [19, 0.33469],
    [26, 0.46174],
    [36, 0.64984],
    [50, 0.93262],
    [70, 1.40042],
    [90, 2],
  ];
  it.each(table)("cone %i° spreads %f × the throw", (cone, factor) => {
    const d = 7.5;
    const p = poolAtPlane({ ...aimed(d, 0), coneDeg: cone, softnessDeg: 0, planeZ: 0 });
    expect(p.status).toBe("ok");
    expect(Math.abs(p.lengthAlong! / d - factor)).toBeLessThanOrEqual(1e-4 * factor);
    // Straight down the pool is a circle: closed form 2·d·tan(θ/2), relative 1e-9.
    expect(Math.abs(p.lengthAlong! - 2 * d * Math.tan((cone / 2) * D2R))).toBeLessThanOrEqual(1e-9 * d);
    expect(Math.abs(p.widthAcross! - p.lengthAlong!)).toBeLessThanOrEqual(1e-12 * d);
  });

  // REFERENCE.md worked examples: 26° at 20 ft → 9.2347 ft; 36° at 6 m → 3.8990 m; 90° at 3 m → 6 m
  it.each([
    [26, 20 * FT, 9.2347 * FT],
    [36, 6, 3.899],
    [90, 3, 6],
  ])("cone %i° at %f m gives %f m", (cone, d, diameter) => {
    const p = poolAtPlane({ ...aimed(d, 0), coneDeg: cone, softnessDeg: 3, planeZ: 0 });
    expect(Math.abs(p.lengthAlong! - diameter)).toBeLessThanOrEqual(1e-4 * diameter);
  });

  it("the small-angle shortcut θ·d is about 1 % off at 26°, so the pool uses tan", () => {
    // REFERENCE.md: beam spread note (trigonometry)
    const p = poolAtPlane({ ...aimed(10, 0), coneDeg: 26, softnessDeg: 0, planeZ: 0 });
    const shortcut = 26 * D2R * 10;
    expect((p.lengthAlong! - shortcut) / shortcut).toBeGreaterThan(0.008);
    expect((p.lengthAlong! - shortcut) / shortcut).toBeLessThan(0.02);
  });
});

describe("tilted pool ellipse", () => {
  // REFERENCE.md: pool ellipse table (conic section; checked numerically with three.js rays), relative 1e-4
  const rows: Array<[number, number, number, number, number, number, number]> = [
    [6, 0, 13, 1.38521, 1.38521, 0, 0],
    [20, 30, 18, 8.98056, 7.63932, 13.23169, 11.54701],
    [5, 60, 9.5, 3.65381, 1.74848, 9.7193, 8.66025],
    [4, 70, 15, 20.00381, 4.63034, 25.7164, 10.98991],
  ];
  it.each(rows)("h %f, φ %f°, α %f°", (h, phi, alpha, a, b, centre, hit) => {
    for (const pan of [0, 135, -60]) {
      const p = poolAtPlane({ ...aimed(h, phi, pan), coneDeg: 2 * alpha, softnessDeg: 1, planeZ: 0 });
      const o = p.outer!;
      expect(Math.abs(o.semiMajor - a)).toBeLessThanOrEqual(1e-4 * a);
      expect(Math.abs(o.semiMinor - b)).toBeLessThanOrEqual(1e-4 * b);
      expect(Math.abs(Math.hypot(o.centre.x, o.centre.y) - centre)).toBeLessThanOrEqual(1e-4 * Math.max(centre, 1));
      expect(Math.abs(Math.hypot(p.axisHit!.x, p.axisHit!.y) - hit)).toBeLessThanOrEqual(1e-4 * Math.max(hit, 1));
      expect(p.lengthAlong).toBeCloseTo(2 * o.semiMajor, 12);
      expect(p.widthAcross).toBeCloseTo(2 * o.semiMinor, 12);
      if (phi > 0) {
        // The major axis points along the pan, away from the lens.
        expect(o.rotationDeg).toBeCloseTo(pan, 9);
        const bearing = Math.atan2(o.centre.y, o.centre.x) / D2R;
        expect(bearing).toBeCloseTo(pan, 9);
      }
    }
  });

  it("the centre lies beyond the axis hit by h·tanφ·sin²α/A", () => {
    // REFERENCE.md: pool ellipse, closed form against closed form, relative 1e-9
    const [h, phi, al] = [20, 30 * D2R, 18 * D2R];
    const A = Math.cos(al) ** 2 - Math.sin(phi) ** 2;
    const p = poolAtPlane({ ...aimed(h, 30), coneDeg: 36, softnessDeg: 0, planeZ: 0 });
    const gap = p.outer!.centre.x - p.axisHit!.x;
    const expected = (h * Math.tan(phi) * Math.sin(al) ** 2) / A;
    expect(Math.abs(gap - expected)).toBeLessThanOrEqual(1e-9 * expected);
  });

  it("near and far soft bands are the differences of h·tan(φ∓α) for outer and core", () => {
    // REFERENCE.md: near edge h·tan(φ−α), far edge h·tan(φ+α) (trigonometry), relative 1e-9
    const h = 7;
    const phi = 50 * D2R;
    const [ao, ac] = [12 * D2R, 8 * D2R]; // cone 24°, softness 4°
    const p = poolAtPlane({ ...aimed(h, 50), coneDeg: 24, softnessDeg: 4, planeZ: 0 });
    const near = h * (Math.tan(phi - ac) - Math.tan(phi - ao));
    const far = h * (Math.tan(phi + ao) - Math.tan(phi + ac));
    expect(Math.abs(p.band!.near - near)).toBeLessThanOrEqual(1e-9 * near);
    expect(Math.abs(p.band!.far - far)).toBeLessThanOrEqual(1e-9 * far);
    expect(p.band!.far).toBeGreaterThan(p.band!.near);
    expect(p.band!.across).toBeCloseTo(p.outer!.semiMinor - p.core!.semiMinor, 12);
  });

  it("measures h from the chosen plane (head height)", () => {
    // common practice, no source: a focus to head height is the deck geometry with h = lens − 1.7 m
    const atHead = poolAtPlane({ ...aimed(7.7, 40, 0, 1.7), coneDeg: 20, softnessDeg: 2, planeZ: 1.7 });
    const sameOnDeck = poolAtPlane({ ...aimed(6, 40), coneDeg: 20, softnessDeg: 2, planeZ: 0 });
    expect(atHead.outer!.semiMajor).toBeCloseTo(sameOnDeck.outer!.semiMajor, 12);
    expect(atHead.outer!.centre.x).toBeCloseTo(sameOnDeck.outer!.centre.x, 12);
  });
});

describe("edge cases", () => {
  it("φ + α = 90° is an open pool, never a number", () => {
    // REFERENCE.md trap: A evaluates to ~2.2e-16 at φ+α = 90°; decide in angle space
    const p = poolAtPlane({ ...aimed(6, 60), coneDeg: 60, softnessDeg: 4, planeZ: 0 });
    expect(p.status).toBe("open");
    expect(p.reason).toMatch(/horizon/);
    expect(p.outer).toBeNull();
    expect(p.lengthAlong).toBeNull();
    expect(p.widthAcross).toBeNull();
    expect(p.band).toBeNull();
    // The axis still lands, and the narrower cones still close.
    expect(p.axisHit!.x).toBeCloseTo(6 * Math.tan(60 * D2R), 9);
    expect(p.core).not.toBeNull();
    expect(numbersIn(p).every(Number.isFinite)).toBe(true);
  });

  it("just inside the horizon gives a large but finite pool", () => {
    // from memory: the pool grows without bound as the edge nears the horizon (1/cos(φ+α))
    const p = poolAtPlane({ ...aimed(6, 60), coneDeg: 59.99, softnessDeg: 4, planeZ: 0 });
    expect(p.status).toBe("ok");
    expect(p.lengthAlong!).toBeGreaterThan(1000);
    expect(numbersIn(p).every(Number.isFinite)).toBe(true);
  });

  it("a level axis is open with no axis hit", () => {
    // trigonometry: a horizontal axis never meets the plane, while the lower half of the cone does
    const p = poolAtPlane({
      source: { x: 0, y: 0, z: 6 },
      focus: { x: 5, y: 0, z: 6 },
      coneDeg: 20,
      softnessDeg: 2,
      planeZ: 0,
    });
    expect(p.status).toBe("open");
    expect(p.axisHit).toBeNull();
  });

  it("a plane at or above the lens has no pool", () => {
    // DESIGN.md: the beam model, edge cases
    for (const planeZ of [6, 7]) {
      const p = poolAtPlane({ ...aimed(6, 30), coneDeg: 20, softnessDeg: 2, planeZ });
      expect(p.status).toBe("none");
      expect(p.reason).toMatch(/at or above the lens/);
      expect([p.outer, p.half, p.core, p.axisHit, p.band, p.lengthAlong]).toEqual([null, null, null, null, null, null]);
    }
  });

  it("an axis pointing up has no pool", () => {
    // DESIGN.md: the beam model, edge cases
    const p = poolAtPlane({
      source: { x: 0, y: 0, z: 1 },
      focus: { x: 2, y: 1, z: 4 },
      coneDeg: 20,
      softnessDeg: 2,
      planeZ: 0,
    });
    expect(p.status).toBe("none");
    expect(p.reason).toMatch(/upward/);
  });

  it("rejects a zero-length throw", () => {
    // DESIGN.md: throw = |F − S| must be > 0 to give the axis a direction
    const s = { x: 1, y: 2, z: 6 };
    expect(() => poolAtPlane({ source: s, focus: { ...s }, coneDeg: 20, softnessDeg: 2, planeZ: 0 })).toThrow(
      RangeError,
    );
    expect(() => beamAim({ source: s, focus: { ...s } })).toThrow(/throw longer than zero/);
  });

  it.each([0, -5, 180, 200, Number.NaN, Number.POSITIVE_INFINITY])("rejects a cone of %f°", (cone) => {
    // house rule: cone must be > 0 and < 180
    expect(() => poolAtPlane({ ...aimed(6, 20), coneDeg: cone, softnessDeg: 0, planeZ: 0 })).toThrow(RangeError);
  });

  it("rejects negative softness and non-finite positions", () => {
    // house rule: softness ≥ 0; never NaN in output
    expect(() => poolAtPlane({ ...aimed(6, 20), coneDeg: 20, softnessDeg: -1, planeZ: 0 })).toThrow(/softness/);
    const nan = { x: Number.NaN, y: 0, z: 6 };
    expect(() =>
      poolAtPlane({ source: nan, focus: { x: 0, y: 0, z: 0 }, coneDeg: 20, softnessDeg: 1, planeZ: 0 }),
    ).toThrow(RangeError);
    expect(() => poolAtPlane({ ...aimed(6, 20), coneDeg: 20, softnessDeg: 1, planeZ: Number.NaN })).toThrow(
      /Plane height/,
    );
  });

  it("clamps softness above half the cone, with a warning and no core", () => {
    // DESIGN.md: the core is empty when θ ≤ 2s; the band then runs to the axis hit (core of half-angle 0)
    const p = poolAtPlane({ ...aimed(6, 35), coneDeg: 20, softnessDeg: 15, planeZ: 0 });
    expect(p.status).toBe("ok");
    expect(p.warnings[0]).toMatch(/more than half/);
    expect(p.core).toBeNull();
    const clamped = poolAtPlane({ ...aimed(6, 35), coneDeg: 20, softnessDeg: 10, planeZ: 0 });
    expect(p.half!.semiMajor).toBeCloseTo(clamped.half!.semiMajor, 12);
    const h = 6;
    const near = h * (Math.tan(35 * D2R) - Math.tan(25 * D2R));
    expect(p.band!.near).toBeCloseTo(near, 12);
    expect(clamped.warnings).toEqual([]);
  });
});

describe("beamAim", () => {
  it("gives throw, tilt below horizontal and pan counter-clockwise from stage left", () => {
    // trigonometry (3-4-5 triangle in plan, 5-12-13 in section)
    const a = beamAim({ source: { x: 0, y: 0, z: 12 }, focus: { x: -3, y: -4, z: 0 } });
    expect(a.throw).toBeCloseTo(13, 12);
    expect(a.tiltDeg).toBeCloseTo(Math.atan2(12, 5) / D2R, 12);
    expect(a.panDeg).toBeCloseTo(Math.atan2(-4, -3) / D2R, 12);
    const down = beamAim({ source: { x: 1, y: 1, z: 6 }, focus: { x: 1, y: 1, z: 0 } });
    expect(down).toEqual({ throw: 6, tiltDeg: 90, panDeg: 0 });
    const up = beamAim({ source: { x: 0, y: 0, z: 0 }, focus: { x: 1, y: 0, z: 1 } });
    expect(up.tiltDeg).toBeCloseTo(-45, 12);
  });
});

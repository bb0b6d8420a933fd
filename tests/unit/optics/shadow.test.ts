import { describe, expect, it } from "vitest";
import {
  penumbraWidth,
  pointInPolygon,
  polygonArea,
  shadowOf,
  shadowPolygons,
  umbraWidth,
  type ShadowInput,
} from "@/lib/optics";
import { D2R, numbersIn } from "./helpers";

const performer = { kind: "performer" as const, x: 0, y: 0, height: 1.75, radius: 0.25 };
const front: ShadowInput = { source: { x: 0, y: -8, z: 6 }, apertureDiameter: 0.15, backWallY: 8, occluder: performer };

describe("umbra and penumbra widths (similar triangles)", () => {
  it("W 0.1, D 0.3, a 3: b 0.5 gives umbra 0.06667 and penumbra 0.05; b 1.5 gives no umbra", () => {
    // REFERENCE.md: shadows check values (similar triangles)
    expect(Math.abs(umbraWidth(0.1, 0.3, 3, 0.5) - 0.06667)).toBeLessThanOrEqual(1e-4 * 0.06667);
    expect(penumbraWidth(0.3, 3, 0.5)).toBeCloseTo(0.05, 12);
    expect(umbraWidth(0.1, 0.3, 3, 1.5)).toBeCloseTo(0, 12);
    expect(umbraWidth(0.1, 0.3, 3, 2.5)).toBe(0);
  });

  it("stage lens D 0.15 m, edge 8 m away, surface 1.7 m beyond: penumbra 0.031875 m", () => {
    // REFERENCE.md: shadows, stage check value
    expect(penumbraWidth(0.15, 8, 1.7)).toBeCloseTo(0.031875, 12);
  });

  it("the Sun's 0.533° disc: an edge 2.5 m up casts a penumbra of about 23 mm", () => {
    // REFERENCE.md: Sun's mean angular diameter ≈ 0.533° (NASA Sun fact sheet, from memory: 1919″), so the
    // penumbra is 2·tan(0.2665°) ≈ 0.93 % of the distance from edge to shadow; worked: 2.5 m × 0.0093 ≈ 23 mm.
    const a = 1.496e11;
    const d = 2 * a * Math.tan((0.533 / 2) * D2R);
    const p = penumbraWidth(d, a, 2.5);
    expect(p / 2.5).toBeCloseTo(0.0093, 4);
    expect(Math.abs(p - 0.023)).toBeLessThan(0.0005);
  });

  it("the Sun overhead through shadowOf: a 2.5 m panel edge gives about 23 mm of penumbra", () => {
    // REFERENCE.md: Sun's angular diameter 0.533° (NASA Sun fact sheet, from memory) → 0.93 % of 2.5 m ≈ 23 mm
    const a = 1.496e11;
    const sun: ShadowInput = {
      source: { x: 0, y: 0, z: a },
      apertureDiameter: 2 * a * Math.tan((0.533 / 2) * D2R),
      backWallY: Infinity,
      occluder: { kind: "panel", a: { x: -1, y: 0 }, b: { x: 1, y: 0 }, height: 2.5 },
    };
    const s = shadowOf(sun);
    expect(s.lands).toBe("deck");
    expect(Math.abs(s.penumbraWidth! - 0.023)).toBeLessThan(0.0005);
    expect(s.incidenceDeg).toBeCloseTo(0, 6);
  });

  it("a point source (D = 0) casts no penumbra, and umbra and outline coincide", () => {
    // REFERENCE.md: penumbra D·b/a, zero for D = 0 (similar triangles)
    const s = shadowOf({ ...front, apertureDiameter: 0 });
    expect(s.penumbraWidth).toBe(0);
    const pts = shadowPolygons({ ...front, apertureDiameter: 0 });
    expect(polygonArea(pts.umbra)).toBeCloseTo(polygonArea(pts.penumbra), 9);
  });
});

describe("shadowOf", () => {
  it("finds the tip of a performer's shadow on the deck by similar triangles", () => {
    // similar triangles: the far top edge at 8.25 m from the lens's foot, 1.75 m up, lens 6 m up
    const s = shadowOf(front);
    const tipFromFoot = (8.25 * 6) / (6 - 1.75);
    expect(s.lands).toBe("deck");
    expect(s.tip!.y).toBeCloseTo(tipFromFoot - 8, 12);
    expect(s.tip!.x).toBeCloseTo(0, 12);
    expect(s.length).toBeCloseTo(tipFromFoot - 8.25, 12);
    const a = Math.hypot(8.25, 6 - 1.75);
    const b = Math.hypot(tipFromFoot - 8.25, 1.75);
    expect(s.penumbraWidth).toBeCloseTo((0.15 * b) / a, 12);
    expect(s.umbraWidth).toBeCloseTo(0.5 + ((0.5 - 0.15) * b) / a, 12);
    expect(s.incidenceDeg).toBeCloseTo(Math.atan2(8.25, 4.25) / D2R, 9);
  });

  it("climbs the back wall when the wall comes first, and reports the height there", () => {
    // similar triangles: the ray from (y −8, z 6) through (y 0.25, z 1.75) at y = 2
    const s = shadowOf({ ...front, backWallY: 2 });
    expect(s.lands).toBe("wall");
    expect(s.wallHeight).toBeCloseTo(6 - (4.25 / 8.25) * 10, 12);
    expect(s.tip).toEqual({ x: 0, y: 2, z: s.wallHeight });
    expect(s.length).toBeCloseTo(1.75, 12);
  });

  it("a lens at or below the top throws the shadow to the wall, or to the horizon without one", () => {
    // DESIGN.md: a lens at or below the top of the occluder throws the shadow to the horizon
    const low = { ...front, source: { x: 0, y: -8, z: 0.5 } };
    const wall = shadowOf(low);
    expect(wall.lands).toBe("wall");
    expect(wall.wallHeight!).toBeGreaterThan(1.75);
    // similar triangles: the near side of the head (y −0.25, 7.75 m from the lens) casts the top of the shadow
    expect(wall.wallHeight).toBeCloseTo(0.5 + (1.25 / 7.75) * 16, 12);
    const level = shadowOf({ ...front, source: { x: 0, y: -8, z: 1.75 } });
    expect(level.wallHeight).toBeCloseTo(1.75, 12);
    const open = shadowOf({ ...low, backWallY: Infinity });
    expect(open.lands).toBe("unbounded");
    expect(open.reason).toMatch(/horizon/);
    expect([open.tip, open.length, open.penumbraWidth, open.umbraWidth]).toEqual([null, null, null, null]);
    // A low lens upstage of the performer sends the shadow downstage, away from the wall.
    expect(shadowOf({ ...front, source: { x: 0, y: 4, z: 0.5 } }).lands).toBe("unbounded");
    expect(shadowPolygons(low).umbra).toEqual([]);
  });

  it("a panel's umbra uses its width as seen from the lens", () => {
    // similar triangles: 2 m panel square to the line of sight, lens 6 m downstage and 7 m up
    const s = shadowOf({
      source: { x: 0, y: -6, z: 7 },
      apertureDiameter: 0.2,
      backWallY: Infinity,
      occluder: { kind: "panel", a: { x: -1, y: 0 }, b: { x: 1, y: 0 }, height: 2.5 },
    });
    expect(s.tip!.y).toBeCloseTo((6 * 7) / 4.5 - 6, 12);
    const a = Math.hypot(6, 4.5);
    const b = (a * 2.5) / 4.5;
    expect(s.umbraWidth).toBeCloseTo(2 + ((2 - 0.2) * b) / a, 12);
    const edgeOn = shadowOf({
      source: { x: 0, y: -6, z: 7 },
      apertureDiameter: 0.2,
      backWallY: Infinity,
      occluder: { kind: "panel", a: { x: 0, y: -1 }, b: { x: 0, y: 1 }, height: 2.5 },
    });
    expect(edgeOn.umbraWidth).toBe(0);
  });

  it("reports no shadow from a lens inside the occluder, and rejects bad input", () => {
    // DESIGN.md: lands "none"; house rule: RangeError with a readable message for invalid input
    expect(shadowOf({ ...front, source: { x: 0.1, y: 0, z: 1 } }).lands).toBe("none");
    expect(() => shadowOf({ ...front, apertureDiameter: -0.1 })).toThrow(/aperture/);
    expect(() => shadowOf({ ...front, occluder: { ...performer, height: 0 } })).toThrow(/height/);
    expect(() => shadowOf({ ...front, backWallY: -1 })).toThrow(/back wall/);
  });
});

describe("shadowPolygons", () => {
  it("draws an umbra inside the outline, stretched along the deck by 1/cos(incidence)", () => {
    // REFERENCE.md: divide by cos(incidence) on a tilted surface (similar triangles)
    const s = shadowOf(front);
    const p = shadowPolygons(front);
    expect(p.umbra.length).toBeGreaterThan(3);
    for (const v of p.umbra) expect(pointInPolygon({ x: v.x * 0.999, y: v.y * 0.999 }, p.penumbra)).toBe(true);
    const maxY = (q: { y: number }[]) => Math.max(...q.map((v) => v.y));
    const radial = maxY(p.penumbra) - maxY(p.umbra);
    const expected = s.penumbraWidth! / Math.cos(s.incidenceDeg! * D2R);
    expect(Math.abs(radial - expected)).toBeLessThan(0.01 * expected);
    // The point-source tip sits between the two outlines.
    expect(maxY(p.penumbra)).toBeGreaterThan(s.tip!.y);
    expect(maxY(p.umbra)).toBeLessThan(s.tip!.y);
    const width = (q: { x: number }[]) => Math.max(...q.map((v) => v.x)) - Math.min(...q.map((v) => v.x));
    expect(Math.abs(width(p.umbra) - s.umbraWidth!)).toBeLessThan(0.005 * s.umbraWidth!);
    expect(numbersIn(p).every(Number.isFinite)).toBe(true);
  });

  it("keeps the drawn shadow in front of the back wall", () => {
    // DESIGN.md: the shadow lands on the deck up to the back wall
    const p = shadowPolygons({ ...front, backWallY: 2 });
    expect(p.penumbra.length).toBeGreaterThan(3);
    expect(Math.max(...p.penumbra.map((v) => v.y))).toBeCloseTo(2, 9);
  });
});

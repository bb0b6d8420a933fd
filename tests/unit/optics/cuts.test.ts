import { describe, expect, it } from "vitest";
import { clipPoolByCuts, ellipseToPolygon, polygonArea, type Ellipse } from "@/lib/optics";
import { D2R } from "./helpers";

const circle: Ellipse = { centre: { x: 0, y: 0 }, semiMajor: 1, semiMinor: 1, rotationDeg: 0 };

describe("ellipseToPolygon", () => {
  it("puts every point on the ellipse and has the inscribed area ab·(n/2)·sin(2π/n)", () => {
    // geometry: an ellipse is an affine image of a circle, so the inscribed n-gon keeps that area ratio
    const e: Ellipse = { centre: { x: 2, y: -1 }, semiMajor: 3, semiMinor: 1.5, rotationDeg: 30 };
    const pts = ellipseToPolygon(e);
    expect(pts).toHaveLength(96);
    const [c, s] = [Math.cos(30 * D2R), Math.sin(30 * D2R)];
    for (const p of pts) {
      const u = (p.x - 2) * c + (p.y + 1) * s;
      const v = -(p.x - 2) * s + (p.y + 1) * c;
      expect((u / 3) ** 2 + (v / 1.5) ** 2).toBeCloseTo(1, 12);
    }
    expect(polygonArea(pts)).toBeCloseTo(4.5 * 48 * Math.sin((2 * Math.PI) / 96), 10);
    expect(() => ellipseToPolygon(e, 2)).toThrow(RangeError);
  });
});

describe("clipPoolByCuts", () => {
  it("keeps the side of each cut that holds the focus mark", () => {
    // geometry: a chord at x = 0.5 of a unit circle leaves the larger piece on the mark's side
    const kept = clipPoolByCuts(circle, [{ a: { x: 0.5, y: -2 }, b: { x: 0.5, y: 2 } }], { x: 0, y: 0 });
    expect(Math.max(...kept.map((p) => p.x))).toBeCloseTo(0.5, 12);
    const segment = Math.acos(0.5) - 0.5 * Math.sqrt(0.75); // circular segment beyond x = 0.5
    expect(polygonArea(kept)).toBeCloseTo(Math.PI - segment, 2);
    const other = clipPoolByCuts(circle, [{ a: { x: 0.5, y: -2 }, b: { x: 0.5, y: 2 } }], { x: 0.9, y: 0 });
    expect(Math.min(...other.map((p) => p.x))).toBeCloseTo(0.5, 12);
    expect(polygonArea(other)).toBeCloseTo(segment, 2);
  });

  it("four cuts framing a square inside the pool leave exactly that square", () => {
    // geometry: four half-planes x, y ∈ [−0.5, 0.5]
    const big: Ellipse = { centre: { x: 0, y: 0 }, semiMajor: 5, semiMinor: 4, rotationDeg: 10 };
    const cuts = [
      { a: { x: -0.5, y: -9 }, b: { x: -0.5, y: 9 } },
      { a: { x: 0.5, y: 9 }, b: { x: 0.5, y: -9 } },
      { a: { x: -9, y: -0.5 }, b: { x: 9, y: -0.5 } },
      { a: { x: -9, y: 0.5 }, b: { x: 9, y: 0.5 } },
    ];
    const sq = clipPoolByCuts(big, cuts, { x: 0.1, y: 0.2 });
    expect(polygonArea(sq)).toBeCloseTo(1, 12);
    expect(() => clipPoolByCuts(big, [...cuts, cuts[0]], { x: 0, y: 0 })).toThrow(/at most 4/);
  });

  it("accepts a polygon, leaves a far cut alone and can cut everything away", () => {
    // geometry
    const poly = ellipseToPolygon(circle, 32);
    const far = clipPoolByCuts(poly, [{ a: { x: 3, y: 0 }, b: { x: 3, y: 1 } }], { x: 0, y: 0 });
    expect(polygonArea(far)).toBeCloseTo(polygonArea(poly), 12);
    expect(clipPoolByCuts(poly, [{ a: { x: 3, y: 0 }, b: { x: 3, y: 1 } }], { x: 4, y: 0 })).toEqual([]);
  });

  it("refuses a cut with one point or a mark lying on the cut", () => {
    // house rule: readable errors rather than a guess
    expect(() => clipPoolByCuts(circle, [{ a: { x: 1, y: 1 }, b: { x: 1, y: 1 } }], { x: 0, y: 0 })).toThrow(
      /two different points/,
    );
    expect(() => clipPoolByCuts(circle, [{ a: { x: -1, y: 0 }, b: { x: 1, y: 0 } }], { x: 0, y: 0 })).toThrow(
      /lies on shutter cut 1/,
    );
  });
});

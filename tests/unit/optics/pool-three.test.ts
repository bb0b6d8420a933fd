// Independent numerical reference: three.js rays around the cone, intersected with the plane.
// REFERENCE.md: "Independent reference: three (Ray, Plane, Vector3)"; tolerance against sampled geometry 1e-6.
import { Plane, Ray, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { poolAtPlane, type Ellipse, type Vec3 } from "@/lib/optics";
import { aimed, D2R } from "./helpers";

const RAYS = 4000;
const TOL = 1e-6;

/** Hit point of the cone ray at parameter t (radians around the axis), or null if it misses the plane. */
function makeCone(source: Vec3, focus: Vec3, alpha: number, planeZ: number) {
  const origin = new Vector3(source.x, source.y, source.z);
  const axis = new Vector3(focus.x - source.x, focus.y - source.y, focus.z - source.z).normalize();
  // Any two vectors square to the axis will do; the reference must not assume where the extremes lie.
  const helper = Math.abs(axis.x) < 0.9 ? new Vector3(1, 0, 0) : new Vector3(0, 1, 0);
  const e1 = new Vector3().crossVectors(axis, helper).normalize();
  const e2 = new Vector3().crossVectors(axis, e1).normalize();
  const plane = new Plane(new Vector3(0, 0, 1), -planeZ);
  const ray = new Ray();
  return (t: number): Vector3 | null => {
    const dir = axis
      .clone()
      .multiplyScalar(Math.cos(alpha))
      .addScaledVector(e1, Math.sin(alpha) * Math.cos(t))
      .addScaledVector(e2, Math.sin(alpha) * Math.sin(t));
    ray.set(origin, dir);
    return ray.intersectPlane(plane, new Vector3());
  };
}

/** Golden-section search for the maximum of f near t0: refines a sampled extreme far below the sample step. */
function refineMax(f: (t: number) => number, t0: number, dt: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let [lo, hi] = [t0 - dt, t0 + dt];
  for (let k = 0; k < 100; k++) {
    const m1 = hi - g * (hi - lo);
    const m2 = lo + g * (hi - lo);
    if (f(m1) < f(m2)) lo = m1;
    else hi = m2;
  }
  return f((lo + hi) / 2);
}

function extreme(hit: (t: number) => Vector3 | null, proj: (v: Vector3) => number): number {
  const step = (2 * Math.PI) / RAYS;
  let best = -Infinity;
  let bestT = 0;
  for (let k = 0; k < RAYS; k++) {
    const v = hit(k * step);
    if (v && proj(v) > best) [best, bestT] = [proj(v), k * step];
  }
  return refineMax((t) => proj(hit(t)!), bestT, step);
}

function compareCone(source: Vec3, focus: Vec3, alpha: number, planeZ: number, e: Ellipse) {
  const hit = makeCone(source, focus, alpha, planeZ);
  const r = e.rotationDeg * D2R;
  const [ux, uy] = [Math.cos(r), Math.sin(r)];
  const along = (v: Vector3) => (v.x - source.x) * ux + (v.y - source.y) * uy;
  const across = (v: Vector3) => -(v.x - source.x) * uy + (v.y - source.y) * ux;
  const scale = e.semiMajor;

  // Every sampled hit lies on the analytic ellipse (worst residual of the ellipse equation).
  let worst = 0;
  let missed = 0;
  for (let k = 0; k < RAYS; k++) {
    const v = hit((2 * Math.PI * k) / RAYS);
    if (!v) {
      missed++;
      continue;
    }
    const du = (v.x - e.centre.x) * ux + (v.y - e.centre.y) * uy;
    const dv = -(v.x - e.centre.x) * uy + (v.y - e.centre.y) * ux;
    worst = Math.max(worst, Math.abs((du / e.semiMajor) ** 2 + (dv / e.semiMinor) ** 2 - 1));
  }
  expect(missed).toBe(0);
  expect(worst).toBeLessThan(TOL);
  // Extremes of the sampled hits: near and far edges, half-width across, and the centre between the edges.
  const far = extreme(hit, along);
  const near = -extreme(hit, (v) => -along(v));
  const half = extreme(hit, across);
  const centreAlong = along(new Vector3(e.centre.x, e.centre.y, 0));
  expect(Math.abs(far - (centreAlong + e.semiMajor))).toBeLessThan(TOL * scale);
  expect(Math.abs(near - (centreAlong - e.semiMajor))).toBeLessThan(TOL * scale);
  expect(Math.abs((far + near) / 2 - centreAlong)).toBeLessThan(TOL * scale);
  expect(Math.abs(half - e.semiMinor)).toBeLessThan(TOL * e.semiMinor);
  return { near, far };
}

type Case = [number, number, number, number];
const sweep: Case[] = [];
for (const h of [1.2, 6, 14]) {
  for (const phi of [0, 12, 35, 58, 75]) {
    for (const alpha of [0.8, 6, 15, 28]) {
      if (phi + alpha < 88) sweep.push([h, phi, alpha, (phi * 7 + alpha * 13) % 360]);
    }
  }
}
// Near the horizon: φ + α just below 90°, the hardest case for the closed form and for the rays.
const horizon: Case[] = [
  [6, 80, 9.9, 20],
  [5, 60, 29.99, 200],
  [8, 45, 44.999, -75],
  [3, 89, 0.9, 90],
];

describe("pool ellipse against three.js rays", () => {
  it.each([...sweep, ...horizon])("h %f m, φ %f°, α %f°, pan %f°", (h, phi, alpha, pan) => {
    const { source, focus } = aimed(h, phi, pan);
    const p = poolAtPlane({ source, focus, coneDeg: 2 * alpha, softnessDeg: alpha / 2, planeZ: 0 });
    expect(p.status).toBe("ok");
    const rOuter = compareCone(source, focus, alpha * D2R, 0, p.outer!);
    // Near and far edges as the closed forms h·tan(φ−α) and h·tan(φ+α) (REFERENCE.md), from the rays.
    expect(Math.abs(rOuter.near - h * Math.tan((phi - alpha) * D2R))).toBeLessThan(TOL * p.outer!.semiMajor);
    expect(Math.abs(rOuter.far - h * Math.tan((phi + alpha) * D2R))).toBeLessThan(TOL * p.outer!.semiMajor);
    compareCone(source, focus, alpha * 0.75 * D2R, 0, p.half!);
    compareCone(source, focus, alpha * 0.5 * D2R, 0, p.core!);
    // The axis ray lands on axisHit, which differs from the centre when tilted.
    const axisRay = new Ray(
      new Vector3(source.x, source.y, source.z),
      new Vector3(focus.x - source.x, focus.y - source.y, focus.z - source.z).normalize(),
    );
    const hit = axisRay.intersectPlane(new Plane(new Vector3(0, 0, 1), 0), new Vector3())!;
    const scale = Math.max(1, Math.hypot(hit.x, hit.y));
    expect(Math.abs(hit.x - p.axisHit!.x)).toBeLessThan(TOL * scale);
    expect(Math.abs(hit.y - p.axisHit!.y)).toBeLessThan(TOL * scale);
    if (phi > 0) expect(Math.hypot(p.outer!.centre.x - hit.x, p.outer!.centre.y - hit.y)).toBeGreaterThan(0);
  });

  it("three.js agrees that a cone reaching the horizon has rays that never land", () => {
    // REFERENCE.md trap: Ray.intersectPlane returns null for rays parallel to or pointing away from the plane
    const { source, focus } = aimed(6, 70);
    const hit = makeCone(source, focus, 25 * D2R, 0);
    let misses = 0;
    for (let k = 0; k < RAYS; k++) if (!hit((2 * Math.PI * k) / RAYS)) misses++;
    expect(misses).toBeGreaterThan(0);
    expect(poolAtPlane({ source, focus, coneDeg: 50, softnessDeg: 5, planeZ: 0 }).status).toBe("open");
  });
});

import { axisOf } from "./aim";
import { assertFinite, beamAngles, HORIZON_TOL } from "./validate";
import { DEG, noNegZero, type Point, type Vec3 } from "./vector";

/** An ellipse on a horizontal plane; rotationDeg is the bearing of the major axis pointing away from the lens. */
export type Ellipse = { centre: Point; semiMajor: number; semiMinor: number; rotationDeg: number };

export type PlanePool = {
  /** open: the outer cone reaches the horizon; none: no pool on this plane. */
  status: "ok" | "open" | "none";
  /** Plain words for "open" and "none". */
  reason?: string;
  axisHit: Point | null;
  /** half = the 50 % edge. When "open", half and core are still given if their own cones close. */
  outer: Ellipse | null;
  half: Ellipse | null;
  core: Ellipse | null;
  /** Of the outer ellipse: 2a and 2b. */
  lengthAlong: number | null;
  widthAcross: number | null;
  /** Outer minus core on the near side, the far side, and across (difference of the semi-minor axes). */
  band: { near: number; far: number; across: number } | null;
  /** Readable notes about adjusted input, e.g. softness clamped to half the cone. Empty when none. */
  warnings: string[];
};

export type PoolInput = { source: Vec3; focus: Vec3; coneDeg: number; softnessDeg: number; planeZ: number };

const HALF_PI = Math.PI / 2;

export const REASON_PLANE_ABOVE = "The plane is at or above the lens, so the beam cannot land on it.";
export const REASON_AXIS_UP = "The beam is aimed upward, so it makes no pool on this plane.";
export const REASON_OPEN =
  "The beam's edge reaches the horizon on this plane, so the pool has no far edge: tilt it down or narrow it.";

/** The lens's foot on the plane and the axis, shared by the three cones. */
type Frame = {
  h: number;
  phi: number;
  sinPhi: number;
  cosPhi: number;
  ux: number;
  uy: number;
  fx: number;
  fy: number;
  rot: number;
};

/** One cone's half-angle with the cosines the section and the soft band share. */
type Cone = { alpha: number; sin: number; cos: number; cosPlus: number; cosMinus: number };

function cone(f: Frame, alpha: number): Cone {
  const sa = Math.sin(alpha);
  const ca = Math.cos(alpha);
  // cos(φ±α) by the sum formulas: as precise near the horizon as cos of the rounded sum, and no trig calls.
  const cosPlus = f.cosPhi * ca - f.sinPhi * sa;
  return { alpha, sin: sa, cos: ca, cosPlus, cosMinus: f.cosPhi * ca + f.sinPhi * sa };
}

/**
 * Conic section of a cone with the plane, K = cos²α − sin²φ taken as cos(φ+α)·cos(φ−α). Null when the cone
 * reaches the horizon, decided in angle space with a tolerance: at φ+α = 90° K comes out near 2e-16, not 0.
 */
function section(f: Frame, c: Cone): Ellipse | null {
  if (f.phi + c.alpha >= HALF_PI - HORIZON_TOL) return null;
  const k = c.cosPlus * c.cosMinus;
  const centre = (f.h * f.sinPhi * f.cosPhi) / k;
  return {
    centre: { x: f.fx + centre * f.ux, y: f.fy + centre * f.uy },
    semiMajor: (f.h * c.sin * c.cos) / k,
    semiMinor: (f.h * c.sin) / Math.sqrt(k),
    rotationDeg: f.rot,
  };
}

function none(reason: string, warnings: string[]): PlanePool {
  return {
    status: "none",
    reason,
    axisHit: null,
    outer: null,
    half: null,
    core: null,
    lengthAlong: null,
    widthAcross: null,
    band: null,
    warnings,
  };
}

/** The pool of one fixture on the horizontal plane z = planeZ (the deck, or head height). */
export function poolAtPlane(i: PoolInput): PlanePool {
  const ang = beamAngles(i.coneDeg, i.softnessDeg);
  const axis = axisOf(i.source, i.focus);
  assertFinite("Plane height", i.planeZ);
  const warnings = ang.warning ? [ang.warning] : [];
  const h = i.source.z - i.planeZ;
  if (h <= 0) return none(REASON_PLANE_ABOVE, warnings);
  const { phi, ux, uy } = axis;
  if (phi > HALF_PI + HORIZON_TOL) return none(REASON_AXIS_UP, warnings);

  const f: Frame = {
    h,
    phi,
    sinPhi: axis.sinPhi,
    cosPhi: axis.cosPhi,
    ux,
    uy,
    fx: i.source.x,
    fy: i.source.y,
    rot: noNegZero(Math.atan2(uy, ux) / DEG),
  };
  const level = phi >= HALF_PI - HORIZON_TOL;
  const hitDist = level ? 0 : (h * f.sinPhi) / f.cosPhi;
  const axisHit = level ? null : { x: f.fx + hitDist * ux, y: f.fy + hitDist * uy };
  // An empty core is the axis itself (half-angle 0), so the band then runs to the axis hit point.
  const co = cone(f, ang.outer);
  const cc = cone(f, ang.core > 0 ? ang.core : 0);
  const half = section(f, cone(f, ang.half));
  const core = ang.core > 0 ? section(f, cc) : null;
  const outer = section(f, co);
  if (!outer) {
    return {
      status: "open",
      reason: REASON_OPEN,
      axisHit,
      outer: null,
      half,
      core,
      lengthAlong: null,
      widthAcross: null,
      band: null,
      warnings,
    };
  }
  // tan x − tan y = sin(x−y)/(cos x·cos y): exact non-negative band widths without cancelling two tans.
  const sd = f.h * (co.sin * cc.cos - co.cos * cc.sin);
  const band = {
    near: sd / (cc.cosMinus * co.cosMinus),
    far: sd / (co.cosPlus * cc.cosPlus),
    across: outer.semiMinor - (core ? core.semiMinor : 0),
  };
  return {
    status: "ok",
    axisHit,
    outer,
    half,
    core,
    lengthAlong: 2 * outer.semiMajor,
    widthAcross: 2 * outer.semiMinor,
    band,
    warnings,
  };
}

/** Axis-aligned bounding box of an ellipse in plan. */
export function ellipseBounds(e: Ellipse): { minX: number; minY: number; maxX: number; maxY: number } {
  const r = e.rotationDeg * DEG;
  const c = Math.cos(r);
  const s = Math.sin(r);
  const a = e.semiMajor;
  const b = e.semiMinor;
  const hx = Math.sqrt(a * a * c * c + b * b * s * s);
  const hy = Math.sqrt(a * a * s * s + b * b * c * c);
  return { minX: e.centre.x - hx, minY: e.centre.y - hy, maxX: e.centre.x + hx, maxY: e.centre.y + hy };
}

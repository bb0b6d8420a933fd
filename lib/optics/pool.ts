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
export const REASON_AXIS_UP = "The beam is aimed level or upward, so it makes no pool on this plane.";
export const REASON_OPEN =
  "The beam's edge reaches the horizon on this plane, so the pool has no far edge: tilt it down or narrow it.";

/** The lens's foot on the plane and the axis, shared by the three cones. */
type Frame = { h: number; phi: number; sinPhi: number; cosPhi: number; ux: number; uy: number; fx: number; fy: number; rot: number };

/**
 * Conic section of a cone (half-angle alpha) with the plane. K = cos²α − sin²φ is taken as
 * cos(φ+α)·cos(φ−α) (passed in, so the soft band can reuse them), which keeps its relative precision as
 * φ+α nears 90°. Null when the cone reaches the horizon, decided in angle space, not from the sign of K.
 */
function section(f: Frame, alpha: number, cosPlus: number, cosMinus: number): Ellipse | null {
  if (f.phi + alpha >= HALF_PI - HORIZON_TOL) return null;
  const k = cosPlus * cosMinus;
  const sa = Math.sin(alpha);
  const c = (f.h * f.sinPhi * f.cosPhi) / k;
  return {
    centre: { x: f.fx + c * f.ux, y: f.fy + c * f.uy },
    semiMajor: (f.h * sa * Math.cos(alpha)) / k,
    semiMinor: (f.h * sa) / Math.sqrt(k),
    rotationDeg: f.rot,
  };
}

function none(reason: string, warnings: string[]): PlanePool {
  return {
    status: "none", reason, axisHit: null, outer: null, half: null, core: null,
    lengthAlong: null, widthAcross: null, band: null, warnings,
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
    h, phi, sinPhi: axis.sinPhi, cosPhi: axis.cosPhi, ux, uy, fx: i.source.x, fy: i.source.y,
    rot: noNegZero(Math.atan2(uy, ux) / DEG),
  };
  const level = phi >= HALF_PI - HORIZON_TOL;
  const hitDist = level ? 0 : (h * f.sinPhi) / f.cosPhi;
  const axisHit = level ? null : { x: f.fx + hitDist * ux, y: f.fy + hitDist * uy };
  // An empty core is the axis itself (half-angle 0), so the band then runs to the axis hit point.
  const ao = ang.outer;
  const ac = ang.core > 0 ? ang.core : 0;
  const cpo = Math.cos(phi + ao);
  const cmo = Math.cos(phi - ao);
  const cpc = ac > 0 ? Math.cos(phi + ac) : f.cosPhi;
  const cmc = ac > 0 ? Math.cos(phi - ac) : f.cosPhi;
  const half = section(f, ang.half, Math.cos(phi + ang.half), Math.cos(phi - ang.half));
  const core = ac > 0 ? section(f, ac, cpc, cmc) : null;
  const outer = section(f, ao, cpo, cmo);
  if (!outer) {
    return { status: "open", reason: REASON_OPEN, axisHit, outer: null, half, core,
      lengthAlong: null, widthAcross: null, band: null, warnings };
  }
  // tan x − tan y = sin(x−y)/(cos x·cos y): exact non-negative band widths without cancelling two tans.
  const sd = h * Math.sin(ao - ac);
  const band = { near: sd / (cmc * cmo), far: sd / (cpo * cpc), across: outer.semiMinor - (core ? core.semiMinor : 0) };
  return {
    status: "ok", axisHit, outer, half, core,
    lengthAlong: 2 * outer.semiMajor, widthAcross: 2 * outer.semiMinor, band, warnings,
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

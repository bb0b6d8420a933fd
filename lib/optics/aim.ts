import { assertVec3, MIN_THROW } from "./validate";
import { DEG, noNegZero, type Vec3 } from "./vector";

export type Aim = { throw: number; tiltDeg: number; panDeg: number };

/** Axis of a beam in the angles the geometry needs: phi from straight down, and the plan bearing. */
export type Axis = {
  throw: number;
  /** Angle of the axis from straight down, radians, 0..π, with its sine and cosine from the vector itself. */
  phi: number;
  sinPhi: number;
  cosPhi: number;
  /** Plan bearing as a unit vector (cos, sin of pan); (1, 0) when the axis is vertical. */
  ux: number;
  uy: number;
};

/** Throws for a zero-length throw: with the lens on the mark the axis has no direction at all. */
export function axisOf(source: Vec3, focus: Vec3): Axis {
  const dx = focus.x - source.x;
  const dy = focus.y - source.y;
  const dz = focus.z - source.z;
  const plan = Math.sqrt(dx * dx + dy * dy);
  const t = Math.sqrt(plan * plan + dz * dz);
  if (!(t >= MIN_THROW && t < Infinity)) {
    // A non-finite coordinate always makes t NaN or Infinity, so the full check only runs on failure.
    assertVec3("Lens position", source);
    assertVec3("Focus point", focus);
    throw new RangeError("The focus point is at the lens: a beam needs a throw longer than zero.");
  }
  const phi = Math.atan2(plan, -dz);
  const sinPhi = plan / t;
  const cosPhi = -dz / t;
  return plan > 0
    ? { throw: t, phi, sinPhi, cosPhi, ux: dx / plan, uy: dy / plan }
    : { throw: t, phi, sinPhi, cosPhi, ux: 1, uy: 0 };
}

/**
 * Throw, tilt (below the horizontal; negative when aimed upward) and pan (plan bearing, counter-clockwise
 * from +x toward upstage, −180..180; 0 for a beam pointing straight down or up).
 */
export function beamAim(i: { source: Vec3; focus: Vec3 }): Aim {
  const a = axisOf(i.source, i.focus);
  return {
    throw: a.throw,
    tiltDeg: noNegZero(90 - a.phi / DEG),
    panDeg: noNegZero(Math.atan2(a.uy, a.ux) / DEG),
  };
}

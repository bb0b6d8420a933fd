import { DEG, type Vec3 } from "./vector";

/** Below this throw (1 µm) the axis has no direction; far finer than any rig is measured. */
export const MIN_THROW = 1e-6;
/** Angle-space tolerance for "reaches the horizon": far above rounding (~1e-16 rad), far below any real aim. */
export const HORIZON_TOL = 1e-9;

export function assertFinite(name: string, value: number): void {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number (got ${String(value)}).`);
  }
}

export function assertVec3(name: string, v: Vec3): void {
  if (v === null || typeof v !== "object") throw new RangeError(`${name} must be a point with x, y and z.`);
  assertFinite(`${name}.x`, v.x);
  assertFinite(`${name}.y`, v.y);
  assertFinite(`${name}.z`, v.z);
}

export type BeamAngles = {
  /** Outer, 50 % and core half-angles in radians; the core is 0 when it is empty. */
  outer: number;
  half: number;
  core: number;
  /** Softness actually used, in degrees, after clamping. */
  softnessDeg: number;
  warning: string | null;
};

/**
 * Checks cone and softness and returns the three half-angles.
 * Softness above half the cone would put the fade's inner edge past the axis, which has no meaning for the
 * flat-core profile; it is clamped to half the cone (no full-intensity core) and reported as a warning
 * rather than rejected, because datasheets of very peaked washes legitimately produce such numbers.
 */
export function beamAngles(coneDeg: number, softnessDeg: number): BeamAngles {
  assertFinite("Cone angle", coneDeg);
  assertFinite("Edge softness", softnessDeg);
  if (coneDeg <= 0 || coneDeg >= 180) {
    throw new RangeError(`Cone angle must be more than 0° and less than 180° (got ${coneDeg}°).`);
  }
  if (softnessDeg < 0) throw new RangeError(`Edge softness cannot be negative (got ${softnessDeg}°).`);
  let s = softnessDeg;
  let warning: string | null = null;
  if (s > coneDeg / 2) {
    s = coneDeg / 2;
    warning = `Edge softness ${softnessDeg}° is more than half the ${coneDeg}° cone; used ${s}° (no hard core).`;
  }
  return {
    outer: (coneDeg / 2) * DEG,
    half: ((coneDeg - s) / 2) * DEG,
    core: ((coneDeg - 2 * s) / 2) * DEG,
    softnessDeg: s,
    warning,
  };
}

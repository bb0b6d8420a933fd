import { axisOf } from "./aim";
import { makeProfile, profileAt, profileShapeOf, type Family, type Profile } from "./profile";
import { assertFinite, assertVec3, beamAngles } from "./validate";
import type { Vec3 } from "./vector";

/** One fixture as a light source; level is the channel's level in the cue, 0..1. */
export type LitBeam = {
  source: Vec3;
  focus: Vec3;
  coneDeg: number;
  softnessDeg: number;
  peakCandela: number;
  level: number;
  /** Shape of the intensity profile; profile spot (flat core) when omitted. */
  family?: Family;
};

/** A beam reduced to the numbers the inner loop needs, so a grid never re-validates or allocates. */
export type PreparedBeam = {
  sx: number;
  sy: number;
  sz: number;
  ax: number;
  ay: number;
  az: number;
  intensity: number;
  prof: Profile;
};

export function prepareBeam(b: LitBeam): PreparedBeam {
  const ang = beamAngles(b.coneDeg, b.softnessDeg);
  const axis = axisOf(b.source, b.focus);
  assertVec3("Lens position", b.source);
  assertFinite("Peak intensity", b.peakCandela);
  assertFinite("Level", b.level);
  if (b.peakCandela < 0) throw new RangeError(`Peak intensity cannot be negative (got ${b.peakCandela} cd).`);
  if (b.level < 0 || b.level > 1) throw new RangeError(`Level must be between 0 and 1 (got ${b.level}).`);
  const sinPhi = Math.sin(axis.phi);
  return {
    sx: b.source.x,
    sy: b.source.y,
    sz: b.source.z,
    ax: sinPhi * axis.ux,
    ay: sinPhi * axis.uy,
    az: -Math.cos(axis.phi),
    intensity: b.peakCandela * b.level,
    prof: makeProfile(ang, profileShapeOf(b.family ?? "profile")),
  };
}

/**
 * Lux from one prepared beam on an upward-facing horizontal surface at (px, py, pz):
 * E = I·P(β)·cos(incidence)/d², with cos(incidence) = (Sz − pz)/d. A lens at or below the surface lights
 * only its underside (0); a point at the lens itself gets 0 rather than an infinity.
 */
export function beamLux(b: PreparedBeam, px: number, py: number, pz: number): number {
  const rise = b.sz - pz;
  if (rise <= 0 || b.intensity === 0) return 0;
  const dx = px - b.sx;
  const dy = py - b.sy;
  const d2 = dx * dx + dy * dy + rise * rise;
  if (d2 < 1e-18) return 0; // within a nanometre of the lens: a point there is not a lit surface
  const d = Math.sqrt(d2);
  const cosBeta = (dx * b.ax + dy * b.ay - rise * b.az) / d;
  const p = b.prof;
  if (cosBeta < p.cosOuter) return 0;
  const rel = cosBeta >= p.cosCore ? 1 : profileAt(p, Math.acos(cosBeta > 1 ? 1 : cosBeta));
  return (b.intensity * rel * rise) / (d2 * d);
}

/** Illuminance in lux on a horizontal surface at p, summed over the beams. */
export function illuminanceAt(p: Vec3, beams: LitBeam[]): number {
  assertVec3("Point", p);
  let e = 0;
  for (const b of beams) e += beamLux(prepareBeam(b), p.x, p.y, p.z);
  return e;
}

import { prepareBeam, type LitBeam, type PreparedBeam } from "./illuminance";
import { profileAt } from "./profile";
import { assertFinite, assertVec3 } from "./validate";
import { DEG, type Point, type Vec3 } from "./vector";

/** Plan direction a surface faces: counter-clockwise from +x (stage left); the audience is at −90°. */
export const FACING_AUDIENCE_DEG = -90;

/** Unit normal, in plan, of a vertical surface facing facingDeg. */
export function facingNormal(facingDeg: number): Point {
  assertFinite("Facing direction", facingDeg);
  const a = facingDeg * DEG;
  // Rounded so that the four plain directions give exact zeros (cos 90° is 6e-17 otherwise).
  const round = (v: number) => (Math.abs(v) < 1e-15 ? 0 : v);
  return { x: round(Math.cos(a)), y: round(Math.sin(a)) };
}

/**
 * Lux from one prepared beam on a vertical surface at (px, py, pz) whose outward normal is (nx, ny, 0):
 * E = I·P(β)·cos(incidence)/d², cos(incidence) = (S − P)·n/d. Light arriving from behind the surface (cos ≤ 0)
 * does not light it. Unlike the deck, a face is lit from below too (footlights, floor units).
 */
export function beamLuxVertical(b: PreparedBeam, px: number, py: number, pz: number, nx: number, ny: number): number {
  if (b.intensity === 0) return 0;
  const dx = px - b.sx;
  const dy = py - b.sy;
  const dz = pz - b.sz;
  const facing = -(dx * nx + dy * ny);
  if (facing <= 0) return 0;
  const d2 = dx * dx + dy * dy + dz * dz;
  if (d2 < 1e-18) return 0;
  const d = Math.sqrt(d2);
  const cosBeta = (dx * b.ax + dy * b.ay + dz * b.az) / d;
  const p = b.prof;
  if (cosBeta < p.cosOuter) return 0;
  const rel = cosBeta >= p.cosCore ? 1 : profileAt(p, Math.acos(cosBeta > 1 ? 1 : cosBeta));
  return (b.intensity * rel * facing) / (d2 * d);
}

export type FaceLight = {
  /** Total lux on the face. */
  total: number;
  /** Index (into the beams given) of the brightest contributor; −1 when nothing reaches the face. */
  key: number;
  keyLux: number;
  /** Everything but the key. */
  fillLux: number;
  /** key : fill as key / fill; null when there is no fill (a single source) or no light at all. */
  keyToFill: number | null;
};

/**
 * Light on a face at p looking toward facingDeg. Key-to-fill is the key's lux over all the rest
 * (common practice, no source; photographers sometimes quote (key + fill) / fill instead).
 */
export function faceLightAt(p: Vec3, facingDeg: number, beams: LitBeam[]): FaceLight {
  assertVec3("Point", p);
  const n = facingNormal(facingDeg);
  let total = 0;
  let key = -1;
  let keyLux = 0;
  beams.forEach((beam, k) => {
    const e = beamLuxVertical(prepareBeam(beam), p.x, p.y, p.z, n.x, n.y);
    total += e;
    if (e > keyLux) {
      keyLux = e;
      key = k;
    }
  });
  const fillLux = Math.max(0, total - keyLux);
  return { total, key, keyLux, fillLux, keyToFill: keyLux > 0 && fillLux > 0 ? keyLux / fillLux : null };
}

/** Lux on a vertical surface at p facing facingDeg, summed over the beams. */
export function verticalIlluminanceAt(p: Vec3, facingDeg: number, beams: LitBeam[]): number {
  return faceLightAt(p, facingDeg, beams).total;
}

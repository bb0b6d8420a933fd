import { profileAt, type Profile } from "./profile";

/** Samples per beam: the table costs 257 exact evaluations, so it pays off after a few hundred cells. */
export const TABLE_STEPS = 256;

/** Below this departure from 1 a peaked curve is treated as flat, so a steep edge gets all the samples. */
const FLAT_WITHIN = 1e-6;

/**
 * A beam's profile sampled against σ = sin(β/2)/sin(βo/2) = √((1 − cosβ)/(1 − cos βo)), which is nearly
 * β/βo and needs one square root from the cosine the grid already has. acos, cos, pow and exp cost 25–120 ns
 * each on the target machine; a lookup a few. Linear interpolation over the part of the curve that is not
 * flat stays within about 2e-4 of the peak (tests/unit/optics/grid.test.ts measures it). Single points
 * (illuminanceAt) use the exact curve.
 */
export type ProfileTable = {
  values: Float64Array;
  /** Inside this cosine the beam counts as full: the flat core's edge, or where a peaked curve is 1 − 1e-6. */
  cosStart: number;
  /** σ where the table starts (at cosStart). */
  sigma0: number;
  /** Steps per unit σ beyond sigma0. */
  scale: number;
  /** 1 / (1 − cos βo), to turn 1 − cosβ into σ². */
  invRange: number;
};

export function profileTable(p: Profile): ProfileTable {
  const range = 1 - p.cosOuter;
  // exp(−ln2·(β/βb)^k) = 1 − ε at β = βb·(ε/ln2)^(1/k); the flat profile is exactly 1 up to its core.
  const cosStart = p.peaked && p.k !== Infinity ? Math.cos(p.half * (FLAT_WITHIN / Math.LN2) ** (1 / p.k)) : p.cosCore;
  const sigma0 = Math.min(1, Math.sqrt((1 - cosStart) / range));
  const sinHalfOuter = Math.sin(p.outer / 2);
  const values = new Float64Array(TABLE_STEPS + 1);
  for (let j = 0; j <= TABLE_STEPS; j++) {
    const sigma = sigma0 + ((1 - sigma0) * j) / TABLE_STEPS;
    // At the edge rounding can put beta a hair past the cone, where profileAt would already give 0.
    const beta = Math.min(p.outer, 2 * Math.asin(Math.min(1, sigma * sinHalfOuter)));
    values[j] = profileAt(p, beta);
  }
  return { values, cosStart, sigma0, scale: sigma0 < 1 ? TABLE_STEPS / (1 - sigma0) : 0, invRange: 1 / range };
}

/** Relative intensity from the table for a point whose direction has cosine cosBeta (≥ cos βo) with the axis. */
export function tableAt(t: ProfileTable, cosBeta: number): number {
  if (cosBeta >= t.cosStart) return 1;
  const x = (Math.sqrt((1 - cosBeta) * t.invRange) - t.sigma0) * t.scale;
  const j = x | 0;
  return j >= TABLE_STEPS ? t.values[TABLE_STEPS] : t.values[j] + (x - j) * (t.values[j + 1] - t.values[j]);
}

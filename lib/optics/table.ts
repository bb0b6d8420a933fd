import { profileAt, type Profile } from "./profile";

/** Samples per beam: the table costs 257 exact evaluations, so it pays off after a few hundred cells. */
export const TABLE_STEPS = 256;

/**
 * A beam's profile sampled against τ = (1 − cosβ)/(1 − cos βo), 0 on the axis and 1 at the cone's edge,
 * for the grid's inner loop: acos, cos, pow and exp there cost 25–120 ns each on the target machine, a table
 * lookup a few. Linear interpolation in τ (≈ (β/βo)²) is within 1e-3 of the peak for the smooth edges of
 * practice (softness ≥ 10 % of the cone) — tests/unit/optics/grid.test.ts measures it. Single points
 * (illuminanceAt) use the exact curve.
 */
export type ProfileTable = {
  values: Float64Array;
  /** τ where the table starts: the flat core's edge (full intensity inside it), 0 for peaked beams. */
  tau0: number;
  /** Steps per unit τ beyond tau0. */
  scale: number;
  /** 1 / (1 − cos βo), to turn 1 − cosβ into τ. */
  invRange: number;
};

export function profileTable(p: Profile): ProfileTable {
  const range = 1 - p.cosOuter;
  const tau0 = Math.min(1, (1 - p.cosCore) / range);
  const values = new Float64Array(TABLE_STEPS + 1);
  for (let j = 0; j <= TABLE_STEPS; j++) {
    const tau = tau0 + ((1 - tau0) * j) / TABLE_STEPS;
    const beta = Math.acos(Math.max(-1, Math.min(1, 1 - tau * range)));
    // At the edge rounding can put beta a hair past the cone, where profileAt would already give 0.
    values[j] = profileAt(p, Math.min(beta, p.outer));
  }
  return { values, tau0, scale: tau0 < 1 ? TABLE_STEPS / (1 - tau0) : 0, invRange: 1 / range };
}

// How bright to draw a cue's look on the plan. Pools are added up (as light adds up on stage), which
// saturates to white where many overlap; one exposure for the whole look keeps the levels in
// proportion to each other while the busiest spot stays just short of white.
import type { Ellipse } from "@/lib/optics";

export type LitPool = { outer: Ellipse; level: number };
type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

/** The sum of levels a full-exposure look may reach at one spot before it reads as white (Throwline's choice). */
export const WHITE_AT = 1.8;

export function insideEllipse(e: Ellipse, x: number, y: number): boolean {
  const t = (-e.rotationDeg * Math.PI) / 180;
  const dx = x - e.centre.x;
  const dy = y - e.centre.y;
  const u = dx * Math.cos(t) + dy * Math.sin(t);
  const w = -dx * Math.sin(t) + dy * Math.cos(t);
  return (u * u) / (e.semiMajor * e.semiMajor) + (w * w) / (e.semiMinor * e.semiMinor) <= 1;
}

/** The largest sum of levels over a grid of points in `b` (41 × 31 points: coarse, cheap, enough to judge). */
export function peakLevelSum(pools: readonly LitPool[], b: Bounds): number {
  let peak = 0;
  for (let i = 0; i <= 40; i++) {
    for (let j = 0; j <= 30; j++) {
      const x = b.minX + ((b.maxX - b.minX) * i) / 40;
      const y = b.minY + ((b.maxY - b.minY) * j) / 30;
      let sum = 0;
      for (const p of pools) if (p.level > 0 && insideEllipse(p.outer, x, y)) sum += p.level;
      peak = Math.max(peak, sum);
    }
  }
  return peak;
}

/** 1 for sparse looks (never brightened), less where pools pile up. */
export function lookExposure(pools: readonly LitPool[], b: Bounds): number {
  return Math.min(1, WHITE_AT / Math.max(peakLevelSum(pools, b), 1e-6));
}

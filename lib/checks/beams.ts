// Beam facts for rigging loads: lift-line shares of a continuous pipe and the uniform load that bends a
// simple span as much as a set of point loads. Pure; checked against beam tables in tests/unit/checks.

/**
 * Share of a uniform load carried by each of n equally spaced lift lines, lines at both ends of the pipe:
 * the pipe is a continuous beam over n supports. Support moments from Clapeyron's three-moment equation
 * (equal spans L, load w): M[i−1] + 4·M[i] + M[i+1] = −w·L²/2, M at the end lines = 0; then each
 * reaction is the two neighbouring spans' end shears. n = 3 gives 3/16, 10/16, 3/16 (the middle 62.5 %).
 */
export function liftLineShares(n: number): number[] {
  if (!Number.isInteger(n) || n < 1) throw new RangeError("A pipe needs at least one lift line.");
  if (n === 1) return [1];
  const spans = n - 1;
  // Work with w = 1, L = 1: total load = spans.
  const inner = n - 2;
  const m = new Array<number>(n).fill(0);
  if (inner > 0) {
    // Tridiagonal solve (Thomas algorithm) for the inner support moments.
    const c = new Array<number>(inner).fill(0);
    const d = new Array<number>(inner).fill(0);
    for (let i = 0; i < inner; i++) {
      const denom = 4 - (i > 0 ? c[i - 1] : 0);
      c[i] = 1 / denom;
      d[i] = (-0.5 - (i > 0 ? d[i - 1] : 0)) / denom;
    }
    for (let i = inner - 1; i >= 0; i--) m[i + 1] = d[i] - c[i] * (i < inner - 1 ? m[i + 2] : 0);
  }
  const reactions = new Array<number>(n).fill(0);
  for (let s = 0; s < spans; s++) {
    // Span between supports s and s+1: end shears 1/2 ∓ (M[s+1] − M[s]).
    const diff = m[s + 1] - m[s];
    reactions[s] += 0.5 + diff;
    reactions[s + 1] += 0.5 - diff;
  }
  return reactions.map((r) => r / spans);
}

export type PointLoad = { at: number; kg: number };

/**
 * The largest bending moment on a simple span of length L (kg·m, loads as masses) under point loads and a
 * uniform load, and the uniform load that would bend the span as much: W = 8·M / L (beam tables:
 * uniform WL/8, centre point PL/4, so a centre point load P counts as a uniform 2P).
 */
export function uniformEquivalent(
  lengthM: number,
  points: PointLoad[],
  uniformKg: number,
): { maxMomentKgM: number; equivalentKg: number } {
  if (!(lengthM > 0)) throw new RangeError("The span must be longer than 0 m.");
  const w = uniformKg / lengthM;
  const loads = points.map((p) => ({ at: Math.min(lengthM, Math.max(0, p.at)), kg: p.kg })).sort((a, b) => a.at - b.at);
  const total = uniformKg + loads.reduce((s, p) => s + p.kg, 0);
  const rightMoment = loads.reduce((s, p) => s + p.kg * p.at, 0) + (uniformKg * lengthM) / 2;
  const rLeft = total - rightMoment / lengthM;
  const momentAt = (x: number) =>
    rLeft * x - (w * x * x) / 2 - loads.reduce((s, p) => (p.at < x ? s + p.kg * (x - p.at) : s), 0);
  // The maximum is at a point load or where the shear crosses zero between two of them.
  const candidates = [0, lengthM, ...loads.map((p) => p.at)];
  let before = 0;
  const cuts = [0, ...loads.map((p) => p.at), lengthM];
  for (let i = 0; i < cuts.length - 1; i++) {
    if (i > 0) before += loads[i - 1].kg;
    if (w > 0) {
      const x = (rLeft - before) / w;
      if (x > cuts[i] && x < cuts[i + 1]) candidates.push(x);
    }
  }
  const maxMomentKgM = Math.max(...candidates.map(momentAt));
  return { maxMomentKgM, equivalentKg: (8 * maxMomentKgM) / lengthM };
}

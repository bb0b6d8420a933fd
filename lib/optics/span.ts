/**
 * Columns of one grid row that a cone can light, exactly from the cone's equation rather than its pool's
 * box, so it also trims open pools and upward spill. For a row at lens-relative depth wy on a plane h below
 * the lens, w = (wx, wy, −h) is lit only where w·a ≥ c·|w| (c = cos of the half-angle, > 0). Squaring gives
 * A·wx² + B·wx + C ≥ 0 with A = ax² − c², B = 2·ax·k1, C = k1² − c²·k2, k1 = ay·wy − az·h, k2 = wy² + h²;
 * its roots are (−ax·k1 ± c·√D)/A with D = k1² + A·k2. Squaring admits the backward cone as well, so the
 * forward piece is picked by the sign of w·a. Every doubt widens the span: extra cells cost time, while a
 * missing cell would be a wrong answer.
 */
export function coneRowSpan(
  ax: number,
  ay: number,
  az: number,
  c: number,
  wy: number,
  h: number,
  sx: number,
  ox: number,
  res: number,
  cols: number,
  out: Int32Array,
): boolean {
  const A = ax * ax - c * c;
  const k1 = ay * wy - az * h;
  const k2 = wy * wy + h * h;
  const size = k1 * k1 + Math.abs(A) * k2;
  let D = k1 * k1 + A * k2;
  if (Math.abs(A) < 1e-12) return fullRow(cols, out); // axis nearly along a generator: no useful bound
  if (D < 0) {
    if (D < -1e-12 * size) return A < 0 ? false : fullRow(cols, out);
    D = 0;
  }
  const mid = (-ax * k1) / A;
  const half = (c * Math.sqrt(D)) / Math.abs(A);
  // Slack for rounding in the roots, far larger than the error and far smaller than a cell in practice.
  const slack = res + 1e-9 * (Math.abs(mid) + half);
  let lo: number;
  let hi: number;
  if (A < 0) {
    // A bounded chord; on the forward cone only when w·a at its middle (a positive multiple of k1) is positive.
    if (k1 < -1e-12 * Math.sqrt(size)) return false;
    lo = mid - half;
    hi = mid + half;
  } else if (ax > 0) {
    lo = mid + half;
    hi = Infinity;
  } else {
    lo = -Infinity;
    hi = mid - half;
  }
  const c0 = Math.floor((sx + lo - slack - ox) / res);
  const c1 = Math.ceil((sx + hi + slack - ox) / res);
  if (Number.isNaN(c0) || Number.isNaN(c1)) return fullRow(cols, out);
  out[0] = Math.max(0, Math.min(cols, c0));
  out[1] = Math.min(cols - 1, Math.max(-1, c1));
  return out[0] <= out[1];
}

function fullRow(cols: number, out: Int32Array): boolean {
  out[0] = 0;
  out[1] = cols - 1;
  return true;
}

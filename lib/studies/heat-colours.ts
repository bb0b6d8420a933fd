// The heat map's colours: dark for no light through deep blue, teal and amber to near-white at the top of
// the scale, so the darkest spots read at a glance in both themes. Differences use a diverging scale:
// blue where the second state is darker, amber where it is brighter, transparent where they agree.

type Stop = [t: number, r: number, g: number, b: number];

const LIGHT: Stop[] = [
  [0, 12, 12, 20],
  [0.15, 30, 40, 110],
  [0.4, 20, 120, 130],
  [0.7, 220, 160, 40],
  [1, 255, 246, 220],
];

function ramp(stops: Stop[], t: number): [number, number, number] {
  const x = Math.min(1, Math.max(0, t));
  let k = 1;
  while (k < stops.length - 1 && stops[k][0] < x) k++;
  const [t0, r0, g0, b0] = stops[k - 1];
  const [t1, r1, g1, b1] = stops[k];
  const f = t1 > t0 ? (x - t0) / (t1 - t0) : 0;
  return [r0 + f * (r1 - r0), g0 + f * (g1 - g0), b0 + f * (b1 - b0)];
}

/** RGBA pixels of a grid, one pixel per cell, top row = the grid's last (most upstage) row. */
export function heatPixels(
  values: ArrayLike<number>,
  cols: number,
  rows: number,
  scaleMax: number,
  mode: "light" | "difference",
): Uint8ClampedArray {
  const px = new Uint8ClampedArray(cols * rows * 4);
  const max = scaleMax > 0 ? scaleMax : 1;
  for (let row = 0; row < rows; row++) {
    const out = (rows - 1 - row) * cols;
    for (let c = 0; c < cols; c++) {
      const v = values[row * cols + c];
      const k = (out + c) * 4;
      if (mode === "light") {
        const [r, g, b] = ramp(LIGHT, Math.sqrt(v / max)); // square root: the eye reads light logarithmically
        px[k] = r;
        px[k + 1] = g;
        px[k + 2] = b;
        px[k + 3] = 200;
      } else {
        const t = Math.max(-1, Math.min(1, v / max));
        px[k] = t > 0 ? 230 : 40;
        px[k + 1] = t > 0 ? 150 : 110;
        px[k + 2] = t > 0 ? 30 : 220;
        px[k + 3] = Math.round(220 * Math.sqrt(Math.abs(t)));
      }
    }
  }
  return px;
}

/** CSS colour of a value for the legend. */
export function heatColour(t: number): string {
  const [r, g, b] = ramp(LIGHT, Math.sqrt(Math.max(0, t)));
  return `rgb(${Math.round(r)}, ${Math.round(g)}, ${Math.round(b)})`;
}

/** Round values for the legend and the default contours: 1, 2, 5 × 10^n up to the maximum. */
export function niceSteps(max: number, count = 4): number[] {
  if (!(max > 0)) return [];
  const raw = max / count;
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * p).find((s) => s >= raw) ?? 10 * p;
  const out: number[] = [];
  for (let v = step; v < max; v += step) out.push(Number(v.toPrecision(6)));
  return out;
}

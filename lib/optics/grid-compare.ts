import type { GridCells } from "./illuminance-grid";
import { assertFinite } from "./validate";
import type { Point } from "./vector";

/** Cell by cell b − a of two grids over the same cells (positive where b is brighter). */
export function differenceGrid<G extends GridCells>(a: G, b: G): Float32Array {
  if (
    a.cols !== b.cols ||
    a.rows !== b.rows ||
    a.originX !== b.originX ||
    a.originY !== b.originY ||
    a.resolution !== b.resolution
  ) {
    throw new RangeError("The two grids cover different cells; compute both over the same area and resolution.");
  }
  const out = new Float32Array(a.values.length);
  for (let k = 0; k < out.length; k++) out[k] = b.values[k] - a.values[k];
  return out;
}

/** Bilinear value between cell centres; the edge cells' values hold out to the grid's border. */
export function gridValueAt(g: GridCells, p: Point): number {
  const fx = Math.min(g.cols - 1, Math.max(0, (p.x - g.originX) / g.resolution));
  const fy = Math.min(g.rows - 1, Math.max(0, (p.y - g.originY) / g.resolution));
  const c0 = Math.floor(fx);
  const r0 = Math.floor(fy);
  const c1 = Math.min(g.cols - 1, c0 + 1);
  const r1 = Math.min(g.rows - 1, r0 + 1);
  const tx = fx - c0;
  const ty = fy - r0;
  const v = (c: number, r: number) => g.values[r * g.cols + c];
  const top = v(c0, r0) * (1 - tx) + v(c1, r0) * tx;
  const bottom = v(c0, r1) * (1 - tx) + v(c1, r1) * tx;
  return top * (1 - ty) + bottom * ty;
}

export type LineSample = { distance: number; x: number; y: number; value: number };

/**
 * The light along a line drawn across the stage, sampled every `step` metres (the grid's resolution by
 * default) from a to b, both ends included: the dip an actor walks through between two areas.
 */
export function lineProfile(g: GridCells, a: Point, b: Point, step = g.resolution): LineSample[] {
  for (const [k, v] of [
    ["a.x", a.x],
    ["a.y", a.y],
    ["b.x", b.x],
    ["b.y", b.y],
    ["step", step],
  ] as const)
    assertFinite(`Line ${k}`, v);
  if (step <= 0) throw new RangeError(`The sampling step must be above 0 m (got ${step}).`);
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  const n = Math.max(1, Math.ceil(length / step - 1e-9));
  const out: LineSample[] = [];
  for (let k = 0; k <= n; k++) {
    const t = k / n;
    const p = { x: a.x + t * (b.x - a.x), y: a.y + t * (b.y - a.y) };
    out.push({ distance: t * length, ...p, value: gridValueAt(g, p) });
  }
  return out;
}

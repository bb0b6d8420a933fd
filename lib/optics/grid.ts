import { beamLux, prepareBeam, type LitBeam } from "./illuminance";
import { ellipseBounds, poolAtPlane } from "./pool";
import { pointInPolygon } from "./polygon";
import { assertFinite } from "./validate";
import type { Point } from "./vector";

export type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

/** Illuminance at cell centres, row-major (index = row·cols + col), rows running upstage from minY. */
export type Grid = {
  values: Float32Array;
  cols: number;
  rows: number;
  resolution: number;
  planeZ: number;
  /** Centre of cell (0, 0); cell (c, r) is at originX + c·resolution, originY + r·resolution. */
  originX: number;
  originY: number;
  min: number;
  mean: number;
  max: number;
  /** Point evaluations actually made (after culling); the benchmark reports it. */
  evaluations: number;
};

export type GridInput = { bounds: Bounds; resolution: number; planeZ: number; beams: LitBeam[]; cull?: boolean };

/** Guards memory: 4 million cells is 16 MB of float32, far beyond any stage at a useful resolution. */
const MAX_CELLS = 4_000_000;

function checkGrid(i: GridInput): { cols: number; rows: number } {
  const { bounds: b, resolution: res } = i;
  for (const k of ["minX", "minY", "maxX", "maxY"] as const) assertFinite(`Grid bound ${k}`, b[k]);
  assertFinite("Grid resolution", res);
  assertFinite("Plane height", i.planeZ);
  if (res <= 0) throw new RangeError(`Grid resolution must be above 0 m (got ${res}).`);
  if (b.maxX <= b.minX || b.maxY <= b.minY) throw new RangeError("The grid's area is empty: max must exceed min.");
  // The small slack keeps 16 / 0.1 = 160.00000000000003 at 160 columns.
  const cols = Math.max(1, Math.ceil((b.maxX - b.minX) / res - 1e-9));
  const rows = Math.max(1, Math.ceil((b.maxY - b.minY) / res - 1e-9));
  if (cols * rows > MAX_CELLS) {
    throw new RangeError(`A ${cols} × ${rows} grid is too fine; use a coarser resolution.`);
  }
  return { cols, rows };
}

/**
 * Cell range a beam can reach. Culling is exact, not an approximation: outside its outer ellipse a beam
 * gives 0 (every profile is 0 beyond the cone). An open pool or an upward axis (whose lower edge may still
 * spill onto the plane) gets the whole grid; a lens at or below the plane lights nothing on it.
 */
function reach(beam: LitBeam, planeZ: number, ox: number, oy: number, res: number, cols: number, rows: number) {
  const all = { c0: 0, c1: cols - 1, r0: 0, r1: rows - 1 };
  if (beam.source.z <= planeZ) return null;
  const pool = poolAtPlane({ ...beam, planeZ });
  if (pool.status !== "ok" || !pool.outer) return all;
  const bb = ellipseBounds(pool.outer);
  // One spare cell each side absorbs rounding between the box and the per-point cone test.
  const c0 = Math.max(0, Math.floor((bb.minX - ox) / res) - 1);
  const c1 = Math.min(cols - 1, Math.ceil((bb.maxX - ox) / res) + 1);
  const r0 = Math.max(0, Math.floor((bb.minY - oy) / res) - 1);
  const r1 = Math.min(rows - 1, Math.ceil((bb.maxY - oy) / res) + 1);
  return c0 > c1 || r0 > r1 ? null : { c0, c1, r0, r1 };
}

/** Illuminance over a rectangle of the stage at cell centres, summed over the beams. */
export function illuminanceGrid(i: GridInput): Grid {
  const { cols, rows } = checkGrid(i);
  const res = i.resolution;
  const ox = i.bounds.minX + res / 2;
  const oy = i.bounds.minY + res / 2;
  const pz = i.planeZ;
  const cull = i.cull !== false;
  // Summed in float64 and stored as float32 once, so culled and unculled sums match bit for bit.
  const acc = new Float64Array(cols * rows);
  let evaluations = 0;
  for (const beam of i.beams) {
    const b = prepareBeam(beam);
    if (b.intensity === 0) continue;
    const r = cull ? reach(beam, pz, ox, oy, res, cols, rows) : { c0: 0, c1: cols - 1, r0: 0, r1: rows - 1 };
    if (!r) continue;
    for (let row = r.r0; row <= r.r1; row++) {
      const py = oy + row * res;
      const base = row * cols;
      for (let col = r.c0; col <= r.c1; col++) {
        acc[base + col] += beamLux(b, ox + col * res, py, pz);
      }
    }
    evaluations += (r.r1 - r.r0 + 1) * (r.c1 - r.c0 + 1);
  }
  const values = Float32Array.from(acc);
  const s = zoneStats({ values, cols, rows, originX: ox, originY: oy, resolution: res });
  return {
    values, cols, rows, resolution: res, planeZ: pz, originX: ox, originY: oy,
    min: s.min ?? 0, mean: s.mean ?? 0, max: s.max ?? 0, evaluations,
  };
}

export type GridCells = Pick<Grid, "values" | "cols" | "rows" | "originX" | "originY" | "resolution">;

export function gridPoint(g: GridCells, col: number, row: number): Point {
  return { x: g.originX + col * g.resolution, y: g.originY + row * g.resolution };
}

export type ZoneStats = {
  count: number;
  min: number | null;
  mean: number | null;
  max: number | null;
  /** U0 = Emin / Eavg (EN 12464-1, CIBSE); null when the zone is empty or dark. */
  uniformity: number | null;
  /** Emin / Emax; null when the zone is empty or dark. */
  diversity: number | null;
};

/** Statistics of the cells whose centres lie in the polygon (the whole grid when it is omitted). */
export function zoneStats(g: GridCells, polygon?: Point[]): ZoneStats {
  let count = 0;
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let row = 0; row < g.rows; row++) {
    for (let col = 0; col < g.cols; col++) {
      if (polygon && !pointInPolygon(gridPoint(g, col, row), polygon)) continue;
      const v = g.values[row * g.cols + col];
      count++;
      sum += v;
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  if (count === 0) return { count, min: null, mean: null, max: null, uniformity: null, diversity: null };
  const mean = sum / count;
  return {
    count, min, mean, max,
    uniformity: mean > 0 ? min / mean : null,
    diversity: max > 0 ? min / max : null,
  };
}

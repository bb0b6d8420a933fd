import { prepareBeam, type LitBeam, type PreparedBeam } from "./illuminance";
import { ellipseBounds, poolAtPlane } from "./pool";
import { pointInPolygon } from "./polygon";
import { coneRowSpan } from "./span";
import { profileTable, TABLE_STEPS } from "./profile-table";
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

type Reach = [r0: number, r1: number, minX: number, maxX: number];

/**
 * Rows a beam can reach: its outer pool's bounding box, with one spare cell each side for rounding. Culling
 * is exact, not an approximation: outside its cone a beam gives 0 (every profile is 0 beyond the cone).
 * An open pool or an upward axis (whose lower edge may still spill onto the plane) keeps every row; the
 * per-row cone span in span.ts then trims those too.
 */
function reachRows(beam: LitBeam, planeZ: number, oy: number, res: number, rows: number): Reach | null {
  const pool = poolAtPlane({
    source: beam.source,
    focus: beam.focus,
    coneDeg: beam.coneDeg,
    softnessDeg: beam.softnessDeg,
    planeZ,
  });
  if (pool.status !== "ok" || !pool.outer) return [0, rows - 1, -Infinity, Infinity];
  const bb = ellipseBounds(pool.outer);
  const r0 = Math.max(0, Math.floor((bb.minY - oy) / res) - 1);
  const r1 = Math.min(rows - 1, Math.ceil((bb.maxY - oy) / res) + 1);
  return r0 > r1 ? null : [r0, r1, bb.minX, bb.maxX];
}

/** Adds one beam's lux to acc; returns the number of cells evaluated. The loop allocates nothing. */
function addBeam(
  acc: Float64Array,
  b: PreparedBeam,
  g: Layout,
  beam: LitBeam,
  cull: boolean,
  span: Int32Array,
): number {
  const h = b.sz - g.pz;
  let r0 = 0;
  let r1 = g.rows - 1;
  let cMin = 0;
  let cMax = g.cols - 1;
  if (cull) {
    const reach = reachRows(beam, g.pz, g.oy, g.res, g.rows);
    if (!reach) return 0;
    [r0, r1] = reach;
    cMin = Math.max(0, Math.floor((reach[2] - g.ox) / g.res) - 1);
    cMax = Math.min(g.cols - 1, Math.ceil((reach[3] - g.ox) / g.res) + 1);
  }
  const t = profileTable(b.prof);
  const { values: table, cosStart, sigma0, scale, invRange } = t;
  const { sx, sy, ax, ay, az, intensity } = b;
  const cosOuter = b.prof.cosOuter;
  const last = TABLE_STEPS;
  let evaluations = 0;
  for (let row = r0; row <= r1; row++) {
    const wy = g.oy + row * g.res - sy;
    let c0 = cMin;
    let c1 = cMax;
    if (cull) {
      if (!coneRowSpan(ax, ay, az, cosOuter, wy, h, sx, g.ox, g.res, g.cols, span)) continue;
      c0 = Math.max(c0, span[0]);
      c1 = Math.min(c1, span[1]);
      if (c0 > c1) continue;
    }
    const base = row * g.cols;
    const dyz = wy * ay - h * az;
    const wy2h2 = wy * wy + h * h;
    for (let col = c0; col <= c1; col++) {
      const wx = g.ox + col * g.res - sx;
      const d2 = wx * wx + wy2h2;
      if (d2 < 1e-18) continue; // as in beamLux: a point at the lens is not a lit surface
      const d = Math.sqrt(d2);
      const dot = wx * ax + dyz;
      if (dot < cosOuter * d) continue;
      let rel = 1;
      if (dot < cosStart * d) {
        // Inlined tableAt (table.ts): the call is the hot path's largest cost after the square roots.
        const x = (Math.sqrt((1 - dot / d) * invRange) - sigma0) * scale;
        const j = x | 0;
        rel = j >= last ? table[last] : table[j] + (x - j) * (table[j + 1] - table[j]);
      }
      acc[base + col] += (intensity * rel * h) / (d2 * d);
    }
    evaluations += c1 - c0 + 1;
  }
  return evaluations;
}

type Layout = { cols: number; rows: number; res: number; ox: number; oy: number; pz: number };

/**
 * Illuminance over a rectangle of the stage at cell centres, summed over the beams. The profile comes from
 * a per-beam table (table.ts), so a cell can differ from illuminanceAt by about 2e-4 of the beam's peak.
 */
export function illuminanceGrid(i: GridInput): Grid {
  const { cols, rows } = checkGrid(i);
  const res = i.resolution;
  const g: Layout = { cols, rows, res, ox: i.bounds.minX + res / 2, oy: i.bounds.minY + res / 2, pz: i.planeZ };
  const cull = i.cull !== false;
  // Summed in float64 and stored as float32 once; culling only skips exact zeros, so both sums match.
  const acc = new Float64Array(cols * rows);
  const span = new Int32Array(2);
  let evaluations = 0;
  for (const beam of i.beams) {
    const b = prepareBeam(beam);
    // A lens at or below the plane lights only the underside of an upward-facing surface.
    if (b.intensity === 0 || b.sz <= g.pz) continue;
    evaluations += addBeam(acc, b, g, beam, cull, span);
  }
  const values = new Float32Array(acc);
  const s = zoneStats({ values, cols, rows, originX: g.ox, originY: g.oy, resolution: res });
  return {
    values,
    cols,
    rows,
    resolution: res,
    planeZ: g.pz,
    originX: g.ox,
    originY: g.oy,
    min: s.min ?? 0,
    mean: s.mean ?? 0,
    max: s.max ?? 0,
    evaluations,
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
    count,
    min,
    mean,
    max,
    uniformity: mean > 0 ? min / mean : null,
    diversity: max > 0 ? min / max : null,
  };
}

import { illuminanceGrid, zoneStats, type Bounds, type Grid } from "./illuminance-grid";
import { prepareBeam, type LitBeam, type PreparedBeam } from "./illuminance";
import { ellipseBounds, poolAtPlane } from "./pool";
import { coneRowSpan } from "./span";
import { profileTable, TABLE_STEPS } from "./profile-table";
import { assertFinite } from "./validate";
import { facingNormal } from "./vertical";

/**
 * What a coverage study measures. Heights are above the show deck, which itself may stand above the stage
 * floor that lens heights are measured from: every plane is measured from the deck.
 * - deck: horizontal, on the deck;  plane: horizontal at a height (head height);
 * - face: vertical at a height (face height), facing facingDeg in plan (−90° = the audience).
 */
export type Measure =
  | { kind: "deck" }
  | { kind: "plane"; height: number }
  | { kind: "face"; height: number; facingDeg: number };

export type CoverageInput = {
  bounds: Bounds;
  resolution: number;
  /** Height of the show deck above the stage floor (0 without one). */
  deckHeight: number;
  measure: Measure;
  beams: LitBeam[];
  cull?: boolean;
};

export type CoverageGrid = Grid & {
  /** Face light only: per cell, the index of the brightest beam (−1 when dark) and its lux. */
  key?: Int32Array;
  keyLux?: Float32Array;
};

/** Height of the measured plane above the stage floor. */
export function planeHeight(deckHeight: number, m: Measure): number {
  assertFinite("Show-deck height", deckHeight);
  if (deckHeight < 0) throw new RangeError(`Show-deck height cannot be negative (got ${deckHeight} m).`);
  if (m.kind === "deck") return deckHeight;
  assertFinite("Plane height", m.height);
  if (m.height < 0) throw new RangeError(`The measured height cannot be below the deck (got ${m.height} m).`);
  return deckHeight + m.height;
}

export function coverageGrid(i: CoverageInput): CoverageGrid {
  const planeZ = planeHeight(i.deckHeight, i.measure);
  if (i.measure.kind !== "face") {
    return illuminanceGrid({ bounds: i.bounds, resolution: i.resolution, planeZ, beams: i.beams, cull: i.cull });
  }
  return faceGrid(i, planeZ, i.measure.facingDeg);
}

type Layout = { cols: number; rows: number; res: number; ox: number; oy: number; pz: number; nx: number; ny: number };

/** Rows and columns a beam can reach on the plane: its pool's box, or everything when the pool is not closed. */
function reach(beam: LitBeam, g: Layout): [number, number, number, number] | null {
  const pool = poolAtPlane({
    source: beam.source,
    focus: beam.focus,
    coneDeg: beam.coneDeg,
    softnessDeg: beam.softnessDeg,
    planeZ: g.pz,
  });
  if (pool.status !== "ok" || !pool.outer) return [0, g.rows - 1, 0, g.cols - 1];
  const bb = ellipseBounds(pool.outer);
  const r0 = Math.max(0, Math.floor((bb.minY - g.oy) / g.res) - 1);
  const r1 = Math.min(g.rows - 1, Math.ceil((bb.maxY - g.oy) / g.res) + 1);
  const c0 = Math.max(0, Math.floor((bb.minX - g.ox) / g.res) - 1);
  const c1 = Math.min(g.cols - 1, Math.ceil((bb.maxX - g.ox) / g.res) + 1);
  return r0 > r1 || c0 > c1 ? null : [r0, r1, c0, c1];
}

type Acc = { total: Float64Array; keyLux: Float32Array; key: Int32Array };

/** One beam's lux on the vertical faces; the same culling as the deck grid (the cone meets the same plane). */
function addFaceBeam(
  acc: Acc,
  index: number,
  b: PreparedBeam,
  beam: LitBeam,
  g: Layout,
  cull: boolean,
  span: Int32Array,
): number {
  const h = b.sz - g.pz;
  let [r0, r1, cMin, cMax] = [0, g.rows - 1, 0, g.cols - 1];
  if (cull) {
    const r = reach(beam, g);
    if (!r) return 0;
    [r0, r1, cMin, cMax] = r;
  }
  const t = profileTable(b.prof);
  const { values: table, cosStart, sigma0, scale, invRange } = t;
  const { sx, sy, ax, ay, az, intensity } = b;
  const { nx, ny } = g;
  const cosOuter = b.prof.cosOuter;
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
    const facingY = -wy * ny;
    for (let col = c0; col <= c1; col++) {
      const wx = g.ox + col * g.res - sx;
      const facing = facingY - wx * nx;
      if (facing <= 0) continue; // the light comes from behind the face
      const d2 = wx * wx + wy2h2;
      if (d2 < 1e-18) continue;
      const d = Math.sqrt(d2);
      const dot = wx * ax + dyz;
      if (dot < cosOuter * d) continue;
      let rel = 1;
      if (dot < cosStart * d) {
        const x = (Math.sqrt((1 - dot / d) * invRange) - sigma0) * scale;
        const j = x | 0;
        rel = j >= TABLE_STEPS ? table[TABLE_STEPS] : table[j] + (x - j) * (table[j + 1] - table[j]);
      }
      const e = (intensity * rel * facing) / (d2 * d);
      const k = base + col;
      acc.total[k] += e;
      if (e > acc.keyLux[k]) {
        acc.keyLux[k] = e;
        acc.key[k] = index;
      }
    }
    evaluations += c1 - c0 + 1;
  }
  return evaluations;
}

function faceGrid(i: CoverageInput, planeZ: number, facingDeg: number): CoverageGrid {
  // The deck grid checks bounds and resolution; an empty beam list costs nothing and gives the layout.
  const shape = illuminanceGrid({ bounds: i.bounds, resolution: i.resolution, planeZ, beams: [] });
  const n = facingNormal(facingDeg);
  const g: Layout = {
    cols: shape.cols,
    rows: shape.rows,
    res: shape.resolution,
    ox: shape.originX,
    oy: shape.originY,
    pz: planeZ,
    nx: n.x,
    ny: n.y,
  };
  const cells = g.cols * g.rows;
  const acc: Acc = {
    total: new Float64Array(cells),
    keyLux: new Float32Array(cells),
    key: new Int32Array(cells).fill(-1),
  };
  const span = new Int32Array(2);
  const cull = i.cull !== false;
  let evaluations = 0;
  i.beams.forEach((beam, index) => {
    const b = prepareBeam(beam);
    if (b.intensity === 0) return;
    evaluations += addFaceBeam(acc, index, b, beam, g, cull, span);
  });
  const values = new Float32Array(acc.total);
  const s = zoneStats({ values, cols: g.cols, rows: g.rows, originX: g.ox, originY: g.oy, resolution: g.res });
  return {
    ...shape,
    values,
    min: s.min ?? 0,
    mean: s.mean ?? 0,
    max: s.max ?? 0,
    evaluations,
    key: acc.key,
    keyLux: acc.keyLux,
  };
}

import { gridPoint, type GridCells } from "./illuminance-grid";
import { pointInPolygon } from "./polygon";
import { assertFinite } from "./validate";
import type { Point } from "./vector";

export type AreaInput = { id: number; name: string; polygon: Point[] };

export type AreaFlag = "uniformity" | "brighter" | "dimmer" | "no-cells";

export type AreaCoverage = {
  id: number;
  name: string;
  /** Grid cells whose centres lie in the area. */
  count: number;
  min: number | null;
  mean: number | null;
  max: number | null;
  /** Where the minimum is (the dark spot), at a cell centre. */
  minAt: Point | null;
  /** U0 = Emin / Eavg (EN 12464-1, CIBSE); 0 for an area in full darkness, null with no cells. */
  uniformity: number | null;
  /** Eavg : Emin, the form IES publications often quote; null when the minimum is 0 (no finite ratio). */
  averageToMinimum: number | null;
  /** This area's mean over the median of the other areas' means; null when that cannot be formed. */
  meanRatio: number | null;
  flags: AreaFlag[];
};

export type AreaThresholds = {
  /** Flag when U0 falls below this (default 0.5). */
  minUniformity: number;
  /** Flag when the mean is more than this many times, or less than 1/this, the other areas' median (default 2). */
  meanRatio: number;
};

export const DEFAULT_THRESHOLDS: AreaThresholds = { minUniformity: 0.5, meanRatio: 2 };

type Raw = { count: number; sum: number; min: number; max: number; minAt: Point | null };

function rawStats(g: GridCells, polygon: Point[]): Raw {
  const xs = polygon.map((p) => p.x);
  const ys = polygon.map((p) => p.y);
  // Only the cells under the polygon's box are tested; a point-in-polygon test per cell of the whole stage
  // would dominate a table of twenty areas.
  const c0 = Math.max(0, Math.floor((Math.min(...xs) - g.originX) / g.resolution));
  const c1 = Math.min(g.cols - 1, Math.ceil((Math.max(...xs) - g.originX) / g.resolution));
  const r0 = Math.max(0, Math.floor((Math.min(...ys) - g.originY) / g.resolution));
  const r1 = Math.min(g.rows - 1, Math.ceil((Math.max(...ys) - g.originY) / g.resolution));
  const out: Raw = { count: 0, sum: 0, min: Infinity, max: -Infinity, minAt: null };
  for (let row = r0; row <= r1; row++) {
    for (let col = c0; col <= c1; col++) {
      const p = gridPoint(g, col, row);
      if (!pointInPolygon(p, polygon)) continue;
      const v = g.values[row * g.cols + col];
      out.count++;
      out.sum += v;
      if (v < out.min) {
        out.min = v;
        out.minAt = p;
      }
      if (v > out.max) out.max = v;
    }
  }
  return out;
}

function median(xs: number[]): number | null {
  if (!xs.length) return null;
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function checkThresholds(t: AreaThresholds): void {
  assertFinite("Uniformity threshold", t.minUniformity);
  assertFinite("Mean ratio", t.meanRatio);
  if (t.minUniformity < 0 || t.minUniformity > 1)
    throw new RangeError(`The uniformity threshold must be between 0 and 1 (got ${t.minUniformity}).`);
  if (t.meanRatio < 1) throw new RangeError(`The mean ratio must be 1 or more (got ${t.meanRatio}).`);
}

/** Minimum, mean, maximum and uniformity of each acting area on a grid, with the areas that need a look flagged. */
export function areaCoverage(
  g: GridCells,
  areas: AreaInput[],
  thresholds: AreaThresholds = DEFAULT_THRESHOLDS,
): AreaCoverage[] {
  checkThresholds(thresholds);
  const raws = areas.map((a) =>
    a.polygon.length >= 3 ? rawStats(g, a.polygon) : { count: 0, sum: 0, min: Infinity, max: -Infinity, minAt: null },
  );
  const means = raws.map((r) => (r.count ? r.sum / r.count : null));
  return areas.map((a, k) => {
    const r = raws[k];
    const mean = means[k];
    if (!r.count || mean === null) {
      return {
        id: a.id,
        name: a.name,
        count: 0,
        min: null,
        mean: null,
        max: null,
        minAt: null,
        uniformity: null,
        averageToMinimum: null,
        meanRatio: null,
        flags: ["no-cells"],
      };
    }
    // The median, so that one very bright area stands out without making every other area look dim.
    const otherMean = median(means.filter((m, j): m is number => j !== k && m !== null));
    const meanRatio = otherMean === null ? null : otherMean > 0 ? mean / otherMean : mean > 0 ? Infinity : null;
    // A dark area has U0 = 0 by definition here: nothing to divide, and certainly not even.
    const uniformity = mean > 0 ? r.min / mean : 0;
    const flags: AreaFlag[] = [];
    if (uniformity < thresholds.minUniformity) flags.push("uniformity");
    if (meanRatio !== null && meanRatio > thresholds.meanRatio) flags.push("brighter");
    if (meanRatio !== null && meanRatio < 1 / thresholds.meanRatio) flags.push("dimmer");
    return {
      id: a.id,
      name: a.name,
      count: r.count,
      min: r.min,
      mean,
      max: r.max,
      minAt: r.minAt,
      uniformity,
      averageToMinimum: r.min > 0 ? mean / r.min : null,
      meanRatio,
      flags,
    };
  });
}

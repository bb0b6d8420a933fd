// Where a new unit goes when the spot it was dropped on is taken: the nearest free spot along the same
// position, so two symbols never sit on one point. Spacing is by the types' body widths (centre to centre,
// half of each unit's width). Pure: the plot calls it while placing, the tests check it by hand.
import type { Point } from "@/lib/optics";
import { projectOntoPosition, type PositionLine } from "./along-position";

/** A unit already there: its centre along the position (metres from end 1) and its body width. */
export type Occupant = { along: number; width: number };

const EPS = 1e-9;

/** True when a unit of `width` centred at `along` keeps clear of every occupant. */
function isFree(along: number, width: number, occupied: readonly Occupant[]): boolean {
  return occupied.every((o) => Math.abs(along - o.along) >= (width + o.width) / 2 - EPS);
}

/**
 * The free centre nearest to `wanted` for a unit of `width` on a position `length` long (0 … length),
 * or null when there is no room anywhere. A spot that is already free is kept as it is. On a tie the
 * spot further along wins (the drop landed exactly on a unit's centre: either side is as near).
 */
export function freeSpotAlong(o: {
  length: number;
  wanted: number;
  width: number;
  occupied: readonly Occupant[];
}): number | null {
  const wanted = Math.min(o.length, Math.max(0, o.wanted));
  if (isFree(wanted, o.width, o.occupied)) return wanted;
  // The nearest free spot touches a neighbour: it is one of the ends of the blocked stretches.
  const candidates = o.occupied
    .flatMap((u) => {
      const gap = (o.width + u.width) / 2;
      return [u.along - gap, u.along + gap];
    })
    .filter((s) => s >= -EPS && s <= o.length + EPS && isFree(s, o.width, o.occupied))
    .map((s) => Math.min(o.length, Math.max(0, s)));
  let best: number | null = null;
  for (const s of candidates) {
    const d = Math.abs(s - wanted);
    if (
      best === null ||
      d < Math.abs(best - wanted) - EPS ||
      (Math.abs(d - Math.abs(best - wanted)) <= EPS && s > best)
    )
      best = s;
  }
  return best;
}

/**
 * A unit dropped on a line position at `wanted` (already on the line): the plan point where it hangs,
 * nudged along the position clear of the units there (their plan points and body widths), whether it
 * was moved, or null when the position has no room left for it.
 */
export function nudgeOntoPosition(
  pos: PositionLine,
  wanted: Point,
  width: number,
  units: ReadonlyArray<{ x: number; y: number; width: number }>,
): { point: Point; moved: boolean } | null {
  if (pos.x2 == null || pos.y2 == null) return { point: wanted, moved: false };
  const length = Math.hypot(pos.x2 - pos.x1, pos.y2 - pos.y1);
  const along = (p: Point) => projectOntoPosition(pos, p).t * length;
  const start = along(wanted);
  const s = freeSpotAlong({
    length,
    wanted: start,
    width,
    occupied: units.map((u) => ({ along: along(u), width: u.width })),
  });
  if (s === null) return null;
  if (Math.abs(s - start) <= EPS) return { point: wanted, moved: false };
  const k = length === 0 ? 0 : s / length;
  return { point: { x: pos.x1 + k * (pos.x2 - pos.x1), y: pos.y1 + k * (pos.y2 - pos.y1) }, moved: true };
}

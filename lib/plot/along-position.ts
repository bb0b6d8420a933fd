// Where things sit along a hanging position: projection onto a pipe, the order of units, and unit
// numbers for a new unit that never force the others to be renumbered.
import type { Point } from "@/lib/optics";
import { compareUnitNumbers } from "@/lib/rig/unit-number";

export type PositionLine = { x1: number; y1: number; x2: number | null; y2: number | null };
export type NumberingDirection = "from-stage-left" | "from-stage-right";

/** The closest point on the position to p, with t ∈ [0, 1] from end 1 to end 2 (a point position gives t = 0). */
export function projectOntoPosition(pos: PositionLine, p: Point): { point: Point; t: number; distance: number } {
  const a = { x: pos.x1, y: pos.y1 };
  if (pos.x2 == null || pos.y2 == null) return { point: a, t: 0, distance: Math.hypot(p.x - a.x, p.y - a.y) };
  const dx = pos.x2 - pos.x1;
  const dy = pos.y2 - pos.y1;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  const point = { x: a.x + t * dx, y: a.y + t * dy };
  return { point, t, distance: Math.hypot(p.x - point.x, p.y - point.y) };
}

/** The nearest position within `tolerance` metres of p, or null. */
export function nearestPosition<P extends PositionLine & { id: number }>(
  positions: P[],
  p: Point,
  tolerance: number,
): { position: P; point: Point } | null {
  let best: { position: P; point: Point; d: number } | null = null;
  for (const pos of positions) {
    const hit = projectOntoPosition(pos, p);
    if (hit.distance <= tolerance && (!best || hit.distance < best.d))
      best = { position: pos, point: hit.point, d: hit.distance };
  }
  return best && { position: best.position, point: best.point };
}

/**
 * Order of units along a line position for numbering. Stage left is +x, so "from stage left" puts the
 * largest x first (common practice, no source: overhead positions numbered from stage left). Along a pipe
 * running up- and downstage the downstage end comes first.
 */
export function numberingOrder<F extends { id: number; x: number; y: number }>(
  fixtures: F[],
  direction: NumberingDirection,
): F[] {
  const sign = direction === "from-stage-left" ? -1 : 1;
  return fixtures.slice().sort((a, b) => sign * (a.x - b.x) || a.y - b.y || a.id - b.id);
}

/** Vertical positions (booms, ladders) number from the top down (common practice, no source). */
export function numberingOrderVertical<F extends { id: number; lensHeight: number }>(fixtures: F[]): F[] {
  return fixtures.slice().sort((a, b) => b.lensHeight - a.lensHeight || a.id - b.id);
}

/** Fresh numbers 1…n in the given order, as id → unit number. */
export function renumber(orderedIds: number[]): Map<number, string> {
  return new Map(orderedIds.map((id, i) => [id, String(i + 1)]));
}

/**
 * The unit number for a unit slotted in after `before` (null: at the head of the order) given every
 * unit number on the position. After the last unit it is the next whole number; between two units it
 * is the earlier one with the next free letter (7 → 7A, 7A → 7B), so nobody else is renumbered.
 */
export function unitNumberForInsert(existing: string[], before: string | null): string {
  const sorted = existing.slice().sort(compareUnitNumbers);
  const taken = new Set(sorted.map((u) => u.toUpperCase()));
  if (!sorted.length) return "1";
  const wholes = sorted.map((u) => parseInt(u, 10)).filter(Number.isFinite);
  const maxWhole = Math.max(0, ...wholes);
  if (before === null) {
    const minWhole = Math.min(...wholes);
    if (minWhole > 0) return String(minWhole - 1);
    return nextLetter("0", taken, "0");
  }
  const idx = sorted.findIndex((u) => u.toUpperCase() === before.toUpperCase());
  if (idx === -1 || idx === sorted.length - 1) return String(maxWhole + 1);
  const base = before.match(/^\d+/)![0];
  const nextWhole = parseInt(sorted[idx + 1], 10);
  if (nextWhole > parseInt(base, 10) + 1) return String(parseInt(base, 10) + 1);
  return nextLetter(base, taken, before);
}

function nextLetter(base: string, taken: Set<string>, after: string): string {
  const suffix = after.replace(/^\d+/, "").toUpperCase();
  const start = suffix ? suffix.charCodeAt(suffix.length - 1) - 64 : 0;
  for (let i = start + 1; i <= 26; i++) {
    const candidate = base + String.fromCharCode(64 + i);
    if (!taken.has(candidate)) return candidate;
  }
  for (let i = 1; i <= 26; i++)
    for (let j = 1; j <= 26; j++) {
      const candidate = base + String.fromCharCode(64 + i) + String.fromCharCode(64 + j);
      if (!taken.has(candidate)) return candidate;
    }
  throw new RangeError(`No unit number left after ${after}.`);
}

/** Evenly spaced points for n units along a line position, inset half a spacing from each end. */
export function spreadAlong(pos: PositionLine, n: number): Point[] {
  if (pos.x2 == null || pos.y2 == null) return Array.from({ length: n }, () => ({ x: pos.x1, y: pos.y1 }));
  return Array.from({ length: n }, (_, i) => {
    const t = (i + 0.5) / n;
    return { x: pos.x1 + t * (pos.x2! - pos.x1), y: pos.y1 + t * (pos.y2! - pos.y1) };
  });
}

/** Snaps a plan value to a grid step (e.g. 5 cm, or half an inch in imperial). */
export function snap(value: number, step: number): number {
  return step > 0 ? Math.round(value / step) * step : value;
}

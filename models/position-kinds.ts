/**
 * Kinds of hanging position, and which of them hang their units at one plan point. The database's enum and
 * the model are built from this list; lib/rig/position-kinds.ts re-exports it with the words shown to people.
 */
export const POSITION_KINDS = [
  "overhead-pipe",
  "truss",
  "boom",
  "ladder",
  "box-boom",
  "foh-bridge",
  "foh-rail",
  "pipe-end",
  "floor",
  "flying-electric",
] as const;
export type PositionKind = (typeof POSITION_KINDS)[number];

/**
 * Positions that carry their units at one plan point, stacked by height, rather than spread along a line:
 * a boom or box boom is an upright pipe, a ladder hangs as an upright frame, a pipe end is the tip of an
 * electric where side units drop one under another, and a floor position is a base or stand on the deck.
 * Pipes, electrics, trusses, bridges and rails run between two ends. (Common practice, no source.)
 * Stored rows of these kinds have no second end (x2, y2 null); their units are numbered from the top down.
 */
export const POINT_HUNG_KINDS: ReadonlySet<PositionKind> = new Set(["boom", "ladder", "box-boom", "pipe-end", "floor"]);

/** True for a kind that hangs its units at one point; false for line kinds and for anything unknown. */
export function isPointHung(kind: string | null | undefined): boolean {
  return !!kind && POINT_HUNG_KINDS.has(kind as PositionKind);
}

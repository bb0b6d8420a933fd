/** Kinds of hanging position. Lines (pipes, trusses, rails) have two ends; the rest stand at a point. */
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

export const POSITION_KIND_LABELS: Record<PositionKind, string> = {
  "overhead-pipe": "Overhead pipe",
  truss: "Truss",
  boom: "Boom",
  ladder: "Ladder",
  "box-boom": "Box boom",
  "foh-bridge": "Front-of-house bridge",
  "foh-rail": "Front-of-house rail",
  "pipe-end": "Pipe end",
  floor: "Floor",
  "flying-electric": "Flying electric",
};

/** Booms, ladders and similar stand at a point and carry units at several heights. */
export const VERTICAL_KINDS: ReadonlySet<PositionKind> = new Set(["boom", "ladder", "box-boom", "pipe-end", "floor"]);

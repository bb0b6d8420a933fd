import type { PositionKind } from "@/models/position-kinds";

// The list lives with the models (the database's enum is built from it); this module adds the words people see.
export { POINT_HUNG_KINDS, POSITION_KINDS, isPointHung, type PositionKind } from "@/models/position-kinds";

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

// The plan's named objects: positions, focus points, acting areas and landmarks.
import type { PositionKind } from "@/lib/rig/position-kinds";

export type PositionDto = {
  id: number;
  productionId: number;
  name: string;
  kind: PositionKind;
  x1: number;
  y1: number;
  x2: number | null;
  y2: number | null;
  trimHeight: number;
  ratedLoadKg: number | null;
  sortOrder: number;
  version: number;
  updatedAt: string;
};

export type FocusPointDto = {
  id: number;
  productionId: number;
  name: string;
  x: number;
  y: number;
  version: number;
  updatedAt: string;
};

/** A named acting area drawn on the plan as a polygon; the coverage study reads it. */
export type AreaZoneDto = {
  id: number;
  productionId: number;
  name: string;
  polygon: Array<{ x: number; y: number }>;
  version: number;
  updatedAt: string;
};

/** A named line on the plan; focus charts word shutter cuts against these ("cut to the lip"). */
export type LandmarkDto = {
  id: number;
  productionId: number;
  name: string;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  version: number;
  updatedAt: string;
};

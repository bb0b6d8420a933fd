import "server-only";
import type { z } from "zod";
import { getDb, type Landmark } from "@/models";
import type { createLandmarkSchema, updateLandmarkSchema } from "@/lib/validation/plot";
import { iso } from "./versioned";
import { productionCrud } from "./production-crud";

/** A named line on the plan; focus charts word shutter cuts against these ("cut to the lip"). */
export type LandmarkDto = { id: number; productionId: number; name: string; x1: number; y1: number; x2: number; y2: number; version: number; updatedAt: string };

export const toLandmarkDto = (l: Landmark): LandmarkDto => ({
  id: l.id,
  productionId: l.productionId,
  name: l.name,
  x1: l.x1,
  y1: l.y1,
  x2: l.x2,
  y2: l.y2,
  version: l.version,
  updatedAt: iso(l.updatedAt)!,
});

const landmarks = productionCrud<Landmark, LandmarkDto, z.infer<typeof createLandmarkSchema>, z.infer<typeof updateLandmarkSchema>>({
  model: () => getDb().Landmark,
  entity: "landmark",
  what: "Landmark",
  toDto: toLandmarkDto,
  order: [["name", "ASC"]],
});

export const getLandmarksByProduction = landmarks.list;
export const createLandmark = landmarks.create;
export const updateLandmark = landmarks.update;
export const deleteLandmark = landmarks.remove;

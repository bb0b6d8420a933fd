import "server-only";
import type { z } from "zod";
import { getDb, type Landmark } from "@/models";
import type { createLandmarkSchema, updateLandmarkSchema } from "@/lib/validation/plot";
import type { LandmarkDto } from "@/lib/dto/plan";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";

export const toLandmarkDto = (l: Landmark): LandmarkDto =>
  plain(l, ["id", "productionId", "name", "x1", "y1", "x2", "y2", "version", "updatedAt"]);

const landmarks = productionCrud<
  Landmark,
  LandmarkDto,
  z.infer<typeof createLandmarkSchema>,
  z.infer<typeof updateLandmarkSchema>
>({
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

import "server-only";
import type { z } from "zod";
import { getDb, type Landmark } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { createLandmarkSchema, updateLandmarkSchema } from "@/lib/validation/plot";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { uniqueNameError } from "./unique";

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

export async function getLandmarksByProduction({ productionId }: { productionId: number }): Promise<LandmarkDto[]> {
  const rows = await getDb().Landmark.findAll({ where: { productionId }, order: [["name", "ASC"]] });
  return rows.map(toLandmarkDto);
}

export async function createLandmark({ productionId, userId, input }: { productionId: number; userId: number; input: z.infer<typeof createLandmarkSchema> }) {
  const { sequelize, Landmark } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await Landmark.create({ ...input, productionId }, { transaction }).catch(uniqueNameError("landmark"));
    await recordChange({ productionId, userId, entity: "landmark", entityId: row.id, action: "create", after: toLandmarkDto(row) }, transaction);
    return toLandmarkDto(row);
  });
}

export async function updateLandmark({ productionId, landmarkId, userId, patch }: { productionId: number; landmarkId: number; userId: number; patch: z.infer<typeof updateLandmarkSchema> }) {
  const { sequelize, Landmark } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return sequelize.transaction(async (transaction) => {
    const { before, after } = await versionedUpdate({ model: Landmark, scope: { productionId }, id: landmarkId, version, changes, toDto: toLandmarkDto, what: "Landmark", transaction }).catch(uniqueNameError("landmark"));
    await recordChange({ productionId, userId, entity: "landmark", entityId: landmarkId, action: "update", before: toLandmarkDto(before), after: toLandmarkDto(after) }, transaction);
    return toLandmarkDto(after);
  });
}

export async function deleteLandmark({ productionId, landmarkId, userId }: { productionId: number; landmarkId: number; userId: number }) {
  const { sequelize, Landmark } = getDb();
  await sequelize.transaction(async (transaction) => {
    const row = await Landmark.findOne({ where: { productionId, id: landmarkId }, transaction });
    if (!row) throw notFound("Landmark");
    await row.destroy({ transaction });
    await recordChange({ productionId, userId, entity: "landmark", entityId: landmarkId, action: "delete", before: toLandmarkDto(row) }, transaction);
  });
}

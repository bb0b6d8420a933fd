import "server-only";
import type { z } from "zod";
import { getDb, type AreaZone } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { createAreaZoneSchema, updateAreaZoneSchema } from "@/lib/validation/plot";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { uniqueNameError } from "./unique";

export type AreaZoneDto = { id: number; productionId: number; name: string; polygon: Array<{ x: number; y: number }>; version: number; updatedAt: string };

export const toAreaZoneDto = (z: AreaZone): AreaZoneDto => ({
  id: z.id,
  productionId: z.productionId,
  name: z.name,
  polygon: z.polygon,
  version: z.version,
  updatedAt: iso(z.updatedAt)!,
});

export async function getAreaZonesByProduction({ productionId }: { productionId: number }): Promise<AreaZoneDto[]> {
  const rows = await getDb().AreaZone.findAll({ where: { productionId }, order: [["name", "ASC"]] });
  return rows.map(toAreaZoneDto);
}

export async function createAreaZone({ productionId, userId, input }: { productionId: number; userId: number; input: z.infer<typeof createAreaZoneSchema> }) {
  const { sequelize, AreaZone } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await AreaZone.create({ ...input, productionId }, { transaction }).catch(uniqueNameError("acting area"));
    await recordChange({ productionId, userId, entity: "areaZone", entityId: row.id, action: "create", after: toAreaZoneDto(row) }, transaction);
    return toAreaZoneDto(row);
  });
}

export async function updateAreaZone({ productionId, areaZoneId, userId, patch }: { productionId: number; areaZoneId: number; userId: number; patch: z.infer<typeof updateAreaZoneSchema> }) {
  const { sequelize, AreaZone } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return sequelize.transaction(async (transaction) => {
    const { before, after } = await versionedUpdate({ model: AreaZone, scope: { productionId }, id: areaZoneId, version, changes, toDto: toAreaZoneDto, what: "Acting area", transaction }).catch(uniqueNameError("acting area"));
    await recordChange({ productionId, userId, entity: "areaZone", entityId: areaZoneId, action: "update", before: toAreaZoneDto(before), after: toAreaZoneDto(after) }, transaction);
    return toAreaZoneDto(after);
  });
}

export async function deleteAreaZone({ productionId, areaZoneId, userId }: { productionId: number; areaZoneId: number; userId: number }) {
  const { sequelize, AreaZone } = getDb();
  await sequelize.transaction(async (transaction) => {
    const row = await AreaZone.findOne({ where: { productionId, id: areaZoneId }, transaction });
    if (!row) throw notFound("Acting area");
    await row.destroy({ transaction });
    await recordChange({ productionId, userId, entity: "areaZone", entityId: areaZoneId, action: "delete", before: toAreaZoneDto(row) }, transaction);
  });
}

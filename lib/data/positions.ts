import "server-only";
import { getDb, type Position } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { z } from "zod";
import type { createPositionSchema, updatePositionSchema } from "@/lib/validation/rig";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { uniqueNameError } from "./unique";

export type PositionDto = {
  id: number;
  productionId: number;
  name: string;
  kind: Position["kind"];
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

export function toPositionDto(p: Position): PositionDto {
  return {
    id: p.id,
    productionId: p.productionId,
    name: p.name,
    kind: p.kind,
    x1: p.x1,
    y1: p.y1,
    x2: p.x2,
    y2: p.y2,
    trimHeight: p.trimHeight,
    ratedLoadKg: p.ratedLoadKg,
    sortOrder: p.sortOrder,
    version: p.version,
    updatedAt: iso(p.updatedAt)!,
  };
}

export async function getPositionsByProduction({ productionId }: { productionId: number }): Promise<PositionDto[]> {
  const rows = await getDb().Position.findAll({ where: { productionId }, order: [["sortOrder", "ASC"], ["name", "ASC"]] });
  return rows.map(toPositionDto);
}

export async function createPosition({ productionId, userId, input }: { productionId: number; userId: number; input: z.infer<typeof createPositionSchema> }) {
  const { sequelize, Position } = getDb();
  return sequelize.transaction(async (transaction) => {
    const sortOrder = input.sortOrder ?? (((await Position.max("sortOrder", { where: { productionId }, transaction })) as number | null) ?? -1) + 1;
    const row = await Position.create({ x2: null, y2: null, ratedLoadKg: null, ...input, sortOrder, productionId }, { transaction }).catch(uniqueNameError("position"));
    await recordChange({ productionId, userId, entity: "position", entityId: row.id, action: "create", after: toPositionDto(row) }, transaction);
    return toPositionDto(row);
  });
}

export async function updatePosition({ productionId, positionId, userId, patch }: { productionId: number; positionId: number; userId: number; patch: z.infer<typeof updatePositionSchema> }) {
  const { sequelize, Position } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return sequelize.transaction(async (transaction) => {
    const { before, after } = await versionedUpdate({ model: Position, scope: { productionId }, id: positionId, version, changes, toDto: toPositionDto, what: "Position", transaction }).catch(uniqueNameError("position"));
    await recordChange({ productionId, userId, entity: "position", entityId: positionId, action: "update", before: toPositionDto(before), after: toPositionDto(after) }, transaction);
    return toPositionDto(after);
  });
}

/** Deletes a position and the fixtures hung on it (the caller confirms with the user first). */
export async function deletePosition({ productionId, positionId, userId }: { productionId: number; positionId: number; userId: number }) {
  const { sequelize, Position, Fixture } = getDb();
  await sequelize.transaction(async (transaction) => {
    const row = await Position.findOne({ where: { productionId, id: positionId }, transaction });
    if (!row) throw notFound("Position");
    const removed = await Fixture.destroy({ where: { productionId, positionId }, transaction });
    await row.destroy({ transaction });
    await recordChange({ productionId, userId, entity: "position", entityId: positionId, action: "delete", before: { ...toPositionDto(row), fixturesRemoved: removed } }, transaction);
  });
}

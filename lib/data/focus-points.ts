import "server-only";
import { literal } from "sequelize";
import { getDb, type FocusPoint } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { z } from "zod";
import type { createFocusPointSchema, updateFocusPointSchema } from "@/lib/validation/rig";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { uniqueNameError } from "./unique";

export type FocusPointDto = { id: number; productionId: number; name: string; x: number; y: number; version: number; updatedAt: string };

export const toFocusPointDto = (p: FocusPoint): FocusPointDto => ({
  id: p.id,
  productionId: p.productionId,
  name: p.name,
  x: p.x,
  y: p.y,
  version: p.version,
  updatedAt: iso(p.updatedAt)!,
});

export async function getFocusPointsByProduction({ productionId }: { productionId: number }): Promise<FocusPointDto[]> {
  const rows = await getDb().FocusPoint.findAll({ where: { productionId }, order: [["name", "ASC"]] });
  return rows.map(toFocusPointDto);
}

export async function createFocusPoint({ productionId, userId, input }: { productionId: number; userId: number; input: z.infer<typeof createFocusPointSchema> }) {
  const { sequelize, FocusPoint } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await FocusPoint.create({ ...input, productionId }, { transaction }).catch(uniqueNameError("focus point"));
    await recordChange({ productionId, userId, entity: "focusPoint", entityId: row.id, action: "create", after: toFocusPointDto(row) }, transaction);
    return toFocusPointDto(row);
  });
}

/** Moving a focus point moves the mark of every fixture aimed at it (they reference it, not a copy). */
export async function updateFocusPoint({ productionId, focusPointId, userId, patch }: { productionId: number; focusPointId: number; userId: number; patch: z.infer<typeof updateFocusPointSchema> }) {
  const { sequelize, FocusPoint } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return sequelize.transaction(async (transaction) => {
    const { before, after } = await versionedUpdate({ model: FocusPoint, scope: { productionId }, id: focusPointId, version, changes, toDto: toFocusPointDto, what: "Focus point", transaction }).catch(uniqueNameError("focus point"));
    await recordChange({ productionId, userId, entity: "focusPoint", entityId: focusPointId, action: "update", before: toFocusPointDto(before), after: toFocusPointDto(after) }, transaction);
    return toFocusPointDto(after);
  });
}

/** Fixtures aimed at a deleted point keep their mark where the point was. */
export async function deleteFocusPoint({ productionId, focusPointId, userId }: { productionId: number; focusPointId: number; userId: number }) {
  const { sequelize, FocusPoint, Fixture } = getDb();
  await sequelize.transaction(async (transaction) => {
    const row = await FocusPoint.findOne({ where: { productionId, id: focusPointId }, transaction });
    if (!row) throw notFound("Focus point");
    await Fixture.update({ focusX: row.x, focusY: row.y, focusPointId: null, version: literal("version + 1") as never }, { where: { productionId, focusPointId }, transaction });
    await row.destroy({ transaction });
    await recordChange({ productionId, userId, entity: "focusPoint", entityId: focusPointId, action: "delete", before: toFocusPointDto(row) }, transaction);
  });
}

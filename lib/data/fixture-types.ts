import "server-only";
import { getDb, type FixtureType } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { z } from "zod";
import type { createFixtureTypeSchema, updateFixtureTypeSchema } from "@/lib/validation/rig";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { uniqueNameError } from "./unique";

export type FixtureTypeDto = {
  id: number;
  productionId: number;
  name: string;
  family: string;
  coneMinDeg: number;
  coneMaxDeg: number;
  defaultSoftnessDeg: number;
  peakCandela: number;
  wattage: number;
  weightKg: number;
  dmxModes: Array<{ name: string; footprint: number }>;
  lensApertureM: number;
  frameSize: string | null;
  goboSize: string | null;
  lensDropM: number;
  cells: number;
  version: number;
  updatedAt: string;
};

export const toFixtureTypeDto = (t: FixtureType): FixtureTypeDto => ({
  id: t.id,
  productionId: t.productionId,
  name: t.name,
  family: t.family,
  coneMinDeg: t.coneMinDeg,
  coneMaxDeg: t.coneMaxDeg,
  defaultSoftnessDeg: t.defaultSoftnessDeg,
  peakCandela: t.peakCandela,
  wattage: t.wattage,
  weightKg: t.weightKg,
  dmxModes: typeof t.dmxModes === "string" ? JSON.parse(t.dmxModes) : t.dmxModes,
  lensApertureM: t.lensApertureM,
  frameSize: t.frameSize,
  goboSize: t.goboSize,
  lensDropM: t.lensDropM,
  cells: t.cells,
  version: t.version,
  updatedAt: iso(t.updatedAt)!,
});

export async function getFixtureTypesByProduction({ productionId }: { productionId: number }): Promise<FixtureTypeDto[]> {
  const rows = await getDb().FixtureType.findAll({ where: { productionId }, order: [["name", "ASC"]] });
  return rows.map(toFixtureTypeDto);
}

export async function createFixtureType({ productionId, userId, input }: { productionId: number; userId: number; input: z.infer<typeof createFixtureTypeSchema> }) {
  const { sequelize, FixtureType } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await FixtureType.create({ frameSize: null, goboSize: null, ...input, productionId }, { transaction }).catch(uniqueNameError("fixture type"));
    await recordChange({ productionId, userId, entity: "fixtureType", entityId: row.id, action: "create", after: toFixtureTypeDto(row) }, transaction);
    return toFixtureTypeDto(row);
  });
}

/** Fixtures read their type's figures live, so every fixture's computed values follow a change here. */
export async function updateFixtureType({ productionId, fixtureTypeId, userId, patch }: { productionId: number; fixtureTypeId: number; userId: number; patch: z.infer<typeof updateFixtureTypeSchema> }) {
  const { sequelize, FixtureType } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return sequelize.transaction(async (transaction) => {
    const { before, after } = await versionedUpdate({ model: FixtureType, scope: { productionId }, id: fixtureTypeId, version, changes, toDto: toFixtureTypeDto, what: "Fixture type", transaction }).catch(uniqueNameError("fixture type"));
    await recordChange({ productionId, userId, entity: "fixtureType", entityId: fixtureTypeId, action: "update", before: toFixtureTypeDto(before), after: toFixtureTypeDto(after) }, transaction);
    return toFixtureTypeDto(after);
  });
}

export async function deleteFixtureType({ productionId, fixtureTypeId, userId }: { productionId: number; fixtureTypeId: number; userId: number }) {
  const { sequelize, FixtureType, Fixture } = getDb();
  await sequelize.transaction(async (transaction) => {
    const row = await FixtureType.findOne({ where: { productionId, id: fixtureTypeId }, transaction });
    if (!row) throw notFound("Fixture type");
    const inUse = await Fixture.count({ where: { productionId, fixtureTypeId }, transaction });
    if (inUse) throw new AppError("bad_request", `${inUse} fixture${inUse === 1 ? " uses" : "s use"} this type; swap them to another type first.`);
    await row.destroy({ transaction });
    await recordChange({ productionId, userId, entity: "fixtureType", entityId: fixtureTypeId, action: "delete", before: toFixtureTypeDto(row) }, transaction);
  });
}

import "server-only";
import { getDb, type FixtureType } from "@/models";
import { AppError } from "@/lib/errors";
import type { z } from "zod";
import type { createFixtureTypeSchema, updateFixtureTypeSchema } from "@/lib/validation/rig";
import { iso } from "./versioned";
import { productionCrud } from "./production-crud";

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

const fixtureTypes = productionCrud<FixtureType, FixtureTypeDto, z.infer<typeof createFixtureTypeSchema>, z.infer<typeof updateFixtureTypeSchema>>({
  model: () => getDb().FixtureType,
  entity: "fixtureType",
  what: "Fixture type",
  toDto: toFixtureTypeDto,
  order: [["name", "ASC"]],
  prepareCreate: (input) => ({ frameSize: null, goboSize: null, ...input }),
  beforeDelete: async (row, { productionId, transaction }) => {
    const inUse = await getDb().Fixture.count({ where: { productionId, fixtureTypeId: row.id }, transaction });
    if (inUse) throw new AppError("bad_request", `${inUse} fixture${inUse === 1 ? " uses" : "s use"} this type; swap them to another type first.`);
  },
});

export const getFixtureTypesByProduction = fixtureTypes.list;
export const createFixtureType = fixtureTypes.create;
/** Fixtures read their type's figures live, so every fixture's computed values follow a change here. */
export const updateFixtureType = fixtureTypes.update;
export const deleteFixtureType = fixtureTypes.remove;

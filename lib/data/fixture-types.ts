import "server-only";
import { getDb, type FixtureType } from "@/models";
import { AppError } from "@/lib/errors";
import type { z } from "zod";
import type { createFixtureTypeSchema, updateFixtureTypeSchema } from "@/lib/validation/rig";
import type { DmxMode, FixtureTypeDto } from "@/lib/dto/fixture-type";
import { plain } from "./plain";
import { jsonColumn } from "./json-column";
import { productionCrud } from "./production-crud";

const TYPE_KEYS = [
  "id",
  "productionId",
  "name",
  "family",
  "coneMinDeg",
  "coneMaxDeg",
  "defaultSoftnessDeg",
  "peakCandela",
  "peakCandelaNarrow",
  "wattage",
  "weightKg",
  "dmxModes",
  "lensApertureM",
  "frameSize",
  "goboSize",
  "lensDropM",
  "mounting",
  "lensRiseM",
  "bodyWidthM",
  "loadKind",
  "cells",
  "version",
  "updatedAt",
] as const;

export const toFixtureTypeDto = (t: FixtureType): FixtureTypeDto => ({
  ...plain(t, TYPE_KEYS),
  dmxModes: jsonColumn<DmxMode[]>(t.dmxModes),
});

const fixtureTypes = productionCrud<
  FixtureType,
  FixtureTypeDto,
  z.infer<typeof createFixtureTypeSchema>,
  z.infer<typeof updateFixtureTypeSchema>
>({
  model: () => getDb().FixtureType,
  entity: "fixtureType",
  what: "Fixture type",
  toDto: toFixtureTypeDto,
  order: [["name", "ASC"]],
  prepareCreate: (input) => ({ frameSize: null, goboSize: null, ...input }),
  beforeDelete: async (row, { productionId, transaction }) => {
    const inUse = await getDb().Fixture.count({ where: { productionId, fixtureTypeId: row.id }, transaction });
    if (inUse)
      throw new AppError(
        "bad_request",
        `${inUse} fixture${inUse === 1 ? " uses" : "s use"} this type; swap them to another type first.`,
      );
  },
});

export const getFixtureTypesByProduction = fixtureTypes.list;
export const createFixtureType = fixtureTypes.create;
/** Fixtures read their type's figures live, so every fixture's computed values follow a change here. */
export const updateFixtureType = fixtureTypes.update;
export const deleteFixtureType = fixtureTypes.remove;

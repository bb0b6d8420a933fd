import "server-only";
import { getDb, type Position } from "@/models";
import type { z } from "zod";
import type { createPositionSchema, updatePositionSchema } from "@/lib/validation/rig";
import type { PositionDto } from "@/lib/dto/plan";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";
import { recordChange } from "./changes";
import { toFixtureRecord } from "./fixtures";

const POSITION_KEYS = [
  "id",
  "productionId",
  "name",
  "kind",
  "x1",
  "y1",
  "x2",
  "y2",
  "trimHeight",
  "ratedLoadKg",
  "sortOrder",
  "version",
  "updatedAt",
] as const;

export const toPositionDto = (p: Position): PositionDto => plain(p, POSITION_KEYS);

const positions = productionCrud<
  Position,
  PositionDto,
  z.infer<typeof createPositionSchema>,
  z.infer<typeof updatePositionSchema>
>({
  model: () => getDb().Position,
  entity: "position",
  what: "Position",
  toDto: toPositionDto,
  order: [
    ["sortOrder", "ASC"],
    ["name", "ASC"],
  ],
  // A new position goes after the last one unless the caller places it.
  prepareCreate: async (input, { productionId, transaction }) => {
    const last = (await getDb().Position.max("sortOrder", { where: { productionId }, transaction })) as number | null;
    return { x2: null, y2: null, ratedLoadKg: null, ...input, sortOrder: input.sortOrder ?? (last ?? -1) + 1 };
  },
  // Deleting a position takes the fixtures hung on it (the screen confirms with the user first); each
  // unit's own history ends with its removal, as a delete of the unit itself would record it.
  beforeDelete: async (row, { productionId, userId, transaction }) => {
    const { Fixture } = getDb();
    const where = { productionId, positionId: row.id };
    const hung = await Fixture.findAll({ where, order: [["id", "ASC"]], lock: true, transaction });
    for (const f of hung)
      await recordChange(
        { productionId, userId, entity: "fixture", entityId: f.id, action: "delete", before: toFixtureRecord(f) },
        transaction,
      );
    return { fixturesRemoved: await Fixture.destroy({ where, transaction }) };
  },
});

export const getPositionsByProduction = positions.list;
export const createPosition = positions.create;
export const updatePosition = positions.update;
export const deletePosition = positions.remove;

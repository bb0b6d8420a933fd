import "server-only";
import { getDb, type Position } from "@/models";
import type { z } from "zod";
import type { createPositionSchema, updatePositionSchema } from "@/lib/validation/rig";
import { iso } from "./versioned";
import { productionCrud } from "./production-crud";

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

const positions = productionCrud<Position, PositionDto, z.infer<typeof createPositionSchema>, z.infer<typeof updatePositionSchema>>({
  model: () => getDb().Position,
  entity: "position",
  what: "Position",
  toDto: toPositionDto,
  order: [["sortOrder", "ASC"], ["name", "ASC"]],
  // A new position goes after the last one unless the caller places it.
  prepareCreate: async (input, { productionId, transaction }) => {
    const last = (await getDb().Position.max("sortOrder", { where: { productionId }, transaction })) as number | null;
    return { x2: null, y2: null, ratedLoadKg: null, ...input, sortOrder: input.sortOrder ?? (last ?? -1) + 1 };
  },
  // Deleting a position takes the fixtures hung on it (the screen confirms with the user first).
  beforeDelete: async (row, { productionId, transaction }) => ({
    fixturesRemoved: await getDb().Fixture.destroy({ where: { productionId, positionId: row.id }, transaction }),
  }),
});

export const getPositionsByProduction = positions.list;
export const createPosition = positions.create;
export const updatePosition = positions.update;
export const deletePosition = positions.remove;

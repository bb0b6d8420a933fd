import "server-only";
// The shadow study's performers: where each stands, how tall, how wide at the shoulders.
import type { z } from "zod";
import { getDb, type PerformerMark } from "@/models";
import type { createPerformerMarkSchema, updatePerformerMarkSchema } from "@/lib/validation/studies";
import type { PerformerMarkDto } from "@/lib/dto/studies";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";

export const toPerformerMarkDto = (r: PerformerMark): PerformerMarkDto =>
  plain(r, ["id", "productionId", "name", "x", "y", "height", "shoulderWidth", "version", "updatedAt"]);

const rows = productionCrud<
  PerformerMark,
  PerformerMarkDto,
  z.infer<typeof createPerformerMarkSchema>,
  z.infer<typeof updatePerformerMarkSchema>
>({
  model: () => getDb().PerformerMark,
  entity: "performerMark",
  what: "Performer mark",
  toDto: toPerformerMarkDto,
  order: [["name", "ASC"]],
});

export const getPerformerMarksByProduction = rows.list;
export const createPerformerMark = rows.create;
export const updatePerformerMark = rows.update;
export const deletePerformerMark = rows.remove;

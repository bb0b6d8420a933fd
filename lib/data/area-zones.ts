import "server-only";
import type { z } from "zod";
import { getDb, type AreaZone } from "@/models";
import type { createAreaZoneSchema, updateAreaZoneSchema } from "@/lib/validation/plot";
import type { AreaZoneDto } from "@/lib/dto/plan";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";

export const toAreaZoneDto = (z: AreaZone): AreaZoneDto =>
  plain(z, ["id", "productionId", "name", "polygon", "version", "updatedAt"]);

const areaZones = productionCrud<
  AreaZone,
  AreaZoneDto,
  z.infer<typeof createAreaZoneSchema>,
  z.infer<typeof updateAreaZoneSchema>
>({
  model: () => getDb().AreaZone,
  entity: "areaZone",
  what: "Acting area",
  toDto: toAreaZoneDto,
  order: [["name", "ASC"]],
});

export const getAreaZonesByProduction = areaZones.list;
export const createAreaZone = areaZones.create;
export const updateAreaZone = areaZones.update;
export const deleteAreaZone = areaZones.remove;

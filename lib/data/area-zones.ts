import "server-only";
import type { z } from "zod";
import { getDb, type AreaZone } from "@/models";
import type { createAreaZoneSchema, updateAreaZoneSchema } from "@/lib/validation/plot";
import { iso } from "./versioned";
import { productionCrud } from "./production-crud";

/** A named acting area drawn on the plan as a polygon; the coverage study reads it. */
export type AreaZoneDto = { id: number; productionId: number; name: string; polygon: Array<{ x: number; y: number }>; version: number; updatedAt: string };

export const toAreaZoneDto = (z: AreaZone): AreaZoneDto => ({
  id: z.id,
  productionId: z.productionId,
  name: z.name,
  polygon: z.polygon,
  version: z.version,
  updatedAt: iso(z.updatedAt)!,
});

const areaZones = productionCrud<AreaZone, AreaZoneDto, z.infer<typeof createAreaZoneSchema>, z.infer<typeof updateAreaZoneSchema>>({
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

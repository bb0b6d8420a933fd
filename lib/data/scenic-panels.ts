import "server-only";
// The shadow study's scenery: flat panels standing on a plan segment.
import type { z } from "zod";
import { getDb, type ScenicPanel } from "@/models";
import type { createScenicPanelSchema, updateScenicPanelSchema } from "@/lib/validation/studies";
import type { ScenicPanelDto } from "@/lib/dto/studies";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";

export const toScenicPanelDto = (r: ScenicPanel): ScenicPanelDto =>
  plain(r, ["id", "productionId", "name", "x1", "y1", "x2", "y2", "height", "version", "updatedAt"]);

const rows = productionCrud<
  ScenicPanel,
  ScenicPanelDto,
  z.infer<typeof createScenicPanelSchema>,
  z.infer<typeof updateScenicPanelSchema>
>({
  model: () => getDb().ScenicPanel,
  entity: "scenicPanel",
  what: "Scenery panel",
  toDto: toScenicPanelDto,
  order: [["name", "ASC"]],
});

export const getScenicPanelsByProduction = rows.list;
export const createScenicPanel = rows.create;
export const updateScenicPanel = rows.update;
export const deleteScenicPanel = rows.remove;

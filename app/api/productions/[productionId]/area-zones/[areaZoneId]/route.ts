import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteAreaZone, updateAreaZone } from "@/lib/data/area-zones";
import { updateAreaZoneSchema } from "@/lib/validation/plot";

export const { PATCH, DELETE } = itemRoutes({
  key: "areaZone",
  what: "Acting area",
  update: { permission: "plot.edit", schema: updateAreaZoneSchema, run: updateAreaZone },
  remove: { permission: "plot.edit", run: deleteAreaZone },
});

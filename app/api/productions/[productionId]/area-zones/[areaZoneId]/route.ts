import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteAreaZone, updateAreaZone } from "@/lib/data/area-zones";
import { updateAreaZoneSchema } from "@/lib/validation/plot";

export const { PATCH, DELETE } = itemRoutes({
  param: "areaZoneId", what: "Acting area", key: "areaZone",
  update: { permission: "plot.edit", schema: updateAreaZoneSchema, run: updateAreaZone },
  remove: { permission: "plot.edit", run: deleteAreaZone },
});

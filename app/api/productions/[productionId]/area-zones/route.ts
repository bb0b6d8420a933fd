import { collectionRoutes } from "@/lib/http/crud-routes";
import { createAreaZone, getAreaZonesByProduction } from "@/lib/data/area-zones";
import { createAreaZoneSchema } from "@/lib/validation/plot";

export const { GET, POST } = collectionRoutes({
  key: "areaZones",
  itemKey: "areaZone",
  list: getAreaZonesByProduction,
  create: { permission: "plot.edit", schema: createAreaZoneSchema, run: createAreaZone },
});

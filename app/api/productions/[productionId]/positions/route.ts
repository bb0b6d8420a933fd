import { collectionRoutes } from "@/lib/http/crud-routes";
import { createPosition, getPositionsByProduction } from "@/lib/data/positions";
import { createPositionSchema } from "@/lib/validation/rig";

export const { GET, POST } = collectionRoutes({
  key: "positions",
  itemKey: "position",
  list: getPositionsByProduction,
  create: { permission: "plot.edit", schema: createPositionSchema, run: createPosition },
});

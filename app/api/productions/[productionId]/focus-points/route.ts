import { collectionRoutes } from "@/lib/http/crud-routes";
import { createFocusPoint, getFocusPointsByProduction } from "@/lib/data/focus-points";
import { createFocusPointSchema } from "@/lib/validation/rig";

export const { GET, POST } = collectionRoutes({
  key: "focusPoints",
  itemKey: "focusPoint",
  list: getFocusPointsByProduction,
  create: { permission: "plot.edit", schema: createFocusPointSchema, run: createFocusPoint },
});

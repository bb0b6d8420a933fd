import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteFocusPoint, updateFocusPoint } from "@/lib/data/focus-points";
import { updateFocusPointSchema } from "@/lib/validation/rig";

export const { PATCH, DELETE } = itemRoutes({
  key: "focusPoint",
  update: { permission: "plot.edit", schema: updateFocusPointSchema, run: updateFocusPoint },
  remove: { permission: "plot.edit", run: deleteFocusPoint },
});

import { itemRoutes } from "@/lib/http/crud-routes";
import { deletePosition, updatePosition } from "@/lib/data/positions";
import { updatePositionSchema } from "@/lib/validation/rig";

export const { PATCH, DELETE } = itemRoutes({
  key: "position",
  update: { permission: "plot.edit", schema: updatePositionSchema, run: updatePosition },
  remove: { permission: "plot.edit", run: deletePosition },
});

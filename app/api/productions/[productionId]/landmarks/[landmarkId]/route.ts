import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteLandmark, updateLandmark } from "@/lib/data/landmarks";
import { updateLandmarkSchema } from "@/lib/validation/plot";

export const { PATCH, DELETE } = itemRoutes({
  key: "landmark",
  update: { permission: "plot.edit", schema: updateLandmarkSchema, run: updateLandmark },
  remove: { permission: "plot.edit", run: deleteLandmark },
});

import { collectionRoutes } from "@/lib/http/crud-routes";
import { createLandmark, getLandmarksByProduction } from "@/lib/data/landmarks";
import { createLandmarkSchema } from "@/lib/validation/plot";

export const { GET, POST } = collectionRoutes({
  key: "landmarks",
  itemKey: "landmark",
  list: getLandmarksByProduction,
  create: { permission: "plot.edit", schema: createLandmarkSchema, run: createLandmark },
});

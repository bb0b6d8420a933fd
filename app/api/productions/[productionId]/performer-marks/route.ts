import { collectionRoutes } from "@/lib/http/crud-routes";
import { createPerformerMark, getPerformerMarksByProduction } from "@/lib/data/performer-marks";
import { createPerformerMarkSchema } from "@/lib/validation/studies";

export const { GET, POST } = collectionRoutes({
  key: "performerMarks",
  itemKey: "performerMark",
  list: getPerformerMarksByProduction,
  create: { permission: "studies.run", schema: createPerformerMarkSchema, run: createPerformerMark },
});

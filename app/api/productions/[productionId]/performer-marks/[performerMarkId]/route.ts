import { itemRoutes } from "@/lib/http/crud-routes";
import { deletePerformerMark, updatePerformerMark } from "@/lib/data/performer-marks";
import { updatePerformerMarkSchema } from "@/lib/validation/studies";

export const { PATCH, DELETE } = itemRoutes({
  key: "performerMark",
  update: { permission: "studies.run", schema: updatePerformerMarkSchema, run: updatePerformerMark },
  remove: { permission: "studies.run", run: deletePerformerMark },
});

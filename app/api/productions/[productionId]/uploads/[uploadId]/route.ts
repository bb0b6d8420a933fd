import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteUpload, updateUpload } from "@/lib/data/uploads";
import { updateUploadSchema } from "@/lib/validation/plot";

/** Calibration of an underlay (scale, offset, rotation, opacity, lock), and its removal. */
export const { PATCH, DELETE } = itemRoutes({
  key: "upload",
  update: { permission: "plot.edit", schema: updateUploadSchema, run: updateUpload },
  remove: { permission: "plot.edit", run: deleteUpload },
});

import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteDataLine, updateDataLine } from "@/lib/data/data-lines";
import { updateDataLineSchema } from "@/lib/validation/checks";

export const { PATCH, DELETE } = itemRoutes({
  key: "dataLine",
  update: { permission: "rig.editElectrics", schema: updateDataLineSchema, run: updateDataLine },
  remove: { permission: "rig.editElectrics", run: deleteDataLine },
});

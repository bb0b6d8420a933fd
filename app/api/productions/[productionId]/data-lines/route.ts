import { collectionRoutes } from "@/lib/http/crud-routes";
import { createDataLine, getDataLinesByProduction } from "@/lib/data/data-lines";
import { createDataLineSchema } from "@/lib/validation/checks";

export const { GET, POST } = collectionRoutes({
  key: "dataLines",
  itemKey: "dataLine",
  list: getDataLinesByProduction,
  create: { permission: "rig.editElectrics", schema: createDataLineSchema, run: createDataLine },
});

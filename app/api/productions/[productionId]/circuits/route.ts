import { collectionRoutes } from "@/lib/http/crud-routes";
import { createCircuit, getCircuitsByProduction } from "@/lib/data/circuits";
import { createCircuitSchema } from "@/lib/validation/checks";

export const { GET, POST } = collectionRoutes({
  key: "circuits",
  itemKey: "circuit",
  list: getCircuitsByProduction,
  create: { permission: "rig.editElectrics", schema: createCircuitSchema, run: createCircuit },
});

import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteCircuit, updateCircuit } from "@/lib/data/circuits";
import { updateCircuitSchema } from "@/lib/validation/checks";

export const { PATCH, DELETE } = itemRoutes({
  key: "circuit",
  update: { permission: "rig.editElectrics", schema: updateCircuitSchema, run: updateCircuit },
  remove: { permission: "rig.editElectrics", run: deleteCircuit },
});

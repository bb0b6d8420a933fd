import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteAccessory, updateAccessory } from "@/lib/data/accessories";
import { accessoryPatchSchema } from "@/lib/validation/accessory";

/** Accessories are electrics: the designer and the electrician may change them. */
export const { PATCH, DELETE } = itemRoutes({
  key: "accessory",
  update: { permission: "rig.editElectrics", schema: accessoryPatchSchema, run: updateAccessory },
  remove: { permission: "rig.editElectrics", run: deleteAccessory },
});

import { collectionRoutes } from "@/lib/http/crud-routes";
import { createAccessory, getAccessoriesByProduction } from "@/lib/data/accessories";
import { accessoryCreateSchema } from "@/lib/validation/accessory";

/** Accessories are electrics: the designer and the electrician may add them. */
export const { GET, POST } = collectionRoutes({
  key: "accessories",
  itemKey: "accessory",
  list: getAccessoriesByProduction,
  create: { permission: "rig.editElectrics", schema: accessoryCreateSchema, run: createAccessory },
});

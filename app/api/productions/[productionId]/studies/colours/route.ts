import { collectionRoutes } from "@/lib/http/crud-routes";
import { createColourTransmission, getColourTransmissionsByProduction } from "@/lib/data/colour-transmissions";
import { createColourTransmissionSchema } from "@/lib/validation/studies";

export const { GET, POST } = collectionRoutes({
  key: "colours",
  itemKey: "colour",
  list: getColourTransmissionsByProduction,
  create: { permission: "studies.run", schema: createColourTransmissionSchema, run: createColourTransmission },
});

import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteColourTransmission, updateColourTransmission } from "@/lib/data/colour-transmissions";
import { updateColourTransmissionSchema } from "@/lib/validation/studies";

export const { PATCH, DELETE } = itemRoutes({
  key: "colour",
  update: { permission: "studies.run", schema: updateColourTransmissionSchema, run: updateColourTransmission },
  remove: { permission: "studies.run", run: deleteColourTransmission },
});

import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteScenicPanel, updateScenicPanel } from "@/lib/data/scenic-panels";
import { updateScenicPanelSchema } from "@/lib/validation/studies";

export const { PATCH, DELETE } = itemRoutes({
  what: "Scenery panel",
  key: "scenicPanel",
  update: { permission: "studies.run", schema: updateScenicPanelSchema, run: updateScenicPanel },
  remove: { permission: "studies.run", run: deleteScenicPanel },
});

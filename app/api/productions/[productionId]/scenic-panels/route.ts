import { collectionRoutes } from "@/lib/http/crud-routes";
import { createScenicPanel, getScenicPanelsByProduction } from "@/lib/data/scenic-panels";
import { createScenicPanelSchema } from "@/lib/validation/studies";

export const { GET, POST } = collectionRoutes({
  key: "scenicPanels",
  itemKey: "scenicPanel",
  list: getScenicPanelsByProduction,
  create: { permission: "studies.run", schema: createScenicPanelSchema, run: createScenicPanel },
});

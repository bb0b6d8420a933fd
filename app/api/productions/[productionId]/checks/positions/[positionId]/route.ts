import { itemRoutes } from "@/lib/http/crud-routes";
import { updateLiftLines } from "@/lib/data/checks";
import { updateLiftLinesSchema } from "@/lib/validation/checks";

/** A flown pipe's lift lines, for the rigging check (the position's other fields belong to the plot). */
export const { PATCH } = itemRoutes({
  key: "position",
  update: {
    permission: "studies.run",
    schema: updateLiftLinesSchema,
    run: ({ productionId, id, userId, patch }) => updateLiftLines({ productionId, positionId: id, userId, patch }),
  },
});

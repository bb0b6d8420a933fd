import { itemRoutes } from "@/lib/http/crud-routes";
import { deleteFixtureType, updateFixtureType } from "@/lib/data/fixture-types";
import { updateFixtureTypeSchema } from "@/lib/validation/rig";

/** Electrical figures (wattage, weight, DMX modes) are the electrician's; the rest the designer's. */
export const { PATCH, DELETE } = itemRoutes({
  key: "fixtureType",
  update: { fields: "fixtureType", schema: updateFixtureTypeSchema, run: updateFixtureType },
  remove: { permission: "plot.edit", run: deleteFixtureType },
});

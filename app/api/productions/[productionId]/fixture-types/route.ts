import { collectionRoutes } from "@/lib/http/crud-routes";
import { createFixtureType, getFixtureTypesByProduction } from "@/lib/data/fixture-types";
import { createFixtureTypeSchema } from "@/lib/validation/rig";

export const { GET, POST } = collectionRoutes({
  key: "fixtureTypes",
  itemKey: "fixtureType",
  list: getFixtureTypesByProduction,
  create: { permission: "plot.edit", schema: createFixtureTypeSchema, run: createFixtureType },
});

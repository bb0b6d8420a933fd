// The API's fixture schemas, assembled from the field registry (lib/rig/fixture-fields.ts), which gives
// each field its check; who may change which field is decided by lib/auth/policy.ts.
import { z } from "zod";
import {
  FIXTURE_FIELDS,
  REQUIRED_ON_CREATE,
  type FixtureFieldsShape,
  type RequiredAttribute,
} from "@/lib/rig/fixture-fields";
import { versionSchema } from "./common";

export { shutterCutSchema } from "./fixture-values";

const shape = Object.fromEntries(
  FIXTURE_FIELDS.flatMap((f) => ("schema" in f ? [[f.attribute, f.schema]] : [])),
) as unknown as FixtureFieldsShape;

/** Every field a client may set on a fixture. */
export const fixtureFieldsSchema = z.object(shape);

export const fixturePatchSchema = fixtureFieldsSchema.partial().extend({ version: versionSchema }).strict();
export type FixturePatch = z.infer<typeof fixturePatchSchema>;

// The registry's fields without a default, as the literal keys zod's `required` wants.
const requiredOnCreate = Object.fromEntries(REQUIRED_ON_CREATE.map((a) => [a, true])) as Record<
  RequiredAttribute,
  true
>;

export const fixtureCreateSchema = fixtureFieldsSchema.partial().required(requiredOnCreate).strict();
export type FixtureCreate = z.infer<typeof fixtureCreateSchema>;

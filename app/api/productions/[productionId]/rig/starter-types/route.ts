import { z } from "zod";
import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { AppError } from "@/lib/errors";
import { addFixtureTypes } from "@/lib/data/type-copies";
import { STARTER_TYPES } from "@/lib/rig/starter-types";

type Ctx = { params: Promise<{ productionId: string }> };

const body = z
  .object({
    /** Which starter types to add; leave it out for the whole shelf. */
    names: z
      .array(z.string().max(80), { error: "names must be a list of starter type names" })
      .min(1, { error: "Choose at least one starter type" })
      .max(STARTER_TYPES.length)
      .optional(),
  })
  .strict();

/** The generic starter shelf (typical figures from memory, no brands). */
export const GET = route(async (_req, { params }: Ctx) => {
  await requireMember((await params).productionId);
  return {
    starterTypes: STARTER_TYPES,
    note: "Typical figures from memory for each class of unit, not a manufacturer's data; replace them with your own units' figures.",
  };
});

/** Adds starter types in one go; names the production already has are skipped, not doubled. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const { names } = await readJson(req, body);
  const unknown = (names ?? []).filter((n) => !STARTER_TYPES.some((t) => t.name === n));
  if (unknown.length)
    throw new AppError("bad_request", `No starter type called ${unknown.join(", ")}.`, {
      fieldErrors: { names: ["unknown starter type"] },
    });
  const chosen = names ? STARTER_TYPES.filter((s) => names.includes(s.name)) : STARTER_TYPES;
  const { added, skipped } = await addFixtureTypes({ productionId, userId: user.id, types: chosen });
  return Response.json({ fixtureTypes: added, skipped }, { status: added.length ? 201 : 200 });
});

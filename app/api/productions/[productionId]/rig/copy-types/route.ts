import { z } from "zod";
import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { AppError } from "@/lib/errors";
import { getProductionsByUser } from "@/lib/data/productions";
import { getFixtureTypesByProduction } from "@/lib/data/fixture-types";
import { addFixtureTypes, typeInputOf } from "@/lib/data/type-copies";

type Ctx = { params: Promise<{ productionId: string }> };

const body = z
  .object({
    fromProductionId: z
      .number({ error: "fromProductionId: choose the production to copy from" })
      .int({ error: "fromProductionId: choose the production to copy from" })
      .positive({ error: "fromProductionId: choose the production to copy from" }),
    /** Which of its types; leave it out for all of them. */
    names: z
      .array(z.string().max(80), { error: "names must be a list of type names" })
      .min(1, { error: "Choose at least one type" })
      .max(500)
      .optional(),
  })
  .strict();

/** The designer's other productions and their fixture types, to copy from. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const others = (await getProductionsByUser({ userId: user.id })).filter((p) => p.id !== productionId);
  const sources = [];
  // One production at a time: a list of a person's productions is short, and no transaction is open.
  for (const p of others) {
    const types = await getFixtureTypesByProduction({ productionId: p.id });
    if (types.length)
      sources.push({
        productionId: p.id,
        name: p.name,
        archived: p.archivedAt != null,
        types: types.map((t) => ({
          name: t.name,
          family: t.family,
          coneMinDeg: t.coneMinDeg,
          coneMaxDeg: t.coneMaxDeg,
        })),
      });
  }
  return { sources };
});

/** Copies types (their figures) from another production the caller is a member of; names already here are skipped. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const { fromProductionId, names } = await readJson(req, body);
  if (fromProductionId === productionId)
    throw new AppError("bad_request", "Choose another production to copy from; these types are already here.", {
      fieldErrors: { fromProductionId: ["is this production"] },
    });
  // Reading the source needs membership of it too: an outsider learns nothing of it (404).
  await requireMember(fromProductionId);
  const source = await getFixtureTypesByProduction({ productionId: fromProductionId });
  const wanted = names ? new Set(names.map((n) => n.trim().toLowerCase())) : null;
  const picked = wanted ? source.filter((t) => wanted.has(t.name.trim().toLowerCase())) : source;
  if (names) {
    const found = new Set(picked.map((t) => t.name.trim().toLowerCase()));
    const missing = names.filter((n) => !found.has(n.trim().toLowerCase()));
    if (missing.length)
      throw new AppError("bad_request", `That production has no type called ${missing.join(", ")}.`, {
        fieldErrors: { names: ["not a type of that production"] },
      });
  }
  if (!picked.length)
    throw new AppError("bad_request", "That production has no fixture types to copy.", {
      fieldErrors: { fromProductionId: ["has no fixture types"] },
    });
  const { added, skipped } = await addFixtureTypes({
    productionId,
    userId: user.id,
    types: picked.map(typeInputOf),
  });
  return Response.json({ fixtureTypes: added, skipped }, { status: added.length ? 201 : 200 });
});

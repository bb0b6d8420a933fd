import { z } from "zod";
import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { AppError } from "@/lib/errors";
import { createFixtureType, getFixtureTypesByProduction } from "@/lib/data/fixture-types";
import { STARTER_TYPES } from "@/lib/rig/starter-types";

type Ctx = { params: Promise<{ productionId: string }> };

const body = z
  .object({
    names: z.array(z.string().max(80)).min(1, { error: "Choose at least one starter type" }).max(STARTER_TYPES.length),
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

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const { names } = await readJson(req, body);
  const unknown = names.filter((n) => !STARTER_TYPES.some((t) => t.name === n));
  if (unknown.length)
    throw new AppError("bad_request", `No starter type called ${unknown.join(", ")}.`, {
      fieldErrors: { names: ["unknown starter type"] },
    });
  const taken = new Set((await getFixtureTypesByProduction({ productionId })).map((t) => t.name.toLowerCase()));
  const clash = names.filter((n) => taken.has(n.toLowerCase()));
  if (clash.length)
    throw new AppError("bad_request", `This production already has ${clash.join(", ")}.`, {
      fieldErrors: { names: ["already in this production"] },
    });
  const created = [];
  for (const t of STARTER_TYPES.filter((s) => names.includes(s.name)))
    created.push(await createFixtureType({ productionId, userId: user.id, input: t }));
  return Response.json({ fixtureTypes: created }, { status: 201 });
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { createFixtureType, getFixtureTypesByProduction } from "@/lib/data/fixture-types";
import { createFixtureTypeSchema } from "@/lib/validation/rig";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { fixtureTypes: await getFixtureTypesByProduction({ productionId }) };
});

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const input = await readJson(req, createFixtureTypeSchema);
  return Response.json({ fixtureType: await createFixtureType({ productionId, userId: user.id, input }) }, { status: 201 });
});

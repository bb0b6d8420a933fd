import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { createPosition, getPositionsByProduction } from "@/lib/data/positions";
import { createPositionSchema } from "@/lib/validation/rig";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { positions: await getPositionsByProduction({ productionId }) };
});

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const input = await readJson(req, createPositionSchema);
  return Response.json({ position: await createPosition({ productionId, userId: user.id, input }) }, { status: 201 });
});

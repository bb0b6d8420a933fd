import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { createFocusPoint, getFocusPointsByProduction } from "@/lib/data/focus-points";
import { createFocusPointSchema } from "@/lib/validation/rig";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { focusPoints: await getFocusPointsByProduction({ productionId }) };
});

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const input = await readJson(req, createFocusPointSchema);
  return Response.json({ focusPoint: await createFocusPoint({ productionId, userId: user.id, input }) }, { status: 201 });
});

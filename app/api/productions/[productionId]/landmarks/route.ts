import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { createLandmark, getLandmarksByProduction } from "@/lib/data/landmarks";
import { createLandmarkSchema } from "@/lib/validation/plot";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { landmarks: await getLandmarksByProduction({ productionId }) };
});

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const input = await readJson(req, createLandmarkSchema);
  return Response.json({ landmark: await createLandmark({ productionId, userId: user.id, input }) }, { status: 201 });
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { createAreaZone, getAreaZonesByProduction } from "@/lib/data/area-zones";
import { createAreaZoneSchema } from "@/lib/validation/plot";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { areaZones: await getAreaZonesByProduction({ productionId }) };
});

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const input = await readJson(req, createAreaZoneSchema);
  return Response.json({ areaZone: await createAreaZone({ productionId, userId: user.id, input }) }, { status: 201 });
});

import { route, readJson, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { deleteAreaZone, updateAreaZone } from "@/lib/data/area-zones";
import { updateAreaZoneSchema } from "@/lib/validation/plot";

type Ctx = { params: Promise<{ productionId: string; areaZoneId: string }> };

export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  const patch = await readJson(req, updateAreaZoneSchema);
  return { areaZone: await updateAreaZone({ productionId, id: parseId(p.areaZoneId, "Acting area"), userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  await deleteAreaZone({ productionId, id: parseId(p.areaZoneId, "Acting area"), userId: user.id });
  return { ok: true };
});

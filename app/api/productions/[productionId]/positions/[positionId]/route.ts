import { route, readJson, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { deletePosition, updatePosition } from "@/lib/data/positions";
import { updatePositionSchema } from "@/lib/validation/rig";

type Ctx = { params: Promise<{ productionId: string; positionId: string }> };

export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  const patch = await readJson(req, updatePositionSchema);
  return { position: await updatePosition({ productionId, id: parseId(p.positionId, "Position"), userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  await deletePosition({ productionId, id: parseId(p.positionId, "Position"), userId: user.id });
  return { ok: true };
});

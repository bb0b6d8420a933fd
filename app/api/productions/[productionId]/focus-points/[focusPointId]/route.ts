import { route, readJson, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { deleteFocusPoint, updateFocusPoint } from "@/lib/data/focus-points";
import { updateFocusPointSchema } from "@/lib/validation/rig";

type Ctx = { params: Promise<{ productionId: string; focusPointId: string }> };

export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  const patch = await readJson(req, updateFocusPointSchema);
  return { focusPoint: await updateFocusPoint({ productionId, id: parseId(p.focusPointId, "Focus point"), userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  await deleteFocusPoint({ productionId, id: parseId(p.focusPointId, "Focus point"), userId: user.id });
  return { ok: true };
});

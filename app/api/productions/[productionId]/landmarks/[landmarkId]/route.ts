import { route, readJson, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { deleteLandmark, updateLandmark } from "@/lib/data/landmarks";
import { updateLandmarkSchema } from "@/lib/validation/plot";

type Ctx = { params: Promise<{ productionId: string; landmarkId: string }> };

export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  const patch = await readJson(req, updateLandmarkSchema);
  return { landmark: await updateLandmark({ productionId, id: parseId(p.landmarkId, "Landmark"), userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  await deleteLandmark({ productionId, id: parseId(p.landmarkId, "Landmark"), userId: user.id });
  return { ok: true };
});

import { route, readJson, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { deleteUpload, updateUpload } from "@/lib/data/uploads";
import { updateUploadSchema } from "@/lib/validation/plot";

type Ctx = { params: Promise<{ productionId: string; uploadId: string }> };

/** Calibration of an underlay: scale, offset, rotation, opacity, lock. */
export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  const patch = await readJson(req, updateUploadSchema);
  return { upload: await updateUpload({ productionId, uploadId: parseId(p.uploadId, "Upload"), userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "plot.edit");
  await deleteUpload({ productionId, uploadId: parseId(p.uploadId, "Upload"), userId: user.id });
  return { ok: true };
});

import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { readUploadForm } from "@/lib/http/upload-form";
import { createUnderlay, getUploadsByProduction } from "@/lib/data/uploads";
import { MAX_UPLOAD_BYTES } from "@/lib/storage";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { uploads: await getUploadsByProduction({ productionId, kind: "underlay" }) };
});

/** A groundplan underlay as multipart form data: field `file`. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "plot.edit");
  const { file } = await readUploadForm(req, { maxBytes: MAX_UPLOAD_BYTES, what: "image", choose: "Choose an image file to upload." });
  const bytes = new Uint8Array(await file.arrayBuffer());
  return Response.json({ upload: await createUnderlay({ productionId, userId: user.id, fileName: file.name, bytes }) }, { status: 201 });
});

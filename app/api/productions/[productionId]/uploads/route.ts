import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { AppError } from "@/lib/errors";
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
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > MAX_UPLOAD_BYTES + 64 * 1024) {
    throw new AppError("too_large", `The file is larger than the ${MAX_UPLOAD_BYTES / 1048576} MB limit.`, { fieldErrors: { file: ["too large"] } });
  }
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new AppError("bad_request", "Send the image as multipart form data with a field named file.", { fieldErrors: { file: ["missing"] } });
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("bad_request", "Choose an image file to upload.", { fieldErrors: { file: ["missing"] } });
  const bytes = new Uint8Array(await file.arrayBuffer());
  return Response.json({ upload: await createUnderlay({ productionId, userId: user.id, fileName: file.name, bytes }) }, { status: 201 });
});

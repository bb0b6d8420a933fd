import { route, parseId } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { readUploadFile } from "@/lib/data/uploads";

type Ctx = { params: Promise<{ productionId: string; uploadId: string }> };

/** The stored image, for members only; the type is the sniffed one, never sniffed again by the browser. */
export const GET = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId } = await requireMember(p.productionId);
  const { bytes, contentType } = await readUploadFile({ productionId, uploadId: parseId(p.uploadId, "Upload") });
  return new Response(Buffer.from(bytes), {
    headers: {
      "content-type": contentType,
      "x-content-type-options": "nosniff",
      "cache-control": "private, max-age=3600",
      "content-disposition": "inline",
    },
  });
});

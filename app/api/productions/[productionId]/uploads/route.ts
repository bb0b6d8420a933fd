import { collectionRoutes } from "@/lib/http/crud-routes";
import { readUploadForm } from "@/lib/http/upload-form";
import { createUnderlay, getUploadsByProduction } from "@/lib/data/uploads";
import { MAX_UPLOAD_BYTES } from "@/lib/storage";

/** A groundplan underlay arrives as multipart form data with the image in the field `file`. */
async function readUnderlay(req: Request) {
  const { file } = await readUploadForm(req, {
    maxBytes: MAX_UPLOAD_BYTES,
    what: "image",
    choose: "Choose an image file to upload.",
  });
  return { fileName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) };
}

export const { GET, POST } = collectionRoutes({
  key: "uploads",
  itemKey: "upload",
  list: ({ productionId }) => getUploadsByProduction({ productionId, kind: "underlay" }),
  create: {
    permission: "plot.edit",
    read: readUnderlay,
    run: ({ input, ...who }) => createUnderlay({ ...who, ...input }),
  },
});

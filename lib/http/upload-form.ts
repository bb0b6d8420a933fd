import "server-only";
import { AppError } from "@/lib/errors";
import { BodyTooLarge, readBoundedBody } from "@/lib/io/bounded-body";

// The multipart wrapper (boundaries, part headers, small text fields) adds a little to the file itself.
const WRAPPER_BYTES = 256 * 1024;

/**
 * Reads a multipart upload with one file in the field `file`, refusing anything over `maxBytes` before
 * or while it arrives (a body without Content-Length, or one that understates it, is cut off at the
 * cap rather than read to the end). `what` names the thing in messages: "photo", "file", "image".
 */
export async function readUploadForm(
  req: Request,
  opts: { maxBytes: number; what: string; choose: string },
): Promise<{ form: FormData; file: File }> {
  const limitMb = opts.maxBytes / 1048576;
  const tooLarge = (detail?: string) =>
    new AppError(
      "too_large",
      `${detail ?? `The ${opts.what} is larger than the ${limitMb} MB limit.`} Nothing was saved.`,
      { fieldErrors: { file: ["over the size limit"] } },
    );
  const cap = opts.maxBytes + WRAPPER_BYTES;
  if (Number(req.headers.get("content-length") ?? 0) > cap) throw tooLarge();
  let form: FormData;
  try {
    const body = await readBoundedBody(req, cap);
    form = await new Response(body as BlobPart, {
      headers: { "content-type": req.headers.get("content-type") ?? "" },
    }).formData();
  } catch (err) {
    if (err instanceof BodyTooLarge) throw tooLarge();
    throw new AppError("bad_request", `Send the ${opts.what} as a multipart form with a field called file.`, {
      fieldErrors: { file: ["no file received"] },
    });
  }
  const file = form.get("file");
  if (!(file instanceof File))
    throw new AppError("bad_request", opts.choose, { fieldErrors: { file: ["no file received"] } });
  if (file.size > opts.maxBytes)
    throw tooLarge(
      `${file.name || `The ${opts.what}`} is ${(file.size / 1048576).toFixed(1)} MB; the limit is ${limitMb} MB.`,
    );
  return { form, file };
}

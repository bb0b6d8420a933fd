import "server-only";
// Uploaded pictures are decoded, never trusted: sharp (libvips) reads the header, with a pixel limit so a
// file that claims 60000 × 60000 pixels is refused before any memory is spent on it, and a file is only
// kept once it has decoded in full (a cut-short PNG reads its header fine and fails here) and been written
// again, so what is stored and served is sharp's output, not the bytes that arrived.
import sharp from "sharp";
import { AppError } from "@/lib/errors";

export type ImageType = "image/png" | "image/jpeg" | "image/webp";
const TYPES: Record<string, ImageType> = { png: "image/png", jpeg: "image/jpeg", webp: "image/webp" };

/** Decoding limit: a 50-megapixel camera or a large groundplan scan fits; a "decompression bomb" does not. */
export const MAX_INPUT_PIXELS = 64_000_000;

/** `failOn: "error"` refuses damaged data (a cut-short file) instead of decoding what is there. */
export const decoder = (bytes: Uint8Array) => sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" });

const refuse = (code: "unsupported" | "bad_request", message: string, field: string) =>
  new AppError(code, message, { fieldErrors: { file: [field] } });

/** The picture's type and size from its header, or an AppError naming what is wrong ("photo", "image"). */
export async function readImageHeader(
  bytes: Uint8Array,
  noun: string,
): Promise<{ type: ImageType; width: number; height: number }> {
  const meta = await decoder(bytes)
    .metadata()
    .catch((err: unknown) => {
      throw refusal(err, noun);
    });
  const type = meta.format ? TYPES[meta.format] : undefined;
  if (!type || !meta.width || !meta.height) {
    throw refuse(
      "unsupported",
      `That file is not a PNG, JPEG or WebP ${noun} (checked by its content, not its name). Nothing was saved.`,
      "not a PNG, JPEG or WebP image",
    );
  }
  return { type, width: meta.width, height: meta.height };
}

/** sharp's failure in a user's words: too many pixels, or a file that is not a whole image. */
export function refusal(err: unknown, noun: string): AppError {
  if (/pixel limit/i.test((err as Error).message)) {
    return refuse(
      "bad_request",
      `The ${noun} has more pixels than Throwline accepts (over ${MAX_INPUT_PIXELS / 1e6} megapixels). Make it smaller and try again. Nothing was saved.`,
      "too many pixels",
    );
  }
  // libvips names the loader it tried ("svgload_buffer: bad dimensions"): another format's loader means the
  // file is not one of ours, whatever state it is in.
  const loader = /\b([a-z]+)load/i.exec((err as Error).message)?.[1]?.toLowerCase();
  if (
    /unsupported image format/i.test((err as Error).message) ||
    (loader && !["png", "jpeg", "webp"].includes(loader))
  ) {
    return refuse(
      "unsupported",
      `That file is not a PNG, JPEG or WebP ${noun} (checked by its content, not its name). Nothing was saved.`,
      "not a PNG, JPEG or WebP image",
    );
  }
  return refuse(
    "bad_request",
    `The ${noun} could not be read; the file may be damaged or cut short. Save or export it again. Nothing was saved.`,
    "could not be read as an image",
  );
}

export type DecodedImage = { bytes: Buffer; type: ImageType; width: number; height: number };

/**
 * An underlay as it will be stored: decoded in full, turned upright from a camera's orientation tag, its
 * metadata dropped, and written again in its own format (PNG stays lossless for line drawings).
 */
export async function reencodeUnderlay(bytes: Uint8Array): Promise<DecodedImage> {
  const { type } = await readImageHeader(bytes, "image");
  try {
    const upright = decoder(bytes).rotate();
    const out =
      type === "image/png"
        ? upright.png()
        : type === "image/webp"
          ? upright.webp({ quality: 90 })
          : upright.jpeg({ quality: 90 });
    const { data, info } = await out.toBuffer({ resolveWithObject: true });
    return { bytes: data, type, width: info.width, height: info.height };
  } catch (err) {
    throw refusal(err, "image");
  }
}

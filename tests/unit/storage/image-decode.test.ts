// Uploaded pictures through sharp: the header gives type and size under a pixel limit; only a picture that
// decodes in full is kept, as sharp writes it again.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import { readImageHeader, reencodeUnderlay } from "@/lib/storage/image-decode";
import { makePng, pngClaiming } from "../../support/png";

async function refusedWith(p: Promise<unknown>): Promise<AppError> {
  const err = await p.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

describe("reading an uploaded picture's header", () => {
  it("names the type from the content and reads the size", async () => {
    // PNG specification (ISO/IEC 15948): IHDR width and height; the test PNG is 300 × 200
    expect(await readImageHeader(makePng(300, 200), "image")).toEqual({ type: "image/png", width: 300, height: 200 });
    const jpeg = await sharp(makePng(64, 48)).jpeg().toBuffer();
    expect(await readImageHeader(jpeg, "photo")).toEqual({ type: "image/jpeg", width: 64, height: 48 });
  });

  it("refuses what is not a PNG, JPEG or WebP (415), naming the kind of picture", async () => {
    const svgs = [
      "<svg xmlns='http://www.w3.org/2000/svg' width='9' height='9'/>",
      "<svg xmlns='http://www.w3.org/2000/svg'></svg>",
    ];
    for (const bytes of [
      ...svgs.map((t) => new TextEncoder().encode(t)),
      new TextEncoder().encode("just text"),
      await sharp(makePng(8, 8)).gif().toBuffer(),
    ]) {
      const err = await refusedWith(readImageHeader(bytes, "photo"));
      expect(err.status).toBe(415);
      expect(err.message).toMatch(/not a PNG, JPEG or WebP photo/);
    }
  });

  it("refuses a header claiming 60000 × 60000 pixels without decoding it (400)", async () => {
    const err = await refusedWith(readImageHeader(pngClaiming(60000, 60000), "image"));
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/more pixels than Throwline accepts \(over 64 megapixels\)/);
    expect(err.details.fieldErrors).toEqual({ file: ["too many pixels"] });
  });
});

describe("re-encoding an underlay", () => {
  it("keeps a PNG lossless and reports the decoded size", async () => {
    const png = makePng(90, 40);
    const out = await reencodeUnderlay(png);
    expect(out).toMatchObject({ type: "image/png", width: 90, height: 40 });
    expect((await sharp(out.bytes).raw().toBuffer()).equals(await sharp(png).raw().toBuffer())).toBe(true);
  });

  it("turns a camera picture upright from its orientation tag", async () => {
    // EXIF orientation 6: the stored pixels are rotated 90° clockwise to display (CIPA DC-008)
    const tagged = await sharp(makePng(60, 20)).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    expect(await reencodeUnderlay(tagged)).toMatchObject({ type: "image/jpeg", width: 20, height: 60 });
  });

  it("calls a PNG whose header is cut short damaged, not some other format (400)", async () => {
    const err = await refusedWith(readImageHeader(makePng(50, 50).subarray(0, 40), "photo"));
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/photo could not be read/);
  });

  it("refuses a PNG cut short: the header reads, the pixels do not (400)", async () => {
    const whole = makePng(200, 150, 7);
    const cut = whole.subarray(0, Math.floor(whole.length * 0.6));
    expect(await readImageHeader(cut, "image")).toMatchObject({ width: 200, height: 150 });
    const err = await refusedWith(reencodeUnderlay(cut));
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/could not be read; the file may be damaged or cut short/);
  });
});

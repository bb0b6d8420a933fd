// Underlays are decoded by sharp, not trusted: a cut-short PNG and one whose header claims 60000 × 60000
// pixels are refused with a clear message and nothing stored; a good one is stored as sharp writes it again.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { type ApiSession, BASE_URL, freshUser } from "./support/api";
import { makePng, pngClaiming } from "../support/png";

async function ownProduction() {
  const { session } = await freshUser("underlay");
  const id = (await session.post("/api/productions", { name: "Underlay decoding" })).json.production.id as number;
  return { s: session, id };
}

async function upload(s: ApiSession, id: number, bytes: Uint8Array, name: string) {
  const form = new FormData();
  form.set("file", new Blob([bytes as unknown as ArrayBuffer], { type: "image/png" }), name);
  const res = await fetch(`${BASE_URL}/api/productions/${id}/uploads`, {
    method: "POST",
    body: form,
    headers: { cookie: s.cookie },
  });
  return { status: res.status, json: await res.json() };
}

const uploadsOf = async (s: ApiSession, id: number) =>
  (await s.get(`/api/productions/${id}/uploads`)).json.uploads as unknown[];

describe("underlay images are decoded before they are kept", () => {
  it("stores a good PNG as sharp re-encodes it: same pixels, sizes from the decoded image", async () => {
    const { s, id } = await ownProduction();
    const png = makePng(120, 80);
    const up = await upload(s, id, png, "plan.png");
    expect(up.status).toBe(201);
    const u = up.json.upload;
    const file = await fetch(`${BASE_URL}${u.url}`, { headers: { cookie: s.cookie } });
    expect(file.headers.get("content-type")).toBe("image/png");
    const stored = Buffer.from(await file.arrayBuffer());
    // The stored bytes are sharp's own output for this input, not the bytes that arrived.
    expect(stored.equals(await sharp(png).rotate().png().toBuffer())).toBe(true);
    expect(u).toMatchObject({ contentType: "image/png", widthPx: 120, heightPx: 80, sizeBytes: stored.length });
    // PNG is lossless: the re-encoded copy has exactly the uploaded pixels.
    const [a, b] = await Promise.all([sharp(png).raw().toBuffer(), sharp(stored).raw().toBuffer()]);
    expect(b.equals(a)).toBe(true);
  });

  it("refuses a PNG cut short (its header reads fine, its pixels do not) and stores nothing", async () => {
    const { s, id } = await ownProduction();
    const whole = makePng(200, 150, 7);
    const r = await upload(s, id, whole.subarray(0, Math.floor(whole.length * 0.6)), "cut.png");
    expect(r.status).toBe(400);
    expect(r.json.error.message).toMatch(/could not be read; the file may be damaged or cut short/);
    expect(r.json.error.fieldErrors.file).toEqual(["could not be read as an image"]);
    expect(await uploadsOf(s, id)).toHaveLength(0);
  });

  it("refuses a PNG whose header claims 60000 × 60000 pixels before decoding it, and stores nothing", async () => {
    const { s, id } = await ownProduction();
    const r = await upload(s, id, pngClaiming(60000, 60000), "bomb.png");
    expect(r.status).toBe(400);
    expect(r.json.error.message).toMatch(/more pixels than Throwline accepts \(over 64 megapixels\)/);
    expect(r.json.error.fieldErrors.file).toEqual(["too many pixels"]);
    expect(await uploadsOf(s, id)).toHaveLength(0);
  });
});

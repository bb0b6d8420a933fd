// The electrician on a tablet takes a focus photo of a unit during the focus call, sees it on the chart and
// in the print view, records the barn doors, and removes the photo again. Screenshots in both themes.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { eventually, textOf } from "./support/wait";
import { setTheme } from "./support/theme";

let electrician: SignedIn;
beforeAll(async () => {
  electrician = await signedIn("electrician", { width: 800, height: 1280 }); // a 10-inch tablet in portrait
});
afterAll(async () => {
  await electrician?.close();
});

/** A camera-sized JPEG (3000 × 2250, about 3–4 MB): 10-pixel blocks of colour over a little noise. */
async function cameraJpeg(): Promise<Buffer> {
  const w = 3000,
    h = 2250;
  const raw = Buffer.alloc(w * h * 3);
  let seed = 7;
  const next = () => (seed = (seed * 1103515245 + 12345) & 0x7fffffff) >> 16;
  const blocks = Array.from({ length: (w / 10) * (h / 10) * 3 }, () => next() % 200);
  for (let i = 0; i < raw.length; i++) {
    const px = Math.floor(i / 3);
    raw[i] =
      blocks[(Math.floor(Math.floor(px / w) / 10) * (w / 10) + Math.floor((px % w) / 10)) * 3 + (i % 3)] +
      (next() % 30);
  }
  return sharp(raw, { raw: { width: w, height: h, channels: 3 } })
    .jpeg({ quality: 90 })
    .toBuffer();
}

/** A stand-in for a phone photo of a focused pool: a warm ellipse on a dark deck, drawn as SVG and turned into a PNG. */
async function deckPhoto(): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="640" height="480">
    <rect width="640" height="480" fill="#2b2622"/><rect y="330" width="640" height="150" fill="#1c1916"/>
    <ellipse cx="330" cy="250" rx="190" ry="120" fill="#f2c46b" opacity="0.85"/>
    <ellipse cx="330" cy="250" rx="130" ry="80" fill="#fff1c9"/>
    <line x1="0" y1="330" x2="640" y2="330" stroke="#8a7d6a" stroke-width="4" stroke-dasharray="24 12"/></svg>`;
  return sharp(Buffer.from(svg)).png().toBuffer();
}

describe("focus photo from the deck", () => {
  it("the electrician adds a photo on a tablet, sees the thumbnail on the chart and in print, and removes it", async () => {
    const { page, productionId } = electrician;
    const fixtures = (await (await page.context().request.get(`/api/productions/${productionId}/fixtures`)).json())
      .fixtures as Array<{
      id: number;
      positionId: number;
      positionName: string;
      unitNumber: string;
      focusPhotoUploadId: number | null;
    }>;
    const unit = fixtures.find((f) => f.positionName === "Boom SL 2" && f.unitNumber === "1")!;
    await page.goto(`/productions/${productionId}/focus/call?position=${unit.positionId}&unit=${unit.id}`);
    await page.getByTestId("focus-photo").waitFor();
    if (unit.focusPhotoUploadId != null) {
      // Left over from an earlier run on a kept database: start without a photo.
      await page.getByTestId("focus-photo-remove").click();
      await page.getByTestId("focus-photo-remove-confirm").click();
      await page.getByText("Add photo").waitFor();
    }

    // A non-image file is refused with a message and nothing changes.
    await page
      .getByTestId("focus-photo-input")
      .setInputFiles({ name: "notes.jpg", mimeType: "image/jpeg", buffer: Buffer.from("not a photo at all") });
    await textOf(page.getByTestId("focus-photo").getByRole("alert")).toMatch(/not a PNG, JPEG or WebP photo/);
    expect(await page.getByTestId("focus-photo-preview").count()).toBe(0);

    await page
      .getByTestId("focus-photo-input")
      .setInputFiles({ name: "IMG_2231.png", mimeType: "image/png", buffer: await deckPhoto() });
    await eventually(() => page.getByTestId("focus-photo").getByRole("status").textContent()).toBe("Photo saved.");
    const preview = page.getByTestId("focus-photo-preview");
    await preview.waitFor();
    // The thumbnail actually loaded (a broken image has a natural width of 0): 320 px wide, the small copy.
    await eventually(() => preview.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    const onChart = page.getByTestId("focus-chart").getByTestId("focus-photo-thumb");
    await eventually(() => onChart.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);

    // A camera-sized photo is shrunk in the browser before it is sent over the venue's wifi.
    const big = await cameraJpeg();
    // Note the size of the file the page hands to fetch (the request's own body is not visible to the test).
    await page.evaluate(() => {
      const w = window as unknown as { fetch: typeof fetch; sentPhotoBytes?: number };
      const original = w.fetch.bind(w);
      w.fetch = (input, init) => {
        if (init?.body instanceof FormData) w.sentPhotoBytes = (init.body.get("file") as File).size;
        return original(input, init);
      };
    });
    await page
      .getByTestId("focus-photo-input")
      .setInputFiles({ name: "IMG_2232.jpg", mimeType: "image/jpeg", buffer: big });
    await eventually(() => page.getByTestId("focus-photo").getByRole("status").textContent(), { timeout: 30_000 }).toBe(
      "Photo replaced.",
    ); // shrunk in the browser first
    const sent = await page.evaluate(() => (window as unknown as { sentPhotoBytes?: number }).sentPhotoBytes ?? 0);
    expect(big.byteLength).toBeGreaterThan(2 * 1024 * 1024);
    expect(sent).toBeGreaterThan(0);
    expect(sent).toBeLessThan(big.byteLength * 0.7);
    await eventually(() => preview.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    // Back to the picture of the pool for the screenshots.
    const bigSrc = await preview.getAttribute("src");
    const replaced = page.waitForResponse(
      (r) => r.url().includes(`/fixtures/${unit.id}/photo`) && r.request().method() === "POST",
    );
    await page
      .getByTestId("focus-photo-input")
      .setInputFiles({ name: "IMG_2231.png", mimeType: "image/png", buffer: await deckPhoto() });
    expect((await replaced).status()).toBe(201);
    // The screen shows the new photo (its address names the new upload) before anything else is edited.
    await eventually(() => preview.getAttribute("src")).not.toBe(bigSrc);
    await eventually(() => preview.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);

    // Barn doors as focused, leaf by leaf; the chart words them.
    await page.getByTestId("barn-door-top").fill("in halfway");
    await page.getByTestId("barn-door-left").fill("to the leg");
    await page.getByRole("button", { name: "Save barn doors" }).click();
    await eventually(() => page.getByTestId("focus-chart").locator('[data-key="barnDoors"] dd').textContent()).toBe(
      "top in halfway · left to the leg",
    );
    // The gobo's rotation is the designer's: the electrician reads it, with no field to change it.
    expect(await page.getByTestId("gobo-rotation").count()).toBe(0);
    await screenshot(page, "focus-photo-tablet-light");
    await setTheme(page, true);
    await screenshot(page, "focus-photo-tablet-dark");
    await setTheme(page, false);

    // The print view of the position carries the same thumbnail.
    await page.goto(`/productions/${productionId}/focus/print?position=${unit.positionId}&perPage=4&paper=A4&tz=UTC`);
    const printed = page.getByTestId("focus-sheet").getByTestId("focus-photo-thumb");
    await eventually(() => printed.count()).toBe(1);
    await eventually(() => printed.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    await screenshot(page, "focus-photo-print-view");

    // Remove it again (two taps), back on the focus call.
    await page.goto(`/productions/${productionId}/focus/call?position=${unit.positionId}&unit=${unit.id}`);
    await page.getByTestId("focus-photo-remove").click();
    await page.getByTestId("focus-photo-remove-confirm").click();
    await textOf(page.getByTestId("focus-photo").getByRole("status")).toBe("Photo removed.");
    await eventually(() => page.getByTestId("focus-photo-preview").count()).toBe(0);
    await eventually(() => page.getByTestId("focus-chart").getByTestId("focus-photo-thumb").count()).toBe(0);
  });
});

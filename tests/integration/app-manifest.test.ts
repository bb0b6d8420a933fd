// The home-screen pieces a tablet on deck needs, fetched from the running app without signing in: the web
// app manifest, its icons and /favicon.ico. The fields checked are those the W3C Web Application Manifest
// defines for installing (name, icons, start_url, display, theme_color).
import { describe, expect, it } from "vitest";
import { BASE_URL } from "./support/api";

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]; // PNG (ISO/IEC 15948) file signature

/** Width and height from a PNG's IHDR chunk (bytes 16–23, big-endian; ISO/IEC 15948). */
function pngSize(b: Buffer): [number, number] {
  return [b.readUInt32BE(16), b.readUInt32BE(20)];
}

describe("web app manifest and icons", () => {
  it("serves a manifest with name, start URL, standalone display, the dark theme colour and icons", async () => {
    const r = await fetch(`${BASE_URL}/manifest.webmanifest`);
    expect(r.status).toBe(200);
    expect(r.headers.get("content-type")).toMatch(/manifest\+json|application\/json/);
    const m = await r.json();
    expect(m).toMatchObject({
      name: "Throwline",
      start_url: "/focus",
      display: "standalone",
      theme_color: "#161412",
    });
    const sizes = m.icons.map((i: { sizes: string }) => i.sizes);
    expect(sizes).toEqual(expect.arrayContaining(["192x192", "512x512"]));
    expect(m.icons.some((i: { purpose?: string }) => i.purpose === "maskable")).toBe(true);
  });

  it("serves every icon the manifest names, at the size it claims", async () => {
    const m = await (await fetch(`${BASE_URL}/manifest.webmanifest`)).json();
    for (const icon of m.icons as Array<{ src: string; sizes: string; type: string }>) {
      const r = await fetch(`${BASE_URL}${icon.src}`);
      expect(r.status, icon.src).toBe(200);
      const body = Buffer.from(await r.arrayBuffer());
      if (icon.type === "image/png") {
        expect([...body.subarray(0, 8)]).toEqual(PNG_SIGNATURE);
        expect(pngSize(body).join("x")).toBe(icon.sizes);
      } else {
        expect(body.toString("utf8")).toMatch(/^<svg /);
      }
    }
  });

  it("has /favicon.ico: an ICO container (reserved 0, type 1) holding PNG images", async () => {
    const r = await fetch(`${BASE_URL}/favicon.ico`);
    expect(r.status).toBe(200);
    const b = Buffer.from(await r.arrayBuffer());
    expect([b.readUInt16LE(0), b.readUInt16LE(2)]).toEqual([0, 1]); // ICONDIR header (Microsoft ICO format)
    const count = b.readUInt16LE(4);
    expect(count).toBeGreaterThanOrEqual(1);
    const offset = b.readUInt32LE(6 + 12); // first entry's image offset
    expect([...b.subarray(offset, offset + 8)]).toEqual(PNG_SIGNATURE);
  });

  it("links the manifest and the icons from every page", async () => {
    const html = await (await fetch(`${BASE_URL}/sign-in`)).text();
    expect(html).toMatch(/<link rel="manifest" href="\/manifest.webmanifest"/);
    expect(html).toMatch(/<link rel="apple-touch-icon" href="\/icons\/apple-touch-icon.png"/);
    const themes = [...html.matchAll(/<meta name="theme-color"[^>]*>/g)].map((m) => m[0]);
    expect(
      themes.some((t) => t.includes('content="#161412"') && t.includes('media="(prefers-color-scheme: dark)"')),
    ).toBe(true);
  });
});

// Draws Throwline's icon set from public/icons/throwline.svg: PNGs for the web app manifest and home screens,
// a maskable icon with the mark inside the safe zone, and /favicon.ico (PNG images in an ICO container, which
// every current browser reads). Run by hand after changing the SVG: `node scripts/make-icons.mjs`. The outputs
// are committed, so neither install nor build needs sharp or anything from the network.
import { readFile, writeFile } from "node:fs/promises";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");
const icons = path.join(root, "public", "icons");
const { default: sharp } = await import("sharp");
const svg = await readFile(path.join(icons, "throwline.svg"));

const png = (size, input = svg) =>
  sharp(input, { density: 384 }).resize(size, size).png({ compressionLevel: 9 }).toBuffer();

for (const size of [192, 512]) await writeFile(path.join(icons, `icon-${size}.png`), await png(size));
await writeFile(path.join(icons, "apple-touch-icon.png"), await png(180));

// Maskable: the launcher may crop to a circle of 80 % of the width, so the mark sits at 70 % on a full ground.
const inner = await png(358);
const maskable = await sharp({ create: { width: 512, height: 512, channels: 4, background: "#161412" } })
  .composite([{ input: inner, top: 77, left: 77 }])
  .png({ compressionLevel: 9 })
  .toBuffer();
await writeFile(path.join(icons, "maskable-512.png"), maskable);

// ICO container: 6-byte header, a 16-byte entry per image, then the PNG data (sizes 16, 32, 48).
const sizes = [16, 32, 48];
const images = await Promise.all(sizes.map((s) => png(s)));
const header = Buffer.alloc(6 + 16 * sizes.length);
header.writeUInt16LE(0, 0);
header.writeUInt16LE(1, 2);
header.writeUInt16LE(sizes.length, 4);
let offset = header.length;
sizes.forEach((s, i) => {
  const e = 6 + 16 * i;
  header.writeUInt8(s, e);
  header.writeUInt8(s, e + 1);
  header.writeUInt8(0, e + 2);
  header.writeUInt8(0, e + 3);
  header.writeUInt16LE(1, e + 4);
  header.writeUInt16LE(32, e + 6);
  header.writeUInt32LE(images[i].length, e + 8);
  header.writeUInt32LE(offset, e + 12);
  offset += images[i].length;
});
await writeFile(path.join(root, "public", "favicon.ico"), Buffer.concat([header, ...images]));
console.log("icons written to public/icons and public/favicon.ico");

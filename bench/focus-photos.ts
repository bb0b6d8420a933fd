// Benchmark for focus photos: what a deck photo costs on upload (checking, turning upright and
// shrinking a 12-megapixel camera JPEG with sharp) and what the photos add to the focus-chart PDF (the
// same chart model → sheets → Chromium path as the PDF route, with and without a small copy on every chart).
// Run with `npm run bench:focus-photos [charts]` (default 100 charts; the machine is shared, so say the load).
import os from "node:os";
import { performance } from "node:perf_hooks";
import sharp from "sharp";
import { preparePhoto } from "../lib/data/focus-photos";
import { buildFocusChart, type FocusChart } from "../lib/focus/chart-model";
import { outlineLandmarks } from "../lib/focus/landmarks";
import { paginate } from "../lib/focus/pages";
import { focusSheetsMarkup } from "../lib/pdf/focus-sheets-markup";
import { renderPdf } from "../lib/pdf/focus-pdf";
import { closeBrowser } from "../lib/pdf/browser";
import { makeFixture, PRODUCTION } from "../tests/unit/focus/fixture-builder";

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/**
 * A 4000 × 3000 JPEG of random 10-pixel blocks over fine noise: detail at every scale, so both the kept copy
 * and the 320-pixel chart copy compress worse than a real photo of a pool on a deck (an upper bound).
 */
async function cameraJpeg(): Promise<Buffer> {
  const w = 4000,
    h = 3000;
  const raw = Buffer.alloc(w * h * 3);
  let seed = 42;
  const next = () => (seed = (seed * 1103515245 + 12345) & 0x7fffffff) >> 16; // a fixed LCG: the same picture every run
  const blocks = Array.from({ length: (w / 10) * (h / 10) * 3 }, () => next() % 200);
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      for (let c = 0; c < 3; c++)
        raw[(y * w + x) * 3 + c] = blocks[(Math.floor(y / 10) * (w / 10) + Math.floor(x / 10)) * 3 + c] + (next() % 40);
    }
  }
  return sharp(raw, { raw: { width: w, height: h, channels: 3 } })
    .jpeg({ quality: 90 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

async function pdfOf(charts: FocusChart[]) {
  const landmarks = outlineLandmarks(PRODUCTION);
  const sheets = paginate(charts, 4, { newPagePerPosition: false });
  const t = performance.now();
  const pdf = await renderPdf({
    title: "bench",
    paper: "A4",
    footerText: "bench",
    sheets: focusSheetsMarkup(sheets, {
      productionName: "Bench",
      printedAt: "now",
      perPage: 4,
      units: "metric",
      landmarks,
    }),
  });
  return { ms: performance.now() - t, bytes: pdf.byteLength, pages: sheets.length };
}

async function main() {
  const n = Number(process.argv[2] ?? 100);
  const photo = await cameraJpeg();
  const times: number[] = [];
  let prepared = await preparePhoto(photo);
  for (let i = 0; i < 5; i++) {
    const t = performance.now();
    prepared = await preparePhoto(photo);
    times.push(performance.now() - t);
  }
  // Every chart gets its own picture (Chromium writes an identical image into a PDF once): the camera
  // photo's chart copy, tinted per chart, which keeps its size and detail.
  const thumbs = await Promise.all(
    Array.from({ length: n }, (_, i) =>
      sharp(prepared.thumb)
        .tint({ r: 120 + ((i * 37) % 136), g: 120 + ((i * 53) % 136), b: 120 + ((i * 71) % 136) })
        .jpeg({ quality: 70 })
        .toBuffer(),
    ),
  );
  const thumbKb = thumbs.reduce((a, t) => a + t.byteLength, 0) / n / 1024;

  const charts = Array.from({ length: n }, (_, i) =>
    buildFocusChart(
      makeFixture({
        id: i + 1,
        unitNumber: String((i % 20) + 1),
        positionId: 1 + Math.floor(i / 20),
        positionName: `Pipe ${1 + Math.floor(i / 20)}`,
        channel: i + 1,
        focusPhotoUploadId: i + 1,
      }),
      PRODUCTION,
    ),
  );
  const withPhotos = charts.map((c, i) => ({
    ...c,
    photo: { ...c.photo!, thumbSrc: `data:image/jpeg;base64,${thumbs[i].toString("base64")}`, href: "" },
  }));
  const without = charts.map((c) => ({ ...c, photo: null }));
  await pdfOf(without.slice(0, 4)); // start the browser outside the timings
  // Alternated, best of two each, so neither variant gains from running second on a busy machine.
  const runs = { plain: [] as Awaited<ReturnType<typeof pdfOf>>[], photos: [] as Awaited<ReturnType<typeof pdfOf>>[] };
  for (let k = 0; k < 2; k++) {
    runs.plain.push(await pdfOf(without));
    runs.photos.push(await pdfOf(withPhotos));
  }
  const best = (xs: Awaited<ReturnType<typeof pdfOf>>[]) => xs.reduce((a, b) => (b.ms < a.ms ? b : a));
  const plain = best(runs.plain);
  const photos = best(runs.photos);
  await closeBrowser();

  console.log(
    `focus photos — ${new Date().toISOString()}, load ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")}, ${os.cpus().length} cores`,
  );
  console.log(`| measure | value |\n|---|---|`);
  console.log(`| camera JPEG in | ${(photo.byteLength / 1048576).toFixed(1)} MB, 4000 × 3000, EXIF orientation 6 |`);
  console.log(`| check + upright + shrink (median of 5) | ${median(times).toFixed(0)} ms |`);
  console.log(
    `| kept copy / chart copy | ${prepared.width} × ${prepared.height}, ${(prepared.full.byteLength / 1024).toFixed(0)} KB / ${(prepared.thumb.byteLength / 1024).toFixed(1)} KB |`,
  );
  console.log(
    `| PDF, ${n} charts at 4 a page, no photos | ${(plain.ms / 1000).toFixed(1)} s, ${plain.pages} pages, ${(plain.bytes / 1048576).toFixed(2)} MB |`,
  );
  console.log(
    `| PDF, ${n} charts at 4 a page, a photo on every chart | ${(photos.ms / 1000).toFixed(1)} s, ${(photos.bytes / 1048576).toFixed(2)} MB (${((photos.ms / plain.ms - 1) * 100).toFixed(0)} % time; ${thumbKb.toFixed(1)} KB a picture) |`,
  );
  console.log(
    `| PDF runs (s), plain / photos | ${runs.plain.map((r) => (r.ms / 1000).toFixed(1)).join(", ")} / ${runs.photos.map((r) => (r.ms / 1000).toFixed(1)).join(", ")} |`,
  );
}

main().catch(async (err) => {
  console.error(err);
  await closeBrowser().catch(() => undefined);
  process.exit(1);
});

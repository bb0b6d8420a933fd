// Benchmark for focus-chart PDFs (issue 6): N charts at 4 a page through the same code as the PDF route
// (chart model → sheets → Debian's headless Chromium → page.pdf). Reports wall time, pages, PDF size, and
// the peak resident memory of Node and of the browser's process tree (sampled from /proc every 100 ms).
// Run with `npm run bench:focus` (it runs tsx with the react-server condition so 'server-only' loads).
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import { performance } from "node:perf_hooks";
import { computeFixtureGeometry } from "../lib/rig/fixture-geometry";
import { buildFocusChart, type ChartProduction } from "../lib/focus/chart-model";
import { outlineLandmarks } from "../lib/focus/landmarks";
import { paginate } from "../lib/focus/pages";
import { sheetParts } from "../lib/focus/sheets-html";
import { renderPdf } from "../lib/pdf/focus-pdf";
import { closeBrowser } from "../lib/pdf/browser";
import type { FixtureDto } from "../lib/data/fixtures";

const PRODUCTION: ChartProduction = { name: "Bench Production", displayUnits: "metric", datumName: "setting line", headHeight: 1.7, prosceniumWidth: 10, apronDepth: 1.5, backWallY: 9.5, stageWidth: 16 };

/** A rig of n units over positions of 20, FOH and overhead, aimed on a 3 × 3 grid, some with cuts. */
function rig(n: number): FixtureDto[] {
  return Array.from({ length: n }, (_, i) => {
    const pos = Math.floor(i / 20);
    const foh = pos % 3 === 0;
    const lens = { x: -7 + (i % 20) * 0.7, y: foh ? -8 : 1 + (pos % 4) * 2.5, z: foh ? 8 : 7 };
    const mark = { x: -3 + (i % 3) * 3, y: 1.5 + (Math.floor(i / 3) % 3) * 2.5 };
    const record = {
      id: i + 1, productionId: 1, positionId: pos + 1, fixtureTypeId: 1, focusPointId: null, unitNumber: String((i % 20) + 1), bodyKey: null, cell: null,
      channel: i + 1, universe: 1 + Math.floor(i / 512), address: (i % 512) + 1, dmxMode: null, footprint: 1, circuit: `C${i + 1}`, dimmer: null,
      colour: "L201", gobo: i % 7 === 0 ? "breakup" : null, purpose: foh ? "front light" : "top light", x: lens.x, y: lens.y, lensHeight: lens.z,
      focusX: mark.x, focusY: mark.y, aim: (i % 2 ? "deck" : "head") as "deck" | "head", coneDeg: 26, softnessDeg: 3,
      shutterCuts: i % 4 === 0 ? [{ label: "top" as const, a: { x: -6, y: -1.5 }, b: { x: 6, y: -1.5 } }] : null, irisPercent: null,
      notes: i % 5 === 0 ? "Keep off the set edge." : null, focusNotes: null, focusPhotoUploadId: null, goboRotationDeg: i % 7 === 0 ? 45 : null,
      barnDoorTop: null, barnDoorBottom: null, barnDoorLeft: null, barnDoorRight: null, hung: true, focused: i % 3 === 0,
      focusedAt: i % 3 === 0 ? "2026-12-02T10:00:00.000Z" : null, focusedBy: i % 3 === 0 ? 1 : null, version: 1, updatedAt: "2026-12-02T10:00:00.000Z",
    };
    const computed = computeFixtureGeometry({ ...record, focusPoint: null, position: { trimHeight: 8 }, type: { coneMinDeg: 19, coneMaxDeg: 50, defaultSoftnessDeg: 2, lensDropM: 0.4 } }, 1.7);
    return { ...record, positionName: foh ? `FOH ${pos + 1}` : `Electric ${pos + 1}`, typeName: "Profile 26°", family: "profile", focusPointName: null, computed };
  });
}

/** Proportional resident memory (Pss) of every descendant of this process (the browser's tree), in bytes. */
function childTreeRss(): number {
  const parents = new Map<number, number>();
  for (const d of readdirSync("/proc")) {
    if (!/^\d+$/.test(d)) continue;
    try {
      const stat = readFileSync(`/proc/${d}/stat`, "utf8");
      parents.set(Number(d), Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]));
    } catch { /* process ended */ }
  }
  let total = 0;
  for (const [pid] of parents) {
    let p = parents.get(pid);
    while (p && p !== process.pid && p > 1) p = parents.get(p);
    if (p !== process.pid) continue;
    try {
      // Pss shares each shared page among the processes mapping it, so the tree's total is not overcounted.
      const m = readFileSync(`/proc/${pid}/smaps_rollup`, "utf8").match(/Pss:\s+(\d+) kB/);
      total += m ? Number(m[1]) * 1024 : 0;
    } catch { /* gone */ }
  }
  return total;
}

const MiB = 1024 * 1024;

async function run(n: number) {
  let browserPeak = 0;
  let nodePeak = 0;
  const timer = setInterval(() => {
    browserPeak = Math.max(browserPeak, childTreeRss());
    nodePeak = Math.max(nodePeak, process.memoryUsage().rss);
  }, 100);
  const t0 = performance.now();
  const landmarks = outlineLandmarks(PRODUCTION);
  const charts = rig(n).map((f) => buildFocusChart(f, PRODUCTION, { landmarks, userNames: { 1: "Bench Electrician" }, timeZone: "UTC" }));
  const sheets = paginate(charts, 4, { newPagePerPosition: true });
  const parts = sheetParts(sheets, { productionName: PRODUCTION.name, printedAt: "bench", perPage: 4, units: "metric", landmarks });
  const htmlLength = parts.reduce((n, p) => n + p.length, 0);
  const t1 = performance.now();
  const pdf = await renderPdf({ title: "bench", sheets: parts, paper: "A4", footerText: "bench" });
  const t2 = performance.now();
  clearInterval(timer);
  nodePeak = Math.max(nodePeak, process.memoryUsage().rss);
  if (process.env.BENCH_PDF_OUT) writeFileSync(process.env.BENCH_PDF_OUT, pdf);
  const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page(?!s)/g) ?? []).length;
  console.log(
    `${String(n).padStart(5)} charts: ${((t2 - t0) / 1000).toFixed(1)} s total (model + HTML ${((t1 - t0) / 1000).toFixed(2)} s, ` +
      `Chromium ${((t2 - t1) / 1000).toFixed(1)} s), ${pages} pages (expected ${sheets.length}), ${(pdf.length / MiB).toFixed(1)} MiB PDF, ` +
      `HTML ${(htmlLength / MiB).toFixed(1)} MiB, peak RSS Node ${(nodePeak / MiB).toFixed(0)} MiB, browser tree ${(browserPeak / MiB).toFixed(0)} MiB (Pss)`,
  );
}

async function main() {
  console.log(`Focus-chart PDF at 4 a page, A4 — ${os.cpus().length} cores, Node ${process.version}, ${new Date().toISOString().slice(0, 10)}`);
  const sizes = process.argv.slice(2).map(Number).filter((x) => x > 0);
  for (const n of sizes.length ? sizes : [100, 500, 1500]) await run(n);
  await closeBrowser();
}

void main();

// Benchmark for focus-chart PDFs: N charts at 4 a page through the same code as the PDF route
// (chart model → sheets → Debian's headless Chromium → page.pdf). Reports wall time, pages, PDF size, the
// peak resident memory of Node and of the browser's process tree, and the CPU seconds both spent (sampled
// from /proc every 300 ms; CPU time varies far less than wall time on a shared machine).
// Run with `npm run bench:focus [sizes…]` (production React; bench/support/server-only-off.cjs lets 'server-only' load);
// BENCH_PDF_OUT=/tmp/focus-{n}.pdf keeps each PDF.
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import { performance } from "node:perf_hooks";
import { computeFixtureGeometry } from "../lib/rig/fixture-geometry";
import { buildFocusChart, type ChartProduction } from "../lib/focus/chart-model";
import { outlineLandmarks } from "../lib/focus/landmarks";
import { paginate } from "../lib/focus/pages";
import { focusSheetsMarkup } from "../lib/pdf/focus-sheets-markup";
import { PART_SHEETS, renderPdf } from "../lib/pdf/focus-pdf";
import { closeBrowser } from "../lib/pdf/browser";
import type { FixtureDto } from "../lib/dto/fixture";

const PRODUCTION: ChartProduction = {
  name: "Bench Production",
  displayUnits: "metric",
  datumName: "setting line",
  headHeight: 1.7,
  prosceniumWidth: 10,
  apronDepth: 1.5,
  backWallY: 9.5,
  stageWidth: 16,
};

/** A rig of n units over positions of 20, FOH and overhead, aimed on a 3 × 3 grid, some with cuts. */
function rig(n: number): FixtureDto[] {
  return Array.from({ length: n }, (_, i) => {
    const pos = Math.floor(i / 20);
    const foh = pos % 3 === 0;
    const lens = { x: -7 + (i % 20) * 0.7, y: foh ? -8 : 1 + (pos % 4) * 2.5, z: foh ? 8 : 7 };
    const mark = { x: -3 + (i % 3) * 3, y: 1.5 + (Math.floor(i / 3) % 3) * 2.5 };
    const record = {
      id: i + 1,
      productionId: 1,
      positionId: pos + 1,
      fixtureTypeId: 1,
      focusPointId: null,
      unitNumber: String((i % 20) + 1),
      bodyKey: null,
      cell: null,
      channel: i + 1,
      universe: 1 + Math.floor(i / 512),
      address: (i % 512) + 1,
      dmxMode: null,
      footprint: 1,
      circuit: `C${i + 1}`,
      dimmer: null,
      colour: "pale blue",
      gobo: i % 7 === 0 ? "breakup" : null,
      purpose: foh ? "front light" : "top light",
      x: lens.x,
      y: lens.y,
      lensHeight: lens.z,
      focusX: mark.x,
      focusY: mark.y,
      aim: (i % 2 ? "deck" : "head") as "deck" | "head",
      coneDeg: 26,
      softnessDeg: 3,
      shutterCuts: i % 4 === 0 ? [{ label: "top" as const, a: { x: -6, y: -1.5 }, b: { x: 6, y: -1.5 } }] : null,
      irisPercent: null,
      notes: i % 5 === 0 ? "Keep off the set edge." : null,
      focusNotes: null,
      focusPhotoUploadId: null,
      goboRotationDeg: i % 7 === 0 ? 45 : null,
      barnDoorTop: null,
      barnDoorBottom: null,
      barnDoorLeft: null,
      barnDoorRight: null,
      hung: true,
      focused: i % 3 === 0,
      focusedAt: i % 3 === 0 ? "2026-12-02T10:00:00.000Z" : null,
      focusedBy: i % 3 === 0 ? 1 : null,
      version: 1,
      updatedAt: "2026-12-02T10:00:00.000Z",
    };
    const computed = computeFixtureGeometry(
      {
        ...record,
        focusPoint: null,
        position: { trimHeight: 8 },
        type: { coneMinDeg: 19, coneMaxDeg: 50, defaultSoftnessDeg: 2, lensDropM: 0.4 },
      },
      1.7,
    );
    return {
      ...record,
      positionName: foh ? `FOH ${pos + 1}` : `Electric ${pos + 1}`,
      typeName: "Profile 26°",
      family: "profile",
      focusPointName: null,
      computed,
    };
  });
}

/** Chromium's processes only: tsx keeps an esbuild service among this process's children too. */
function isBrowser(pid: number): boolean {
  try {
    return readFileSync(`/proc/${pid}/cmdline`, "utf8").includes("chromium");
  } catch {
    return false;
  }
}

/** The browser's processes among this process's descendants, found by walking /proc's parent links. */
function descendants(): number[] {
  const parents = new Map<number, number>();
  for (const d of readdirSync("/proc")) {
    if (!/^\d+$/.test(d)) continue;
    try {
      const stat = readFileSync(`/proc/${d}/stat`, "utf8");
      parents.set(Number(d), Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]));
    } catch {
      /* process ended */
    }
  }
  return [...parents.keys()].filter((pid) => {
    let p = parents.get(pid);
    while (p && p !== process.pid && p > 1) p = parents.get(p);
    return p === process.pid && isBrowser(pid);
  });
}

/** Pss of a process (shared pages divided among the processes mapping them, so a tree's sum is not
 * overcounted) and its CPU time so far (user + system, all threads), or null once it has ended. */
function sample(pid: number): { pss: number; cpu: number } | null {
  try {
    const raw = readFileSync(`/proc/${pid}/stat`, "utf8");
    const stat = raw.slice(raw.lastIndexOf(")") + 2).split(" ");
    const m = readFileSync(`/proc/${pid}/smaps_rollup`, "utf8").match(/Pss:\s+(\d+) kB/);
    return { pss: m ? Number(m[1]) * 1024 : 0, cpu: (Number(stat[11]) + Number(stat[12])) / CLOCK_TICKS };
  } catch {
    return null;
  }
}

const MiB = 1024 * 1024;
// BENCH_PART_SHEETS / BENCH_PARALLEL try other part sizes and parallelism than the route's defaults.
const TUNING = {
  partSheets: Number(process.env.BENCH_PART_SHEETS) || undefined,
  parallel: Number(process.env.BENCH_PARALLEL) || undefined,
};
const CLOCK_TICKS = 100; // USER_HZ on Linux
const load1 = () => os.loadavg()[0];

type Result = {
  n: number;
  pages: number;
  expected: number;
  total: number;
  prep: number;
  chromium: number;
  pdfMiB: number;
  htmlMiB: number;
  nodePeak: number;
  browserPeak: number;
  browserCpu: number;
  nodeCpu: number;
  samplerCpu: number;
  nodeStart: number;
  nodeBuilt: number;
  load: [number, number];
};

/** Every 300 ms: the browser tree's Pss and CPU time (its process list about once a second). Reading
 * smaps_rollup makes the kernel walk the browser's page tables, so sampling every 100 ms cost 15 % of a core. */
const SAMPLE_MS = 300;
function watch() {
  let pids = descendants();
  const cpuStart = new Map(pids.map((p) => [p, sample(p)?.cpu ?? 0]));
  const cpuLast = new Map<number, number>();
  let browserPeak = 0;
  let nodePeak = 0;
  let ticks = 0;
  const nodeCpu0 = process.cpuUsage();
  let own = 0;
  const tick = () => {
    const c0 = process.cpuUsage();
    if (++ticks % 3 === 0) pids = descendants();
    let pss = 0;
    for (const p of pids) {
      const s = sample(p);
      if (!s) continue;
      pss += s.pss;
      cpuLast.set(p, s.cpu);
    }
    browserPeak = Math.max(browserPeak, pss);
    nodePeak = Math.max(nodePeak, process.memoryUsage().rss);
    const c = process.cpuUsage(c0);
    own += (c.user + c.system) / 1e6;
  };
  const timer = setInterval(tick, SAMPLE_MS);
  return {
    stop() {
      clearInterval(timer);
      pids = descendants();
      tick();
      let browserCpu = 0;
      for (const [p, c] of cpuLast) browserCpu += c - (cpuStart.get(p) ?? 0);
      const u = process.cpuUsage(nodeCpu0);
      // The sampler's own reads (smaps_rollup walks the browser's page tables) are not the print's work.
      return { browserPeak, nodePeak, browserCpu, nodeCpu: (u.user + u.system) / 1e6 - own, samplerCpu: own };
    },
  };
}

async function run(n: number): Promise<Result> {
  const load0 = load1();
  const nodeStart = process.memoryUsage().rss;
  const w = watch();
  const t0 = performance.now();
  const landmarks = outlineLandmarks(PRODUCTION);
  const charts = rig(n).map((f) =>
    buildFocusChart(f, PRODUCTION, { landmarks, userNames: { 1: "Bench Electrician" }, timeZone: "UTC" }),
  );
  const sheets = paginate(charts, 4, { newPagePerPosition: true });
  const parts = focusSheetsMarkup(sheets, {
    productionName: PRODUCTION.name,
    printedAt: "bench",
    perPage: 4,
    units: "metric",
    landmarks,
  });
  const htmlLength = parts.reduce((n, p) => n + p.length, 0);
  const t1 = performance.now();
  const nodeBuilt = process.memoryUsage().rss;
  const pdf = await renderPdf({ title: "bench", sheets: parts, paper: "A4", footerText: "bench", tuning: TUNING });
  const t2 = performance.now();
  const m = w.stop();
  if (process.env.BENCH_PDF_OUT) writeFileSync(process.env.BENCH_PDF_OUT.replace("{n}", String(n)), pdf);
  const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page(?!s)/g) ?? []).length;
  const r: Result = {
    n,
    pages,
    expected: sheets.length,
    total: (t2 - t0) / 1000,
    prep: (t1 - t0) / 1000,
    chromium: (t2 - t1) / 1000,
    pdfMiB: pdf.length / MiB,
    htmlMiB: htmlLength / MiB,
    nodeStart,
    nodeBuilt,
    ...m,
    load: [load0, load1()],
  };
  console.log(
    `${String(n).padStart(5)} charts: ${r.total.toFixed(1)} s total (model + HTML ${r.prep.toFixed(2)} s, Chromium ${r.chromium.toFixed(1)} s), ` +
      `${pages} pages (expected ${sheets.length}), ${r.pdfMiB.toFixed(1)} MiB PDF, HTML ${r.htmlMiB.toFixed(1)} MiB, ` +
      `RSS Node ${(r.nodeStart / MiB).toFixed(0)} MiB at start, ${(r.nodeBuilt / MiB).toFixed(0)} with the HTML, ${(r.nodePeak / MiB).toFixed(0)} at peak, browser tree ${(r.browserPeak / MiB).toFixed(0)} MiB (Pss), ` +
      `CPU browser ${r.browserCpu.toFixed(1)} s + Node ${r.nodeCpu.toFixed(1)} s (sampler ${r.samplerCpu.toFixed(1)} s more), load ${r.load[0].toFixed(1)}→${r.load[1].toFixed(1)}`,
  );
  return r;
}

/** One line a size, for the lead to compare runs; CPU seconds say more than wall time on a busy machine. */
function summary(results: Result[]) {
  const head =
    "charts | pages | wall s | CPU s (browser + Node) | Node peak MiB | browser Pss MiB | together MiB | load 1-min";
  console.log(`\n${head}\n${head.replace(/[^|]/g, "-")}`);
  for (const r of results) {
    console.log(
      [
        r.n,
        r.pages === r.expected ? r.pages : `${r.pages} (expected ${r.expected})`,
        r.total.toFixed(1),
        `${(r.browserCpu + r.nodeCpu).toFixed(1)} (${r.browserCpu.toFixed(1)} + ${r.nodeCpu.toFixed(1)})`,
        (r.nodePeak / MiB).toFixed(0),
        (r.browserPeak / MiB).toFixed(0),
        ((r.nodePeak + r.browserPeak) / MiB).toFixed(0),
        `${r.load[0].toFixed(1)}–${r.load[1].toFixed(1)}`,
      ].join(" | "),
    );
  }
}

async function main() {
  console.log(
    `Focus-chart PDF at 4 a page, A4 — ${os.cpus().length} cores, Node ${process.version}, ${new Date().toISOString().slice(0, 10)}, ` +
      `parts of ${TUNING.partSheets ?? PART_SHEETS} pages, ${TUNING.parallel ?? 2} at once`,
  );
  const sizes = process.argv
    .slice(2)
    .map(Number)
    .filter((x) => x > 0);
  const results: Result[] = [];
  for (const n of sizes.length ? sizes : [100, 500, 1500]) results.push(await run(n));
  await closeBrowser();
  summary(results);
}

void main();

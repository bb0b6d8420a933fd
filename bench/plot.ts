// npm run bench:plot — how the plot draws with 100, 1,500 and 5,000 fixtures on 40 positions.
// Starts its own MariaDB and `next start` from a build in .next-bench-plot (built when stale), unless
// APP_URL and DATABASE_URL name a running server and its database. Seeds one production per size,
// opens the plot in Debian's headless Chromium and reports: time to first full draw, and the frame
// interval (requestAnimationFrame) and drawing cost per frame while panning/zooming for 5 s and while
// dragging one focus mark. Sizes: BENCH_SIZES=100,1500. BENCH_TRACE=1 adds a Chromium trace of each
// first visit (renderer main-thread time by task). Ends with two compact tables to paste into docs/benchmarks.md.
import os from "node:os";
import { chromium, type Page } from "playwright-core";
import { DEMO_PASSWORD, DEMO_USERS } from "../tests/support/demo";
import { startServer } from "./plot-server";
import { seedBenchProduction } from "./plot-seed";
import { openPlot, traceFirstDraw, type FirstDrawParts } from "./plot-trace";

const SIZES = (process.env.BENCH_SIZES ?? "100,1500,5000").split(",").map(Number);
const pct = (xs: number[], p: number) => {
  const s = xs.slice().sort((a, b) => a - b);
  return s.length ? s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] : NaN;
};
const ms = (n: number) => `${n.toFixed(1)} ms`;

// Page scripts are strings: tsx's name-keeping helper (__name) does not exist inside the page.
const START_RECORDING = `(() => {
  window.__plotDrawMs = []; window.__frames = []; window.__stop = false;
  let last = performance.now();
  function tick(t) { window.__frames.push(t - last); last = t; if (!window.__stop) requestAnimationFrame(tick); }
  requestAnimationFrame(tick);
})()`;
const STOP_RECORDING = `(() => { window.__stop = true; return { frames: window.__frames.slice(1), draws: window.__plotDrawMs.slice() }; })()`;
const AFTER_TWO_FRAMES = `new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r(performance.now()))))`;

async function startRecording(page: Page) {
  await page.evaluate(START_RECORDING);
}

async function stopRecording(page: Page) {
  return (await page.evaluate(STOP_RECORDING)) as { frames: number[]; draws: number[] };
}

async function canvasBox(page: Page) {
  const c = page.getByTestId("plot-canvas");
  return {
    box: (await c.boundingBox())!,
    view: JSON.parse((await c.getAttribute("data-view"))!) as { scale: number; ox: number; oy: number },
  };
}

async function panAndZoom(page: Page, seconds: number) {
  const { box } = await canvasBox(page);
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  const end = Date.now() + seconds * 1000;
  let k = 0;
  while (Date.now() < end) {
    await page.mouse.move(cx, cy);
    await page.mouse.down();
    for (let i = 0; i < 20; i++)
      await page.mouse.move(cx + Math.sin((k + i) / 6) * 150, cy + Math.cos((k + i) / 6) * 100);
    await page.mouse.up();
    for (let i = 0; i < 10; i++) await page.mouse.wheel(0, (k % 2 ? 1 : -1) * 40);
    k += 20;
  }
}

async function dragMark(page: Page, productionId: number, seconds: number) {
  const data = await (await page.request.get(`/api/productions/${productionId}/plot`)).json();
  const f = data.fixtures.find(
    (x: { focusPointId: number | null; positionName: string; computed: { focus: unknown } }) =>
      x.focusPointId === null && x.computed.focus && x.positionName.startsWith("Pipe 2"),
  );
  await page.getByRole("button", { name: "Fit to stage" }).click(); // the pan may have left the unit off screen
  await page.evaluate(AFTER_TWO_FRAMES);
  const { box, view } = await canvasBox(page);
  const at = (p: { x: number; y: number }) => ({
    x: box.x + view.ox + view.scale * p.x,
    y: box.y + view.oy - view.scale * p.y,
  });
  const s = at(f);
  await page.mouse.click(s.x, s.y);
  await page.getByTestId("fixture-panel").waitFor();
  const m = at(f.computed.focus);
  await startRecording(page);
  await page.mouse.move(m.x, m.y);
  await page.mouse.down();
  const end = Date.now() + seconds * 1000;
  let i = 0;
  while (Date.now() < end) {
    i++;
    await page.mouse.move(m.x + Math.sin(i / 10) * 120, m.y + Math.cos(i / 14) * 80);
  }
  const rec = await stopRecording(page);
  await page.mouse.move(m.x, m.y);
  await page.mouse.up();
  return rec;
}

async function main() {
  const server = await startServer();
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run"],
  });
  const frames: string[] = [];
  const parts: string[] = [];
  try {
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 }, baseURL: server.appUrl });
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill(DEMO_USERS.designer);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    for (const n of SIZES) {
      const productionId = await seedBenchProduction(server.databaseUrl, n);
      await openPlot(page, productionId); // warm the route once
      // The median of three visits: one visit on a shared machine is mostly noise.
      const visits: FirstDrawParts[] = [];
      for (let k = 0; k < 3; k++) visits.push(await openPlot(page, productionId));
      visits.sort((a, b) => a.paint - b.paint);
      const d = visits[1];
      const row = [d.paint, d.ttfb, d.htmlDone, d.domReady, d.rebuildStart, d.rebuild, d.drawStart].map(ms).join(" | ");
      parts.push(`| ${n.toLocaleString("en")} | ${row} |`);
      if (process.env.BENCH_TRACE) {
        const top = await traceFirstDraw(browser, page, productionId);
        console.log(
          `main-thread tasks, ${n} fixtures: ${top.map(([name, t]) => `${name} ${t.toFixed(0)} ms`).join(", ")}`,
        );
      }
      await startRecording(page);
      await panAndZoom(page, 5);
      const pan = await stopRecording(page);
      const drag = await dragMark(page, productionId, 3);
      const line = `| ${n.toLocaleString("en")} | ${ms(pct(pan.frames, 50))} / ${ms(pct(pan.frames, 95))} | ${ms(pct(pan.draws, 50))} / ${ms(pct(pan.draws, 95))} | ${ms(pct(drag.frames, 50))} / ${ms(pct(drag.frames, 95))} | ${ms(pct(drag.draws, 50))} / ${ms(pct(drag.draws, 95))} |`;
      console.log(parts.at(-1));
      console.log(line);
      frames.push(line);
    }
  } finally {
    await browser.close();
    await server.stop();
  }
  const [load] = os.loadavg();
  console.log(
    [
      "",
      `load average (1 min) at the end: ${load.toFixed(1)} on ${os.cpus().length} cores`,
      "",
      "First full draw (median of 3 visits; times from navigation start):",
      "| fixtures | first full draw (painted) | server answers (TTFB) | HTML done | DOM ready | data rebuild starts | rebuild takes | first canvas draw |",
      "|---|---|---|---|---|---|---|---|",
      ...parts,
      "",
      "Frames:",
      "| fixtures | pan+zoom frame interval p50 / p95 | pan+zoom draw cost p50 / p95 | mark-drag frame interval p50 / p95 | mark-drag draw cost p50 / p95 |",
      "|---|---|---|---|---|",
      ...frames,
    ].join("\n"),
  );
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});

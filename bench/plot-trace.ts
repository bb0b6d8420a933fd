// For bench:plot: where the first draw's time goes. `firstDrawParts` reads the page's navigation timing
// and the marks the plot sets (plot:rebuild-*, plot:first-draw, plot:first-paint); `traceFirstDraw`
// (BENCH_TRACE=1) records a Chromium trace of one visit and sums the renderer main thread's top-level
// tasks by name, so server wait, script compile/evaluation, layout, GC and canvas drawing can be told apart.
import type { Browser, Page } from "playwright-core";

export type FirstDrawParts = {
  ttfb: number;
  htmlDone: number;
  domReady: number;
  rebuildStart: number;
  rebuild: number;
  drawStart: number;
  paint: number;
};

// A page script as a string: tsx's name-keeping helper (__name) does not exist inside the page.
const READ_PARTS = `(() => {
  const nav = performance.getEntriesByType("navigation")[0];
  const at = (n) => performance.getEntriesByName(n)[0]?.startTime ?? NaN;
  return { ttfb: nav.responseStart, htmlDone: nav.responseEnd, domReady: nav.domContentLoadedEventEnd,
    rebuildStart: at("plot:rebuild-start"), rebuild: at("plot:rebuild-end") - at("plot:rebuild-start"),
    drawStart: at("plot:first-draw"), paint: at("plot:first-paint") };
})()`;

export async function openPlot(page: Page, productionId: number): Promise<FirstDrawParts> {
  await page.goto(`/productions/${productionId}/plot`);
  await page.locator("[data-testid=plot-canvas][data-drawn]").waitFor({ timeout: 120_000 });
  return (await page.evaluate(READ_PARTS)) as FirstDrawParts;
}

type TraceEvent = {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  pid: number;
  tid: number;
  args?: { name?: string };
};

/** Top-level task time on the renderer's main thread during one visit, largest first. */
export async function traceFirstDraw(browser: Browser, page: Page, productionId: number) {
  await browser.startTracing(page, {
    categories: ["devtools.timeline", "v8", "disabled-by-default-devtools.timeline", "blink.user_timing"],
  });
  await openPlot(page, productionId);
  const events = (JSON.parse((await browser.stopTracing()).toString()) as { traceEvents: TraceEvent[] }).traceEvents;
  const main = events.find(
    (e) =>
      e.name === "thread_name" &&
      e.args?.name === "CrRendererMain" &&
      events.some((x) => x.pid === e.pid && x.name === "ParseHTML"),
  );
  if (!main) return [];
  const tasks = events
    .filter((e) => e.pid === main.pid && e.tid === main.tid && e.ph === "X" && e.dur)
    .sort((a, b) => a.ts - b.ts);
  const sums = new Map<string, number>();
  let end = 0;
  for (const t of tasks) {
    if (t.name === "RunTask" || t.name === "ThreadControllerImpl::RunTask") continue;
    if (t.ts < end) continue; // nested inside the previous top-level event
    end = t.ts + t.dur!;
    sums.set(t.name, (sums.get(t.name) ?? 0) + t.dur! / 1000);
  }
  return [...sums].sort((a, b) => b[1] - a[1]).slice(0, 12);
}

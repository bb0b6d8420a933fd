import "server-only";
// Focus charts printed to PDF by the shared headless Chromium: the same sheets and stylesheet as the
// browser's print view. Long prints go to the browser in parts of PART_SHEETS pages and are joined with
// pdf-lib: Chromium keeps every page of a print in memory, and 375 pages in one go took over 3 GiB. Two
// parts print at once in two pages of the one browser (a core each).
//
// What makes it fast (docs/benchmarks.md, "Focus charts, third pass"):
// - Each page loads the print shell (fonts, styles) once and keeps it; a part only replaces the body.
// - The fonts sit in a <style> of their own. In the same sheet as an @media rule, switching to print
//   media made Chromium drop every web font's shaped text and lay the whole part out again with it
//   (about 1 of the 2.4 CPU-seconds a 20-page part took).
// - On screen the body is not displayed, so Chromium lays the sheets out only for print (it also lays
//   the page out again for the screen after printing).
import { PDFDocument } from "pdf-lib";
import { createElement } from "react";
import { CHART_CSS, sheetCss } from "@/lib/focus/chart-css";
import { PAPER, type Paper } from "@/lib/focus/pages";
import { plexFontFaces, PLEX_WEIGHTS } from "./fonts";
import type { Page } from "playwright-core";
import { withPages } from "./browser";
import { renderStaticMarkup } from "./static-markup";

/** The document a print page holds between parts: everything but the title and the sheets. */
function printShell(paper: Paper): string {
  return (
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title></title>` +
    `<style>${plexFontFaces()}</style>` +
    `<style>html,body{margin:0;background:#fff}@media screen{body{display:none}}${CHART_CSS}${sheetCss(paper)}</style></head>` +
    `<body></body></html>`
  );
}

const PRINT_TIMEOUT_MS = 120_000;
/** 15 pages a part: as fast as 20 or 30 in trials, and 50 MiB less browser memory than 20. */
export const PART_SHEETS = 15;
/** Parts printed at once, each in its own page of the browser. */
const PARALLEL_PARTS = 2;

/** Which shell each page of the pool holds (pages outlive a print). */
const shellOf = new WeakMap<Page, Paper>();

async function loadShell(page: Page, paper: Paper) {
  if (shellOf.get(page) === paper) return;
  shellOf.delete(page);
  await page.setContent(printShell(paper), { waitUntil: "load" });
  // Fonts load when text first needs them; loading them now means no part waits for them.
  await page.evaluate(
    (weights) =>
      Promise.all(weights.map((w) => document.fonts.load(`${w} 10px "IBM Plex Sans"`))).then(() => undefined),
    [...PLEX_WEIGHTS],
  );
  shellOf.set(page, paper);
}

const FOOTER_STYLE = {
  fontFamily: "sans-serif",
  fontSize: "7px",
  color: "#555",
  width: "100%",
  padding: "0 8mm",
  display: "flex",
  justifyContent: "space-between",
};

function footer(text: string, numbered: boolean): string {
  // Chromium fills pageNumber/totalPages itself; in a print made of parts they would restart, so then
  // the sheet's own header (page x of y over the whole print) is the page number.
  const span = (className: string) => createElement("span", { className });
  const pages = numbered ? createElement("span", null, "page ", span("pageNumber"), " of ", span("totalPages")) : null;
  return renderStaticMarkup(createElement("div", { style: FOOTER_STYLE }, createElement("span", null, text), pages));
}

/** Print tuning, for the benchmark to compare part sizes and parallelism; the defaults are what the route uses. */
export type PrintTuning = { partSheets?: number; parallel?: number };

/** Prints sheets of static markup (from focusSheetsMarkup) to one PDF. */
export async function renderPdf(o: {
  title: string;
  sheets: string[];
  paper: Paper;
  footerText: string;
  tuning?: PrintTuning;
}): Promise<Buffer> {
  const size = o.tuning?.partSheets ?? PART_SHEETS;
  const parts: string[][] = [];
  for (let i = 0; i < o.sheets.length; i += size) parts.push(o.sheets.slice(i, i + size));
  const m = PAPER[o.paper].marginMm;
  const print = async (page: Page, part: string[], numbered: boolean) => {
    page.setDefaultTimeout(PRINT_TIMEOUT_MS);
    await loadShell(page, o.paper);
    await page.evaluate(
      ({ title, html }) => {
        document.title = title;
        document.body.innerHTML = html;
        // Pictures (if a chart has any) must be decoded before printing, as the load event used to ensure.
        return Promise.all([
          document.fonts.ready,
          ...Array.from(document.images, (img) => img.decode().catch(() => undefined)),
        ]).then(() => undefined);
      },
      { title: o.title, html: part.join("") },
    );
    try {
      return await page.pdf({
        format: o.paper,
        printBackground: true,
        preferCSSPageSize: true,
        margin: { top: `${m.top}mm`, right: `${m.side}mm`, bottom: `${m.bottom}mm`, left: `${m.side}mm` },
        displayHeaderFooter: true,
        headerTemplate: "<span></span>",
        footerTemplate: footer(o.footerText, numbered),
      });
    } finally {
      // The page goes back to the pool: it must not keep this print's charts (or their memory).
      await page.evaluate(() => {
        document.body.textContent = "";
      });
    }
  };
  if (parts.length === 1) return asBuffer(await withPages(1, ([page]) => print(page, parts[0], true)));

  // Parts are joined in order as they arrive, so the joining overlaps the printing and no part's bytes
  // are kept once copied.
  const merged = await PDFDocument.create();
  merged.setTitle(o.title);
  const done: Array<Uint8Array | undefined> = new Array(parts.length);
  let joined = 0;
  let joining = Promise.resolve();
  const join = () => {
    joining = joining.then(async () => {
      while (joined < parts.length && done[joined]) {
        const doc = await PDFDocument.load(done[joined]!);
        done[joined++] = undefined;
        for (const p of await merged.copyPages(doc, doc.getPageIndices())) merged.addPage(p);
      }
    });
  };
  try {
    await withPages(Math.min(o.tuning?.parallel ?? PARALLEL_PARTS, parts.length), async (pages) => {
      let next = 0;
      const worker = async (page: Page) => {
        while (next < parts.length) {
          const k = next++;
          done[k] = await print(page, parts[k], false);
          join();
        }
      };
      await Promise.all(pages.map(worker));
    });
  } catch (err) {
    joining.catch(() => {}); // the print's error is the one to report
    throw err;
  }
  await joining;
  // Plain (not stream-packed) objects keep the file readable by simple tools that count /Type /Page.
  return asBuffer(await merged.save({ useObjectStreams: false }));
}

/** A Buffer over the same bytes (a copy would hold a second PDF in memory). */
const asBuffer = (bytes: Uint8Array) => Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);

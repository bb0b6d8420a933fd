import "server-only";
// Focus charts printed to PDF by the shared headless Chromium: the same sheets and stylesheet as the
// browser's print view. Long prints go to the browser in parts of PART_SHEETS pages and are joined with
// pdf-lib: Chromium keeps every page of a print in memory, and 375 pages in one go took over 3 GiB. Two
// parts print at once in two pages of the one browser; parts are small so both together stay near the
// memory one part of 40 pages took.
import { PDFDocument } from "pdf-lib";
import { CHART_CSS, sheetCss } from "@/lib/focus/chart-css";
import { escapeHtml } from "@/lib/focus/escape";
import { PAPER, type Paper } from "@/lib/focus/pages";
import { plexFontFaces } from "./fonts";
import type { Page } from "playwright-core";
import { withPage } from "./browser";

/** The whole printable document: fonts, chart styles, the paper's page rule, and the sheets. */
export function printDocument(o: { title: string; paper: Paper; sheets: string }): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(o.title)}</title>` +
    `<style>${plexFontFaces()}\nhtml,body{margin:0;background:#fff}${CHART_CSS}${sheetCss(o.paper)}</style></head>` +
    `<body>${o.sheets}</body></html>`;
}

const PRINT_TIMEOUT_MS = 120_000;
export const PART_SHEETS = 20;
/** Parts printed at once, each in its own page of the browser. */
const PARALLEL_PARTS = 2;

function footer(text: string, numbered: boolean): string {
  // Chromium fills pageNumber/totalPages itself; in a print made of parts they would restart, so then
  // the sheet's own header (page x of y over the whole print) is the page number.
  const pages = numbered ? `<span>page <span class="pageNumber"></span> of <span class="totalPages"></span></span>` : "";
  return `<div style="font-family:sans-serif;font-size:7px;color:#555;width:100%;padding:0 8mm;display:flex;justify-content:space-between">` +
    `<span>${escapeHtml(text)}</span>${pages}</div>`;
}

export async function renderPdf(o: { title: string; sheets: string[]; paper: Paper; footerText: string }): Promise<Buffer> {
  const parts: string[][] = [];
  for (let i = 0; i < o.sheets.length; i += PART_SHEETS) parts.push(o.sheets.slice(i, i + PART_SHEETS));
  const m = PAPER[o.paper].marginMm;
  const print = async (page: Page, part: string[], numbered: boolean) => {
    page.setDefaultTimeout(PRINT_TIMEOUT_MS);
    await page.setContent(printDocument({ title: o.title, paper: o.paper, sheets: part.join("") }), { waitUntil: "load" });
    await page.evaluate(() => document.fonts.ready.then(() => undefined));
    return page.pdf({
      format: o.paper,
      printBackground: true,
      preferCSSPageSize: true,
      margin: { top: `${m.top}mm`, right: `${m.side}mm`, bottom: `${m.bottom}mm`, left: `${m.side}mm` },
      displayHeaderFooter: true,
      headerTemplate: "<span></span>",
      footerTemplate: footer(o.footerText, numbered),
    });
  };
  const pdfs = await withPage(async (first) => {
    const out: Uint8Array[] = new Array(parts.length);
    let next = 0;
    // Two pages of the one browser print alternate parts side by side (a core each on this machine);
    // a fresh page per part lets Chromium drop the previous part's layout.
    const worker = async () => {
      while (next < parts.length) {
        const k = next++;
        const page = k === 0 ? first : await first.context().newPage();
        try {
          out[k] = await print(page, parts[k], parts.length === 1);
        } finally {
          if (page !== first) await page.close();
        }
      }
    };
    await Promise.all(Array.from({ length: Math.min(PARALLEL_PARTS, parts.length) }, worker));
    return out;
  });
  if (pdfs.length === 1) return Buffer.from(pdfs[0]);
  const merged = await PDFDocument.create();
  merged.setTitle(o.title);
  for (const bytes of pdfs) {
    const doc = await PDFDocument.load(bytes);
    for (const p of await merged.copyPages(doc, doc.getPageIndices())) merged.addPage(p);
  }
  // Plain (not stream-packed) objects keep the file readable by simple tools that count /Type /Page.
  return Buffer.from(await merged.save({ useObjectStreams: false }));
}

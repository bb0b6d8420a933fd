import "server-only";
// Focus charts printed to PDF by the shared headless Chromium: the same sheets and stylesheet as the
// browser's print view, with a footer that Chromium numbers itself (page x of y).
import { CHART_CSS, sheetCss } from "@/lib/focus/chart-css";
import { escapeHtml } from "@/lib/focus/escape";
import { PAPER, type Paper } from "@/lib/focus/pages";
import { plexFontFaces } from "./fonts";
import { withPage } from "./browser";

/** The whole printable document: fonts, chart styles, the paper's page rule, and the sheets. */
export function printDocument(o: { title: string; paper: Paper; sheets: string }): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(o.title)}</title>` +
    `<style>${plexFontFaces()}\nhtml,body{margin:0;background:#fff}${CHART_CSS}${sheetCss(o.paper)}</style></head>` +
    `<body>${o.sheets}</body></html>`;
}

const PRINT_TIMEOUT_MS = 120_000;

export async function renderPdf(o: { html: string; paper: Paper; footerText: string }): Promise<Buffer> {
  return withPage(async (page) => {
    page.setDefaultTimeout(PRINT_TIMEOUT_MS);
    await page.setContent(o.html, { waitUntil: "load" });
    await page.evaluate(() => document.fonts.ready.then(() => undefined));
    const m = PAPER[o.paper].marginMm;
    const pdf = await page.pdf({
      format: o.paper,
      printBackground: true,
      preferCSSPageSize: true,
      margin: { top: `${m.top}mm`, right: `${m.side}mm`, bottom: `${m.bottom}mm`, left: `${m.side}mm` },
      displayHeaderFooter: true,
      headerTemplate: "<span></span>",
      footerTemplate: `<div style="font-family:sans-serif;font-size:7px;color:#555;width:100%;padding:0 8mm;display:flex;justify-content:space-between">` +
        `<span>${escapeHtml(o.footerText)}</span><span>page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`,
    });
    return Buffer.from(pdf);
  });
}

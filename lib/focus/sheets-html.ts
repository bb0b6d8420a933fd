// Printed sheets of focus charts as one HTML fragment: each sheet carries its own header (production,
// positions, print time, page x of y), so the browser's print and the server's PDF number pages alike.
import type { Units } from "@/lib/optics";
import { chartHtml } from "./chart-html";
import { escapeHtml } from "./escape";
import type { Landmark } from "./landmarks";
import type { ChartsPerPage, Sheet } from "./pages";

type SheetOptions = { productionName: string; printedAt: string; perPage: ChartsPerPage; units: Units; landmarks: Landmark[] };

export function sheetsHtml(sheets: Sheet[], o: SheetOptions): string {
  return sheetParts(sheets, o).join("");
}

/** One HTML string a sheet, so a long print can be sent to the browser in parts. */
export function sheetParts(sheets: Sheet[], o: SheetOptions): string[] {
  if (!sheets.length) return [`<section class="fc-sheet fc-n${o.perPage}"><p>No fixtures match these filters.</p></section>`];
  return sheets
    .map((s) =>
      `<section class="fc-sheet fc-n${o.perPage}" data-testid="focus-sheet">` +
      `<header class="fc-sheet-head"><span><b>${escapeHtml(o.productionName)}</b> · ${escapeHtml(s.positions.join(", "))}</span>` +
      `<span>Focus charts · printed ${escapeHtml(o.printedAt)} · page ${s.page} of ${s.of}</span></header>` +
      `<div class="fc-grid">${s.charts.map((c) => chartHtml(c, { landmarks: o.landmarks, units: o.units })).join("")}</div></section>`,
    );
}

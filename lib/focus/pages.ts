// Paging of printed focus charts: a fixed number of charts a sheet, and (by default) a new sheet for each
// position, so a crew can hand out one position's pages. Pure, so page counts can be tested and predicted.
import type { FocusChart } from "./chart-model";

export const CHARTS_PER_PAGE = [1, 2, 4, 6] as const;
export type ChartsPerPage = (typeof CHARTS_PER_PAGE)[number];
export type Paper = "A4" | "Letter";

/** ISO 216 A4 is 210 × 297 mm; US Letter is 8.5 × 11 in (215.9 × 279.4 mm). */
export const PAPER: Record<
  Paper,
  { cssSize: string; widthMm: number; heightMm: number; marginMm: { top: number; side: number; bottom: number } }
> = {
  A4: { cssSize: "A4", widthMm: 210, heightMm: 297, marginMm: { top: 8, side: 8, bottom: 11 } },
  Letter: { cssSize: "letter", widthMm: 215.9, heightMm: 279.4, marginMm: { top: 8, side: 8, bottom: 11 } },
};

export type Sheet = { positions: string[]; charts: FocusChart[]; page: number; of: number };

/** Charts grouped as they go onto sheets: runs of one position each, or one run when positions share sheets. */
function runs<T extends { positionId: number }>(charts: T[], newPagePerPosition: boolean): T[][] {
  const groups: T[][] = [];
  for (const c of charts) {
    const last = groups.at(-1);
    if (last && (!newPagePerPosition || last[0].positionId === c.positionId)) last.push(c);
    else groups.push([c]);
  }
  return groups;
}

/**
 * How many sheets `paginate` will make, from the charts' positions alone (in hanging order): what the
 * page's PDF button promises before anything is drawn.
 */
export function sheetCount(
  charts: { positionId: number }[],
  perPage: ChartsPerPage,
  o: { newPagePerPosition: boolean },
): number {
  return runs(charts, o.newPagePerPosition).reduce((n, g) => n + Math.ceil(g.length / perPage), 0);
}

export function paginate(charts: FocusChart[], perPage: ChartsPerPage, o: { newPagePerPosition: boolean }): Sheet[] {
  const sheets: Omit<Sheet, "of">[] = [];
  for (const g of runs(charts, o.newPagePerPosition)) {
    for (let i = 0; i < g.length; i += perPage) {
      const part = g.slice(i, i + perPage);
      sheets.push({ positions: [...new Set(part.map((c) => c.positionName))], charts: part, page: sheets.length + 1 });
    }
  }
  return sheets.map((s) => ({ ...s, of: sheets.length }));
}

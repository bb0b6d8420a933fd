"use client";

import { useState } from "react";
import { toQuery, type FocusFilter } from "@/lib/focus/filters";
import { CHARTS_PER_PAGE, sheetCount, type ChartsPerPage, type Paper } from "@/lib/focus/pages";
import { browserTimeZone } from "./use-charts";

const field = "min-h-10 rounded-md border border-line bg-surface px-2 text-sm text-ink";
const linkButton =
  "inline-flex min-h-10 items-center rounded-md border border-line bg-surface px-3 text-sm font-medium text-ink hover:bg-raised";

/** Layout for printing (charts a page, paper) and the three ways out: print view, PDF, Excel. */
export function PrintOptions({
  productionId,
  filter,
  charts,
  canExport,
}: {
  productionId: number;
  filter: Partial<FocusFilter>;
  charts: { positionId: number }[];
  canExport: boolean;
}) {
  const [perPage, setPerPage] = useState<ChartsPerPage>(4);
  const [paper, setPaper] = useState<Paper>("A4");
  const [pdfBusy, setPdfBusy] = useState(false);
  const query = toQuery({ ...filter, perPage, paper, tz: browserTimeZone() });
  const count = charts.length;
  // The print view and the PDF start each position on a new sheet (their default), so count the same way.
  const pages = sheetCount(charts, perPage, { newPagePerPosition: true });
  return (
    <div className="flex flex-wrap items-end gap-3" role="group" aria-label="Print">
      <label className="flex flex-col text-xs text-muted">
        Charts a page
        <select
          className={field}
          value={perPage}
          onChange={(e) => setPerPage(Number(e.target.value) as ChartsPerPage)}
          data-testid="per-page"
        >
          {CHARTS_PER_PAGE.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col text-xs text-muted">
        Paper
        <select className={field} value={paper} onChange={(e) => setPaper(e.target.value as Paper)} data-testid="paper">
          <option value="A4">A4</option>
          <option value="Letter">US Letter</option>
        </select>
      </label>
      <a
        className={linkButton}
        href={`/productions/${productionId}/focus/print?${query}`}
        target="_blank"
        rel="noopener"
        data-testid="print-view"
      >
        Print view
      </a>
      <a
        className={linkButton}
        href={`/api/productions/${productionId}/focus/pdf?${query}`}
        data-testid="download-pdf"
        aria-busy={pdfBusy}
        onClick={() => {
          setPdfBusy(true);
          // The download has no completion event in the page; the hint clears after a while.
          setTimeout(() => setPdfBusy(false), Math.min(60_000, 3_000 + count * 40));
        }}
      >
        {pdfBusy ? "Preparing PDF…" : `PDF (${count ? `about ${pages} page${pages === 1 ? "" : "s"}` : "empty"})`}
      </a>
      {canExport && (
        <a
          className={linkButton}
          href={`/api/productions/${productionId}/focus/xlsx?${toQuery({ ...filter, tz: browserTimeZone() })}`}
          data-testid="download-xlsx"
        >
          Excel
        </a>
      )}
    </div>
  );
}

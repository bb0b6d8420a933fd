import { route, readQuery } from "@/lib/http/respond";
import { getLatestRevisionStamp } from "@/lib/data/revisions";
import { requireMember } from "@/lib/auth/guards";
import { focusFilterSchema, printOptionsSchema } from "@/lib/focus/filters";
import { paginate } from "@/lib/focus/pages";
import { formatStamp } from "@/lib/focus/words";
import { loadFocusCharts } from "@/lib/pdf/focus-source";
import { withEmbeddedPhotos } from "@/lib/data/focus-photos";
import { renderPdf } from "@/lib/pdf/focus-pdf";
import { focusSheetsMarkup } from "@/lib/pdf/focus-sheets-markup";
import { chromiumMissing, CHROMIUM_PATH } from "@/lib/pdf/browser";
import { AppError } from "@/lib/errors";
import { focusFileName } from "@/lib/focus/file-name";

type Ctx = { params: Promise<{ productionId: string }> };

/** The focus charts as a PDF: filters and layout (charts per page, paper) from the query string. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "production.view");
  const filter = readQuery(req, focusFilterSchema.and(printOptionsSchema));
  if (chromiumMissing()) {
    throw new AppError(
      "unavailable",
      `PDF printing needs Chromium at ${CHROMIUM_PATH}, which is not installed on this server. Install it (apt-get install chromium; npm start does this), or open the print view and use your browser's "Save as PDF".`,
    );
  }
  const loaded = await loadFocusCharts({ productionId, filter, timeZone: filter.tz });
  const { production, landmarks } = loaded;
  const charts = await withEmbeddedPhotos(productionId, loaded.charts);
  const printedAt = formatStamp(new Date(), filter.tz);
  const revision = (await getLatestRevisionStamp({ productionId }))?.label ?? null;
  const sheets = paginate(charts, filter.perPage, { newPagePerPosition: filter.newPagePerPosition });
  const pdf = await renderPdf({
    title: `${production.name} — focus charts`,
    paper: filter.paper,
    sheets: focusSheetsMarkup(sheets, {
      productionName: production.name,
      printedAt,
      revision,
      perPage: filter.perPage,
      units: production.displayUnits,
      landmarks,
    }),
    footerText: `${production.name} · focus charts${revision ? ` · revision ${revision}` : ""} · printed ${printedAt}`,
  });
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${focusFileName({ production: production.name, positions: charts.map((c) => c.positionName), at: new Date(), timeZone: filter.tz, ext: "pdf" })}"`,
      "x-sheet-count": String(sheets.length),
      "cache-control": "no-store",
    },
  });
});

import type { Metadata } from "next";
import Link from "next/link";
import { memberForPage } from "@/lib/auth/page-guards";
import { CHART_CSS, sheetCss } from "@/lib/focus/chart-css";
import { focusFilterSchema, printOptionsSchema, toQuery } from "@/lib/focus/filters";
import { paginate } from "@/lib/focus/pages";
import { formatStamp } from "@/lib/focus/words";
import { loadFocusCharts } from "@/lib/pdf/focus-source";
import { getLatestRevisionStamp } from "@/lib/data/revisions";
import { FocusSheets } from "@/components/focus/focus-sheets";
import { PrintButton } from "../_components/print-button";

export const metadata: Metadata = { title: "Print focus charts" };

type Props = {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
};

/** The printable sheets (the browser's print stylesheet); the server's PDF prints these same sheets. */
export default async function FocusPrintPage({ params, searchParams }: Props) {
  const { productionId } = await memberForPage((await params).productionId);
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const filterResult = focusFilterSchema.safeParse(raw);
  const optionsResult = printOptionsSchema.safeParse(raw);
  const filter = filterResult.success ? filterResult.data : {};
  const options = optionsResult.success ? optionsResult.data : printOptionsSchema.parse({});
  const problem = [filterResult, optionsResult].flatMap((r) => (r.success ? [] : r.error.issues.map((i) => i.message)));

  const { production, charts, landmarks } = await loadFocusCharts({ productionId, filter, timeZone: options.tz });
  const revision = (await getLatestRevisionStamp({ productionId }))?.label ?? null;
  const sheets = paginate(charts, options.perPage, { newPagePerPosition: options.newPagePerPosition });
  const sheetOptions = {
    productionName: production.name,
    printedAt: formatStamp(new Date(), options.tz),
    revision,
    perPage: options.perPage,
    units: production.displayUnits,
    landmarks,
  };
  return (
    <>
      {/* biome-ignore lint/security/noDangerouslySetInnerHtml: the charts' own constant stylesheet, no user text */}
      <style dangerouslySetInnerHTML={{ __html: CHART_CSS + sheetCss(options.paper) }} />
      <div className="no-print flex flex-wrap items-center gap-3 border-b border-line bg-surface px-4 py-3 text-sm">
        <Link
          href={`/productions/${productionId}/focus?${toQuery({ ...filter })}`}
          className="text-muted hover:text-ink"
        >
          ← Back to the charts
        </Link>
        <span data-testid="print-summary">
          {charts.length} charts · {options.perPage} a page · {options.paper === "A4" ? "A4" : "US Letter"} ·{" "}
          {sheets.length} page{sheets.length === 1 ? "" : "s"}
        </span>
        {problem.length > 0 && (
          <span className="text-danger">Some options could not be read ({problem.join("; ")}); defaults used.</span>
        )}
        <span className="ml-auto" />
        <PrintButton />
      </div>
      <main aria-label="Focus chart sheets" className="fc-print-area bg-raised py-2 print:bg-transparent print:p-0">
        <FocusSheets sheets={sheets} o={sheetOptions} />
      </main>
    </>
  );
}

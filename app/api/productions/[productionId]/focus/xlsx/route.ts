import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { focusFilterSchema, printOptionsSchema } from "@/lib/focus/filters";
import { focusWorkbook } from "@/lib/focus/excel";
import { loadFocusCharts } from "@/lib/pdf/focus-source";
import { focusFileName } from "@/lib/focus/file-name";

type Ctx = { params: Promise<{ productionId: string }> };

/** The focus data as an Excel workbook, one row a fixture, with the same filters as the charts. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "rig.export");
  const filter = readQuery(req, focusFilterSchema.and(printOptionsSchema.pick({ tz: true })));
  const { production, charts } = await loadFocusCharts({ productionId, filter, timeZone: filter.tz });
  const body = await focusWorkbook(charts, { productionName: production.name });
  return new Response(new Uint8Array(body), {
    headers: {
      "content-type": "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
      "content-disposition": `attachment; filename="${focusFileName({ production: production.name, positions: charts.map((c) => c.positionName), at: new Date(), timeZone: filter.tz, ext: "xlsx" })}"`,
      "cache-control": "no-store",
    },
  });
});

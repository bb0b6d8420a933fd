import { z } from "zod";
import { requireMember } from "@/lib/auth/guards";
import { REPORT_PARTS, reportSheet, reportWorkbook } from "@/lib/checks/report-sheets";
import { requireChecksReport } from "@/lib/data/checks";
import { readQuery, route } from "@/lib/http/respond";
import { writeCsv } from "@/lib/io/csv-write";
import { writeXlsx } from "@/lib/io/xlsx-write";

type Ctx = { params: Promise<{ productionId: string }> };

const querySchema = z.object({
  format: z.enum(["csv", "xlsx"], { error: "format must be csv or xlsx" }).default("xlsx"),
  part: z.enum(REPORT_PARTS, { error: `part must be one of ${REPORT_PARTS.join(", ")}` }).default("findings"),
});

/** The check results as .xlsx (every part on its own sheet, cautions included) or one part as CSV. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "studies.view");
  const q = readQuery(req, querySchema);
  const report = await requireChecksReport({ productionId });
  const stamp = report.computedAt.slice(0, 10);
  const [body, type, name] =
    q.format === "csv"
      ? [
          new TextEncoder().encode(writeCsv(reportSheet(report, q.part))),
          "text/csv; charset=utf-8",
          `checks-${q.part}-${stamp}.csv`,
        ]
      : [
          new Uint8Array(await writeXlsx(reportWorkbook(report), { title: "Checks" })),
          "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
          `checks-${stamp}.xlsx`,
        ];
  return new Response(body, {
    headers: {
      "content-type": type,
      "content-disposition": `attachment; filename="${name}"`,
      "cache-control": "no-store",
    },
  });
});

import "server-only";
import { AppError } from "@/lib/errors";
import { writeCsv } from "@/lib/io/csv-write";
import { writeXlsx } from "@/lib/io/xlsx-write";
import { COLUMN_BY_ID } from "@/lib/rig/columns";
import { stockSheets, viewSheet, workbookSheets } from "@/lib/rig/sheets";
import { stockCounts } from "@/lib/rig/stock";
import { VIEW_BY_ID, type RigViewId } from "@/lib/rig/views";
import { getFixturesByProduction } from "./fixtures";
import { getFixtureTypesByProduction } from "./fixture-types";
import { getAccessoriesByProduction } from "./accessories";
import { requireProduction } from "./productions";

const XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

export async function getStockCounts({ productionId }: { productionId: number }) {
  const [fixtures, types, accessories] = await Promise.all([
    getFixturesByProduction({ productionId }),
    getFixtureTypesByProduction({ productionId }),
    getAccessoriesByProduction({ productionId }),
  ]);
  return stockCounts(fixtures, types, accessories);
}

export async function exportRig({
  productionId,
  view,
  format,
  columns,
}: {
  productionId: number;
  view: RigViewId | "workbook";
  format: "csv" | "xlsx";
  columns?: string[];
}) {
  const production = await requireProduction(productionId);
  const units = production.displayUnits;
  const fixtures = await getFixturesByProduction({ productionId });
  const base = `${production.name.replace(/[^\p{L}\p{N} _-]+/gu, "").trim() || "rig"} - ${view === "workbook" ? "rig" : VIEW_BY_ID.get(view)!.label.toLowerCase()}`;
  if (columns?.some((c) => !COLUMN_BY_ID.has(c)))
    throw new AppError("bad_request", "Unknown column in the export request.", {
      fieldErrors: { columns: ["unknown column"] },
    });

  if (view === "workbook" || view === "stock") {
    if (format === "csv" && view === "workbook")
      throw new AppError(
        "bad_request",
        "The full workbook has one sheet per view, so it is .xlsx only. Export a single view as CSV.",
        { fieldErrors: { format: ["xlsx only for the workbook"] } },
      );
    const stock = await getStockCounts({ productionId });
    const sheets =
      view === "workbook"
        ? workbookSheets(fixtures, units, stock, await getAccessoriesByProduction({ productionId }))
        : stockSheets(stock);
    if (format === "csv")
      return {
        body: Buffer.from(
          "\ufeff" + sheets.map((s) => `${s.name}\r\n${writeCsv(s).replace(/^\ufeff/, "")}`).join("\r\n"),
        ),
        contentType: "text/csv; charset=utf-8",
        fileName: `${base}.csv`,
      };
    return { body: await writeXlsx(sheets, { title: production.name }), contentType: XLSX, fileName: `${base}.xlsx` };
  }
  const sheet = viewSheet(fixtures, VIEW_BY_ID.get(view)!, units, columns);
  if (format === "csv")
    return { body: Buffer.from(writeCsv(sheet)), contentType: "text/csv; charset=utf-8", fileName: `${base}.csv` };
  return { body: await writeXlsx([sheet], { title: production.name }), contentType: XLSX, fileName: `${base}.xlsx` };
}

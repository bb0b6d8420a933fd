import "server-only";
// The equipment list of a revision (or of the paperwork as it stands) and the add / return list between
// two, as data and as CSV or Excel files for the rental shop.
import { writeCsv } from "@/lib/io/csv-write";
import { writeXlsx } from "@/lib/io/xlsx-write";
import { addReturnList, equipmentList, type EquipmentLine, type ShopLine } from "@/lib/revisions/equipment";
import { addReturnSheet, equipmentSheet } from "@/lib/revisions/equipment-sheets";
import type { SheetOut } from "@/lib/io/sheet";
import { getSnapshot } from "./revisions";

const XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
/** The spares a shop adds when nobody says otherwise (common practice, no source). */
export const DEFAULT_SPARES_PERCENT = 10;

export type EquipmentReport = {
  of: string;
  from: string | null;
  sparesPercent: number;
  list: EquipmentLine[];
  addReturn: ShopLine[] | null;
};

export async function getEquipment({
  productionId,
  of = "current",
  from,
  sparesPercent = DEFAULT_SPARES_PERCENT,
}: {
  productionId: number;
  of?: number | "current";
  from?: number | "current";
  sparesPercent?: number;
}): Promise<EquipmentReport> {
  const target = await getSnapshot({ productionId, revision: of });
  const list = equipmentList(target.snapshot.fixtures, sparesPercent);
  if (from === undefined) return { of: target.label, from: null, sparesPercent, list, addReturn: null };
  const base = await getSnapshot({ productionId, revision: from });
  const before = equipmentList(base.snapshot.fixtures, sparesPercent);
  return { of: target.label, from: base.label, sparesPercent, list, addReturn: addReturnList(before, list) };
}

export function equipmentSheets(report: EquipmentReport): SheetOut[] {
  const sheets = [equipmentSheet(report.list, report.sparesPercent, report.of)];
  if (report.addReturn && report.from) sheets.unshift(addReturnSheet(report.addReturn, report.from, report.of));
  return sheets;
}

/** The report as a file: CSV (the add / return list when there is one, else the equipment list) or Excel (both). */
export async function equipmentFile(
  report: EquipmentReport,
  format: "csv" | "xlsx",
  productionName: string,
): Promise<{ body: Buffer; contentType: string; fileName: string }> {
  const stem = `${productionName.replace(/[^\p{L}\p{N} _-]+/gu, "").trim() || "production"} - ${
    report.from ? `add-return ${report.from} to ${report.of}` : `equipment ${report.of}`
  }`;
  const sheets = equipmentSheets(report);
  if (format === "csv")
    return { body: Buffer.from(writeCsv(sheets[0])), contentType: "text/csv; charset=utf-8", fileName: `${stem}.csv` };
  return { body: await writeXlsx(sheets, { title: productionName }), contentType: XLSX, fileName: `${stem}.xlsx` };
}

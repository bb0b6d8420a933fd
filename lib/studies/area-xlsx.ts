import "server-only";
// The area table as an Excel workbook (server only: exceljs), with the study's conditions above it.
import ExcelJS from "exceljs";
import type { AreaCoverage } from "@/lib/optics";
import { neutralise } from "@/lib/cues/table-export";
import { areaTableColumns, areaTableRows } from "./area-table";

export async function areaTableXlsx(o: {
  title: string;
  conditions: string[];
  areas: AreaCoverage[];
  units: "metric" | "imperial";
}): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.creator = "Throwline";
  const sheet = book.addWorksheet("Areas");
  sheet.addRow([neutralise(o.title)]).font = { bold: true };
  for (const c of o.conditions) sheet.addRow([neutralise(c)]);
  sheet.addRow([]);
  sheet.addRow(areaTableColumns(o.units)).font = { bold: true };
  for (const r of areaTableRows(o.areas, o.units)) sheet.addRow(r);
  sheet.columns.forEach((c, i) => (c.width = i === 0 ? 24 : 14));
  return Buffer.from(await book.xlsx.writeBuffer());
}

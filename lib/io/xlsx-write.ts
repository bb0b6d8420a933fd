import ExcelJS from "exceljs";
import { neutraliseCell } from "./neutralise";
import type { CellOut, SheetOut } from "./sheet";

// Sheet names: at most 31 characters, none of : \ / ? * [ ] (Excel's rules; common practice, no source).
const sheetName = (name: string, used: Set<string>) => {
  const base = name.replace(/[:\\/?*[\]]/g, " ").slice(0, 31) || "Sheet";
  let out = base;
  for (let i = 2; used.has(out.toLowerCase()); i++) out = `${base.slice(0, 28)} ${i}`;
  used.add(out.toLowerCase());
  return out;
};

const cell = (v: CellOut) => (v == null ? null : typeof v === "boolean" ? (v ? "yes" : "no") : typeof v === "number" ? v : neutraliseCell(v));

/** A formatted workbook: bold frozen header row, column widths, an autofilter; one sheet per entry. */
export async function writeXlsx(sheets: SheetOut[], meta: { title?: string } = {}): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Throwline";
  if (meta.title) workbook.title = meta.title;
  const used = new Set<string>();
  for (const s of sheets) {
    const ws = workbook.addWorksheet(sheetName(s.name, used), { views: [{ state: "frozen", ySplit: 1 }] });
    ws.columns = s.columns.map((c) => ({ header: neutraliseCell(c.header), width: c.width }));
    ws.getRow(1).font = { bold: true };
    ws.addRows(s.rows.map((r) => r.map(cell)));
    if (s.columns.length) ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: s.columns.length } };
  }
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

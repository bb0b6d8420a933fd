import { PassThrough } from "node:stream";
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

const PLAIN: Partial<ExcelJS.Style> = Object.freeze({}) as Partial<ExcelJS.Style>;

const cell = (v: CellOut) =>
  v == null ? null : typeof v === "boolean" ? (v ? "yes" : "no") : typeof v === "number" ? v : neutraliseCell(v);

/**
 * A formatted workbook: bold frozen header row, column widths, an autofilter; one sheet per entry.
 * Written with ExcelJS's streaming writer: each row goes out as XML as soon as it is added and is
 * compressed by Node's zlib, instead of a whole workbook model zipped by a JavaScript deflate at the end.
 * Strings are written inline (no shared-strings table to build).
 */
export async function writeXlsx(sheets: SheetOut[], meta: { title?: string } = {}): Promise<Buffer> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  const finished = new Promise<void>((resolve, reject) => {
    out.on("end", resolve);
    out.on("error", reject);
  });
  const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out, useStyles: true, useSharedStrings: false });
  workbook.creator = "Throwline";
  if (meta.title) workbook.title = meta.title;
  const used = new Set<string>();
  for (const s of sheets) {
    const ws = workbook.addWorksheet(sheetName(s.name, used), { views: [{ state: "frozen", ySplit: 1 }] });
    ws.columns = s.columns.map((c) => ({ header: neutraliseCell(c.header), width: c.width }));
    ws.getRow(1).font = { bold: true };
    if (s.columns.length) ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: s.columns.length } };
    ws.getRow(1).commit();
    for (const r of s.rows) {
      const row = ws.addRow(r.map(cell));
      // Each new row and cell gets its own empty style object, and ExcelJS builds a style entry per object
      // it has not seen; one shared object makes that a lookup (the cells are plain: no style of their own).
      (row as unknown as { style: Partial<ExcelJS.Style> }).style = PLAIN;
      row.eachCell({ includeEmpty: true }, (c) => void (c.style = PLAIN));
      row.commit();
    }
    ws.commit();
  }
  await workbook.commit();
  await finished;
  return Buffer.concat(chunks);
}

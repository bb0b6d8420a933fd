import ExcelJS from "exceljs";
import { FileProblem, toRawTable, type RawRow, type RawTable } from "./table";

type CellValue = ExcelJS.CellValue;

/** Text of a cell as a person sees it: formula results, rich text and hyperlinks flattened; numbers in full. */
export function cellText(value: CellValue): string {
  if (value == null) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  if (typeof value === "string") return value;
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if (typeof value === "object") {
    if ("richText" in value) return value.richText.map((r) => r.text).join("");
    if ("result" in value) return cellText((value as { result?: CellValue }).result ?? null);
    if ("text" in value) return cellText((value as { text: CellValue }).text);
    if ("error" in value) return "";
  }
  return String(value);
}

function sheetRecords(sheet: ExcelJS.Worksheet): RawRow[] {
  const records: RawRow[] = [];
  const width = sheet.columnCount;
  sheet.eachRow({ includeEmpty: false }, (row) => {
    const cells: string[] = [];
    for (let c = 1; c <= width; c++) {
      const cell = row.getCell(c);
      // A merged block holds its value in the top-left cell; every cell of the block reads that value
      // (a position name merged down a column applies to each row).
      const source = cell.isMerged && cell.master ? cell.master : cell;
      cells.push(cellText(source.value).trim());
    }
    records.push({ rowNumber: row.number, cells });
  });
  return records;
}

function firstFilledRow(sheet: ExcelJS.Worksheet): string[] | null {
  // rowCount and columnCount walk the whole sheet on every read: take them once.
  const rows = Math.min(sheet.rowCount, 50);
  const width = sheet.columnCount;
  for (let r = 1; r <= rows; r++) {
    const row = sheet.getRow(r);
    const cells: string[] = [];
    for (let c = 1; c <= width; c++) cells.push(cellText(row.getCell(c).value).trim());
    if (cells.some((c) => c !== "")) return cells;
  }
  return null;
}

/**
 * Reads an .xlsx workbook. Without a sheet name it takes the first sheet whose header row looks like
 * a fixture list (per `looksLikeHeader`), else the first sheet with data; the sheet names go back to
 * the caller so a person can pick another.
 */
export async function readXlsx(bytes: Uint8Array, opts: { sheet?: string; looksLikeHeader?: (cells: string[]) => boolean } = {}): Promise<RawTable> {
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch {
    throw new FileProblem("This file looks like a zipped Office file but is not a readable .xlsx workbook. Save it again as .xlsx or CSV.");
  }
  const sheets = workbook.worksheets;
  const sheetNames = sheets.map((s) => s.name);
  if (!sheets.length) throw new FileProblem("The workbook has no sheets.");
  let chosen: ExcelJS.Worksheet | undefined;
  if (opts.sheet) {
    chosen = sheets.find((s) => s.name === opts.sheet);
    if (!chosen) throw new FileProblem(`The workbook has no sheet called "${opts.sheet}". Its sheets: ${sheetNames.join(", ")}.`);
  } else {
    const withData = sheets.filter((s) => s.actualRowCount > 0);
    chosen =
      withData.find((s) => {
        const first = firstFilledRow(s);
        return first ? (opts.looksLikeHeader?.(first) ?? false) : false;
      }) ?? withData[0];
    if (!chosen) throw new FileProblem("Every sheet in the workbook is empty.");
  }
  return toRawTable(sheetRecords(chosen), { decimalComma: false, sheetNames, sheet: chosen.name });
}

import { Readable } from "node:stream";
import ExcelJS from "exceljs";
import { FileProblem, toRawTable, type RawRow, type RawTable } from "./raw-table";
import { checkColumn, fillMerges } from "./sheet-limits";
import { openXmlWorkbook, repackWorkbook, type XmlSheet, type XmlWorkbook } from "./xlsx-sheet-xml";

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

type SheetRead = { name: string; records: RawRow[]; merges: string[] };
// What the streaming reader gives per sheet; `name` and `iterator` are set by ExcelJS but not in its types.
type StreamSheet = ExcelJS.stream.xlsx.WorksheetReader & {
  name: string;
  iterator: AsyncIterable<Buffer>;
} & AsyncIterable<ExcelJS.Row>;

// ExcelJS's streaming reader skips <mergeCell>; the sheet's XML passes through here on its way to the
// parser, and the merge ranges (they follow the cell data) are picked out of it. What is carried from
// one chunk to the next is an unfinished <mergeCell …> or the last 10 characters (shorter than
// "<mergeCell ", so nothing is counted twice). Read as latin1: the refs are ASCII.
const MERGE = /<mergeCell\b[^>]*?\bref="([A-Z]+[0-9]+:[A-Z]+[0-9]+)"[^>]*>/g;
async function* collectMerges(chunks: AsyncIterable<Buffer>, merges: string[]): AsyncGenerator<Buffer> {
  let tail = "";
  for await (const chunk of chunks) {
    const text = tail + chunk.toString("latin1");
    let end = 0;
    if (text.includes("<mergeCell")) {
      MERGE.lastIndex = 0;
      for (let m = MERGE.exec(text); m; m = MERGE.exec(text)) {
        merges.push(m[1]);
        end = MERGE.lastIndex;
      }
    }
    const open = text.lastIndexOf("<mergeCell");
    tail = open >= end && !text.includes(">", open) ? text.slice(open) : text.slice(Math.max(end, text.length - 10));
    yield chunk;
  }
}

async function readSheet(sheet: StreamSheet): Promise<SheetRead> {
  const merges: string[] = [];
  sheet.iterator = collectMerges(sheet.iterator, merges);
  const records: RawRow[] = [];
  let previous = 0;
  for await (const row of sheet) {
    // A row without a readable index follows the one before it (ECMA-376 Part 1, §18.3.1.73: the row's
    // r attribute is optional); a damaged file must not give messages about "row null".
    const rowNumber = Number.isInteger(row.number) && row.number > 0 ? row.number : previous + 1;
    previous = rowNumber;
    const values = row.values as CellValue[];
    checkColumn(values.length - 1, rowNumber);
    const cells: string[] = [];
    for (let c = 1; c < values.length; c++) cells.push(cellText(values[c] ?? null).trim());
    if (cells.some((c) => c !== "")) records.push({ rowNumber, cells });
  }
  fillMerges(records, merges);
  padRows(records);
  return { name: sheet.name, records, merges };
}

function padRows(records: RawRow[]) {
  let width = 0;
  for (const r of records) width = Math.max(width, r.cells.length);
  for (const r of records) while (r.cells.length < width) r.cells.push("");
}

const firstFilledRow = (s: SheetRead) => s.records.find((r) => r.cells.some((c) => c !== ""))?.cells ?? null;

const BROKEN =
  "This file looks like a zipped Office file but is not a readable .xlsx workbook. Save it again as .xlsx or CSV.";

type ReadOptions = { sheet?: string; looksLikeHeader?: (cells: string[]) => boolean };

// The sheet asked for by name; else the first sheet whose header row looks like a fixture list (per
// `looksLikeHeader`), else the first sheet with data. Sheets are read (`read`) only as far as needed.
function chooseSheet(
  sheets: Array<{ name: string; read: () => SheetRead }>,
  sheetNames: string[],
  opts: ReadOptions,
): RawTable {
  let chosen: SheetRead | undefined;
  if (opts.sheet) {
    chosen = sheets.find((s) => s.name === opts.sheet)?.read();
    if (!chosen)
      throw new FileProblem(`The workbook has no sheet called "${opts.sheet}". Its sheets: ${sheetNames.join(", ")}.`);
  } else {
    let firstWithData: SheetRead | undefined;
    for (const sheet of sheets) {
      const s = sheet.read();
      if (!s.records.length) continue;
      firstWithData ??= s;
      const first = firstFilledRow(s);
      if (first && opts.looksLikeHeader?.(first)) {
        chosen = s;
        break;
      }
    }
    chosen ??= firstWithData;
    if (!chosen) throw new FileProblem("Every sheet in the workbook is empty.");
  }
  return toRawTable(chosen.records, { decimalComma: false, sheetNames, sheet: chosen.name });
}

/**
 * Reads an .xlsx workbook: values only, straight from its XML (xlsx-sheet-xml.ts), or with ExcelJS's
 * streaming reader when the workbook is laid out in a way that reader does not take. The sheet names
 * go back to the caller (in tab order) so a person can pick another sheet.
 */
export async function readXlsx(bytes: Uint8Array, opts: ReadOptions = {}): Promise<RawTable> {
  let workbook: XmlWorkbook | null;
  let repacked: Uint8Array | undefined;
  try {
    workbook = openXmlWorkbook(bytes);
    if (!workbook) repacked = repackWorkbook(bytes);
  } catch (err) {
    if (err instanceof FileProblem) throw err;
    throw new FileProblem(BROKEN);
  }
  if (!workbook) return readXlsxWithExcelJs(repacked!, opts);
  const read = (s: XmlSheet): SheetRead => {
    const { records, merges } = s.read();
    fillMerges(records, merges);
    padRows(records);
    return { name: s.name, records, merges };
  };
  return chooseSheet(
    workbook.sheets.map((s) => ({ name: s.name, read: () => read(s) })),
    workbook.sheets.map((s) => s.name),
    opts,
  );
}

/** The same with ExcelJS's streaming reader (values only: no workbook model); exported for its tests. */
export async function readXlsxWithExcelJs(bytes: Uint8Array, opts: ReadOptions): Promise<RawTable> {
  const input = Readable.from([Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength)]);
  // Styles are read so that date cells come back as dates (their format says so), not day numbers.
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(input, {
    worksheets: "emit",
    sharedStrings: "cache",
    hyperlinks: "ignore",
    styles: "cache",
    entries: "ignore",
  });
  const read: SheetRead[] = [];
  try {
    for await (const sheet of reader as unknown as AsyncIterable<StreamSheet>) {
      // With a sheet asked for, the others pass by unread (ExcelJS drains them).
      if (opts.sheet && sheet.name !== opts.sheet) continue;
      read.push(await readSheet(sheet));
    }
  } catch (err) {
    if (err instanceof FileProblem) throw err;
    throw new FileProblem(BROKEN);
  }
  // Workbook order, which is what a person sees in the tabs (the zip's order can differ).
  const model = (reader as unknown as { model?: { sheets?: Array<{ name: string }> } }).model;
  const sheetNames = model?.sheets?.map((s) => s.name) ?? read.map((s) => s.name);
  if (!sheetNames.length) throw new FileProblem("The workbook has no sheets.");
  const order = (s: SheetRead) => sheetNames.indexOf(s.name);
  read.sort((a, b) => order(a) - order(b));
  return chooseSheet(
    read.map((s) => ({ name: s.name, read: () => s })),
    sheetNames,
    opts,
  );
}

import Papa from "papaparse";
import { neutraliseCell } from "./neutralise";
import type { CellOut, SheetOut } from "./sheet";

const text = (v: CellOut) =>
  v == null ? "" : typeof v === "boolean" ? (v ? "yes" : "no") : typeof v === "number" ? String(v) : neutraliseCell(v);

/**
 * One sheet as CSV: comma-separated, CRLF line ends, quotes where needed, and a UTF-8 byte-order mark
 * so spreadsheet programs read accented names correctly.
 */
export function writeCsv(sheet: SheetOut): string {
  const data = [sheet.columns.map((c) => neutraliseCell(c.header)), ...sheet.rows.map((r) => r.map(text))];
  return "\ufeff" + Papa.unparse(data, { newline: "\r\n", quotes: false, escapeFormulae: false }) + "\r\n";
}

import Papa from "papaparse";
import { FileProblem, toRawTable, type RawRow, type RawTable } from "./raw-table";

/**
 * Reads CSV text: comma, semicolon or tab delimited (detected), CRLF or LF, quoted fields with
 * commas and line breaks. Row numbers count records, as a spreadsheet shows them.
 */
export function readCsv(text: string): RawTable {
  const clean = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (clean.trim() === "") throw new FileProblem("The file has no text in it.");
  const parsed = Papa.parse<string[]>(clean, { skipEmptyLines: false, delimitersToGuess: [",", ";", "\t", "|"] });
  const broken = parsed.errors.find((e) => e.type === "Quotes");
  if (broken) {
    const row = (broken.row ?? 0) + 1;
    throw new FileProblem(
      `Row ${row}: a quoted field is opened but never closed, so the rest of the file cannot be read. Check the quote marks in that row.`,
    );
  }
  const records: RawRow[] = parsed.data.map((cells, i) => ({ rowNumber: i + 1, cells: cells.map((c) => c ?? "") }));
  return toRawTable(records, { decimalComma: parsed.meta.delimiter === ";" });
}

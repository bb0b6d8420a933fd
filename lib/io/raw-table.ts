// The shape every reader produces: a header row and data rows as text, each row with the number a
// person sees in a spreadsheet (so an error can say "row 14, column Address").

export const MAX_IMPORT_ROWS = 20_000;

export type RawRow = { rowNumber: number; cells: string[] };
export type RawTable = {
  headers: string[];
  rows: RawRow[];
  headerRowNumber: number;
  notes: string[]; // things we fixed on the way in (duplicate headers, blank header cells)
  decimalComma: boolean; // semicolon files usually write 3,2 for 3.2
  sheetNames?: string[];
  sheet?: string;
};

export class FileProblem extends Error {
  constructor(message: string) {
    super(message);
    this.name = "FileProblem";
  }
}

const isBlank = (cells: string[]) => cells.every((c) => c.trim() === "");

const columnLetter = (i: number): string =>
  (i >= 26 ? columnLetter(Math.floor(i / 26) - 1) : "") + String.fromCharCode(65 + (i % 26));

/** Finds the header row (the first non-blank row), names blank and repeated headers, and drops blank rows. */
export function toRawTable(records: RawRow[], extra: Pick<RawTable, "decimalComma"> & Partial<RawTable>): RawTable {
  const headerIndex = records.findIndex((r) => !isBlank(r.cells));
  if (headerIndex < 0) throw new FileProblem("The file has no rows with any text in them.");
  const header = records[headerIndex];
  const notes: string[] = [];
  const seen = new Map<string, number>();
  const headers = header.cells.map((raw, i) => {
    let name = raw.replace(/\s+/g, " ").trim();
    if (!name) {
      name = `Column ${columnLetter(i)}`;
    }
    const key = name.toLowerCase();
    const count = (seen.get(key) ?? 0) + 1;
    seen.set(key, count);
    if (count > 1) {
      notes.push(
        `The header "${name}" appears more than once; the copy in column ${columnLetter(i)} is called "${name} (${count})".`,
      );
      name = `${name} (${count})`;
    }
    return name;
  });
  const rows = records.slice(headerIndex + 1).filter((r) => !isBlank(r.cells));
  if (rows.length > MAX_IMPORT_ROWS)
    throw new FileProblem(
      `The file has ${rows.length} rows; at most ${MAX_IMPORT_ROWS} can be imported at once. Split it into parts.`,
    );
  for (const r of rows) while (r.cells.length < headers.length) r.cells.push("");
  return { headers, rows, headerRowNumber: header.rowNumber, notes, ...extra };
}

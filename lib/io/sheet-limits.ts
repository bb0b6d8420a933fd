// Bounds on what a spreadsheet may make the server hold. A few hundred bytes of sheet XML can name a cell in
// column XFD or a merged block a million rows tall; expanding either before the import's own limits are
// checked would take gigabytes. Everything a reader builds is kept within these bounds first.
import { FileProblem, MAX_IMPORT_ROWS, type RawRow } from "./raw-table";

/** A rig sheet needs a few dozen columns; 256 (A … IV) leaves room for anyone's extra notes. */
export const MAX_IMPORT_COLUMNS = 256;
// Excel's own sheet limits (1,048,576 rows × 16,384 columns, A … XFD); a sheet that says it is larger is damaged.
const SHEET_MAX_ROWS = 1_048_576;
const SHEET_MAX_COLUMNS = 16_384;

export const columnLetters = (col: number) => {
  let s = "";
  for (let n = col; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
};

/** Refuses a cell past the column limit, naming it as a person sees it. */
export function checkColumn(col: number, rowNumber: number) {
  if (col > MAX_IMPORT_COLUMNS) {
    throw new FileProblem(
      `Cell ${columnLetters(col)}${rowNumber} is past column ${columnLetters(MAX_IMPORT_COLUMNS)}; a rig sheet needs far fewer columns. Delete the columns at the far right, or save the rig's columns as CSV.`,
    );
  }
}

/** Refuses a sheet whose declared size (`<dimension ref="A1:…"/>`) is beyond any spreadsheet's limits. */
export function checkDeclaredDimension(ref: string | undefined) {
  const m = ref && /^[A-Z]+[0-9]+:([A-Z]+)([0-9]+)$/.exec(ref);
  if (!m) return;
  const col = [...m[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0);
  if (col > SHEET_MAX_COLUMNS || Number(m[2]) > SHEET_MAX_ROWS) {
    throw new FileProblem(
      `The sheet says it spans ${ref}, which is larger than a spreadsheet can be: the file is damaged. Save it again as .xlsx or CSV.`,
    );
  }
}

type Cell = { row: number; col: number };
const decode = (ref: string): Cell => {
  const m = /^([A-Z]+)([0-9]+)$/.exec(ref)!;
  return { row: Number(m[2]), col: [...m[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0) };
};

/**
 * A merged block holds its value in the top-left cell; every cell of the block reads that value (a position
 * name merged down a column applies to each row). Each block is first clipped to the sheet's real data (the
 * last row and column that hold anything), so a block declared far past the data fills nothing there; rows a
 * block would add past the import's row limit are refused before they are built.
 */
export function fillMerges(records: RawRow[], merges: string[]) {
  if (!merges.length || !records.length) return;
  let lastRow = 0;
  let lastCol = 0;
  for (const r of records) {
    lastRow = Math.max(lastRow, r.rowNumber);
    lastCol = Math.max(lastCol, r.cells.length);
  }
  const byNumber = new Map(records.map((r) => [r.rowNumber, r]));
  for (const range of merges) {
    const [a, b] = range.split(":").map(decode);
    const value = byNumber.get(a.row)?.cells[a.col - 1] ?? "";
    if (!value) continue;
    const lastFilledRow = Math.min(b.row, lastRow);
    const lastFilledCol = Math.min(b.col, lastCol);
    for (let r = a.row; r <= lastFilledRow; r++) {
      let record = byNumber.get(r);
      if (!record) {
        // +1: the header row is one of the records.
        if (records.length >= MAX_IMPORT_ROWS + 1) {
          throw new FileProblem(
            `The merged cells ${range} run past ${MAX_IMPORT_ROWS.toLocaleString("en")} rows, more than can be imported at once. Unmerge them, or split the sheet into parts.`,
          );
        }
        record = { rowNumber: r, cells: [] };
        byNumber.set(r, record);
        records.push(record);
      }
      for (let c = a.col; c <= lastFilledCol; c++) {
        while (record.cells.length < c) record.cells.push("");
        record.cells[c - 1] = value;
      }
    }
  }
  records.sort((x, y) => x.rowNumber - y.rowNumber);
}

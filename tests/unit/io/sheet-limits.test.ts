import { strToU8, zipSync } from "fflate";
import { describe, expect, it } from "vitest";
import { columnLetters, fillMerges, MAX_IMPORT_COLUMNS } from "@/lib/io/sheet-limits";
import { MAX_IMPORT_ROWS } from "@/lib/io/raw-table";
import { readXlsx } from "@/lib/io/xlsx-read";

// A minimal SpreadsheetML package (ECMA-376 Part 1): workbook, its relationships and one sheet.
const ns =
  'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';
const rel = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
function workbook(sheetData: string, extra = "", dimension = "") {
  return zipSync({
    "xl/workbook.xml": strToU8(
      `<workbook ${ns}><sheets><sheet name="Rig" sheetId="1" r:id="rId1"/></sheets></workbook>`,
    ),
    "xl/_rels/workbook.xml.rels": strToU8(
      `<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="${rel}/worksheet" Target="worksheets/sheet1.xml"/></Relationships>`,
    ),
    "xl/worksheets/sheet1.xml": strToU8(
      `<worksheet ${ns}>${dimension}<sheetData>${sheetData}</sheetData>${extra}</worksheet>`,
    ),
  });
}
const inline = (ref: string, text: string) => `<c r="${ref}" t="inlineStr"><is><t>${text}</t></is></c>`;
const header = `<row r="1">${inline("A1", "Position")}${inline("B1", "Unit")}</row>`;

describe("merged cells are clipped to the sheet's data before they are expanded", () => {
  it("a block declared 20,000 rows by 1,600 columns fills only the cells that hold data (a 1 KB file)", async () => {
    const file = workbook(
      `${header}<row r="2">${inline("A2", "1st Electric")}${inline("B2", "7")}</row>`,
      '<mergeCells count="1"><mergeCell ref="A2:BHJ20001"/></mergeCells>',
    );
    expect(file.length).toBeLessThan(1500);
    const t = await readXlsx(file);
    // Data ends at row 2, column B: the block fills A2:B2 and nothing past it.
    expect(t.rows).toEqual([{ rowNumber: 2, cells: ["1st Electric", "1st Electric"] }]);
  });

  it("a block to the sheet's last cell (A2:XFD1048576) is read in bounded time and memory", async () => {
    const file = workbook(
      `${header}<row r="2">${inline("A2", "Boom SL")}</row><row r="3">${inline("B3", "4")}</row>`,
      '<mergeCells count="1"><mergeCell ref="A2:XFD1048576"/></mergeCells>',
    );
    const before = process.memoryUsage().heapUsed;
    const t = await readXlsx(file);
    expect(process.memoryUsage().heapUsed - before).toBeLessThan(50 * 1024 * 1024);
    expect(t.rows.map((r) => r.cells)).toEqual([
      ["Boom SL", "Boom SL"],
      ["Boom SL", "Boom SL"],
    ]);
  });

  it("a block that would add more rows than an import takes is refused, naming the block", () => {
    // Sparse data: the header, and one stray value far down; the block between them would build 30,000 rows.
    const records = [
      { rowNumber: 1, cells: ["Position", "Unit"] },
      { rowNumber: 2, cells: ["FOH", "1"] },
      { rowNumber: 30_001, cells: ["", "x"] },
    ];
    expect(() => fillMerges(records, ["A2:A30001"])).toThrow(/A2:A30001.*20,000 rows/);
    expect(MAX_IMPORT_ROWS).toBe(20_000);
  });

  it("still fills an ordinary block: a position name merged down its units", () => {
    const records = [
      { rowNumber: 1, cells: ["Position", "Unit"] },
      { rowNumber: 2, cells: ["2nd Electric", "1"] },
      { rowNumber: 3, cells: ["", "2"] },
      { rowNumber: 5, cells: ["", "3"] },
    ];
    fillMerges(records, ["A2:A5"]);
    expect(records.map((r) => [r.rowNumber, r.cells[0]])).toEqual([
      [1, "Position"],
      [2, "2nd Electric"],
      [3, "2nd Electric"],
      [4, "2nd Electric"],
      [5, "2nd Electric"],
    ]);
  });
});

describe("columns and declared sizes", () => {
  it("names a cell past the column limit instead of building a 16,384-cell row for it", async () => {
    const file = workbook(`${header}<row r="2">${inline("A2", "FOH")}${inline("XFD2", "stray")}</row>`);
    await expect(readXlsx(file)).rejects.toThrow(/Cell XFD2 is past column IV/);
    expect(columnLetters(MAX_IMPORT_COLUMNS)).toBe("IV");
    // Column letters are bijective base 26 (A = 1 … Z = 26, AA = 27); XFD is Excel's last column, 16,384.
    expect(columnLetters(27)).toBe("AA");
    expect(columnLetters(16_384)).toBe("XFD");
  });

  it("refuses a sheet that declares itself larger than any spreadsheet can be", async () => {
    const file = workbook(header, "", '<dimension ref="A1:XFE2000000"/>');
    await expect(readXlsx(file)).rejects.toThrow(/larger than a spreadsheet can be/);
    // A loose but possible declared size is not a reason to refuse (many programs write one).
    const loose = workbook(
      `${header}<row r="2">${inline("A2", "FOH")}${inline("B2", "3")}</row>`,
      "",
      '<dimension ref="A1:XFD1048576"/>',
    );
    expect((await readXlsx(loose)).rows).toHaveLength(1);
  });
});

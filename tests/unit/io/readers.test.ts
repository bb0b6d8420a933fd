import { describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { readCsv } from "@/lib/io/csv-read";
import { readXlsx } from "@/lib/io/xlsx-read";
import { sniffFile } from "@/lib/io/sniff";
import { looksLikeFixtureHeader } from "@/lib/io/fields";
import { FileProblem } from "@/lib/io/table";

const bytes = (s: string) => new TextEncoder().encode(s);

describe("readCsv", () => {
  it("reads a BOM, semicolons, CRLF and quoted fields with commas and line breaks", () => {
    const t = readCsv('\ufeffPosition;Unit;Notes\r\n"1st Electric";7;"hot, check lamp\r\nand frame"\r\n\r\n;;\r\nBoom SL;2;plain\r\n');
    expect(t.headers).toEqual(["Position", "Unit", "Notes"]);
    expect(t.decimalComma).toBe(true);
    expect(t.rows.map((r) => r.cells)).toEqual([
      ["1st Electric", "7", "hot, check lamp\r\nand frame"],
      ["Boom SL", "2", "plain"],
    ]);
    // common practice, no source: rows count records as a spreadsheet shows them; blank rows keep their numbers.
    expect(t.rows.map((r) => r.rowNumber)).toEqual([2, 5]);
  });

  it("names repeated and blank headers instead of losing a column", () => {
    const t = readCsv("Position,Unit,Notes,,notes\nA,1,x,y,z\n");
    expect(t.headers).toEqual(["Position", "Unit", "Notes", "Column D", "notes (2)"]);
    expect(t.notes.join(" ")).toContain("more than once");
  });

  it("says which row has an unclosed quote", () => {
    expect(() => readCsv('Position,Unit\nA,1\nB,"2\n')).toThrow(/Row 3/);
  });

  it("refuses a file of blank lines", () => {
    expect(() => readCsv("\r\n\r\n  \r\n")).toThrow(FileProblem);
  });
});

describe("sniffFile", () => {
  it("refuses empty, oversized, legacy and binary files with a reason", () => {
    expect(sniffFile(new Uint8Array(0), "rig.csv")).toMatchObject({ kind: "refused", message: expect.stringContaining("empty") });
    expect(sniffFile(new Uint8Array(11), "big.csv", 10)).toMatchObject({ kind: "refused", message: expect.stringContaining("limit") });
    expect(sniffFile(new Uint8Array([0xd0, 0xcf, 0x11, 0xe0, 1, 2]))).toMatchObject({ kind: "refused", message: expect.stringContaining(".xls") });
    expect(sniffFile(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0, 0]), "photo.csv")).toMatchObject({ kind: "refused", message: expect.stringContaining("binary") });
  });

  it("recognises a zip as a workbook whatever its name, and strips a BOM from text", () => {
    expect(sniffFile(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0]), "renamed.csv").kind).toBe("xlsx");
    expect(sniffFile(bytes("\ufeffPosition,Unit\n"))).toEqual({ kind: "csv", text: "Position,Unit\n" });
  });
});

async function workbook(build: (wb: ExcelJS.Workbook) => void) {
  const wb = new ExcelJS.Workbook();
  build(wb);
  return new Uint8Array(await wb.xlsx.writeBuffer());
}

describe("readXlsx", () => {
  it("picks the sheet that holds the fixture list, fills merged cells, reads numbers stored as text", async () => {
    const file = await workbook((wb) => {
      wb.addWorksheet("Cover").addRow(["Salt and Lantern — rig"]);
      const s = wb.addWorksheet("Fixtures");
      s.addRow(["Position", "Unit", "Channel", "X"]);
      s.addRow(["1st Electric", 1, "12", { formula: "1+2", result: 3 }]);
      s.addRow([null, 2, 13, -1.5]);
      s.mergeCells("A2:A3");
    });
    const t = await readXlsx(file, { looksLikeHeader: looksLikeFixtureHeader });
    expect(t.sheet).toBe("Fixtures");
    expect(t.sheetNames).toEqual(["Cover", "Fixtures"]);
    expect(t.rows).toEqual([
      { rowNumber: 2, cells: ["1st Electric", "1", "12", "3"] },
      { rowNumber: 3, cells: ["1st Electric", "2", "13", "-1.5"] },
    ]);
  });

  it("names the sheets when asked for one that does not exist, and refuses a broken zip", async () => {
    const file = await workbook((wb) => wb.addWorksheet("Rig").addRow(["Position", "Unit"]));
    await expect(readXlsx(file, { sheet: "Nope" })).rejects.toThrow(/Rig/);
    await expect(readXlsx(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3]))).rejects.toThrow(FileProblem);
  });
});

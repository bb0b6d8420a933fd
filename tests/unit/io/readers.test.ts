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

  it("fills merged blocks anywhere in a large sheet the way ExcelJS's full workbook model reads them", async () => {
    // Reference: ExcelJS's full (non-streaming) reader, whose cell.master gives each merged cell's value.
    // 2,000 rows of long text put the <mergeCell> list far into the sheet's XML, across many chunks.
    const file = await workbook((wb) => {
      wb.addWorksheet("Cover").addRow(["notes"]);
      const s = wb.addWorksheet("Rig");
      s.addRow(["Position", "Unit", "Purpose", "Colour"]);
      for (let i = 0; i < 2000; i++) s.addRow([i % 7 ? null : `Pipe ${i}`, i + 1, `wash ${"x".repeat(60)} ${i}`, i % 5 ? null : "L201"]);
      for (let i = 0; i < 2000; i += 7) s.mergeCells(`A${i + 2}:A${Math.min(i + 8, 2001)}`);
      for (let i = 0; i < 2000; i += 5) s.mergeCells(`D${i + 2}:D${i + 3}`);
    });
    const reference = new ExcelJS.Workbook();
    await reference.xlsx.load(file as unknown as ArrayBuffer);
    const expected: string[][] = [];
    reference.getWorksheet("Rig")!.eachRow((row, n) => {
      if (n > 1) expected.push([1, 2, 3, 4].map((c) => String((row.getCell(c).isMerged ? row.getCell(c).master : row.getCell(c)).value ?? "")));
    });
    const t = await readXlsx(file, { looksLikeHeader: looksLikeFixtureHeader });
    expect(t.sheet).toBe("Rig");
    expect(t.rows.map((r) => r.cells)).toEqual(expected);
    expect(t.rows[1].cells[0]).toBe("Pipe 0");
    expect(t.rows[1999].cells[3]).toBe("");
  });

  it("reads the sheet asked for by name, dates as dates and booleans as yes/no", async () => {
    const file = await workbook((wb) => {
      wb.addWorksheet("Rig").addRow(["Position", "Unit"]);
      const s = wb.addWorksheet("Second");
      s.addRow(["Position", "Unit", "Checked", "Hung"]);
      s.addRow(["Boom SL", "3", new Date(Date.UTC(2026, 11, 2)), true]);
      s.getCell("C2").numFmt = "dd/mm/yyyy";
    });
    const t = await readXlsx(file, { sheet: "Second" });
    expect(t.sheet).toBe("Second");
    expect(t.sheetNames).toEqual(["Rig", "Second"]);
    expect(t.rows).toEqual([{ rowNumber: 2, cells: ["Boom SL", "3", "2026-12-02", "yes"] }]);
  });

  it("names the sheets when asked for one that does not exist, and refuses a broken zip", async () => {
    const file = await workbook((wb) => wb.addWorksheet("Rig").addRow(["Position", "Unit"]));
    await expect(readXlsx(file, { sheet: "Nope" })).rejects.toThrow(/Rig/);
    await expect(readXlsx(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3]))).rejects.toThrow(FileProblem);
  });
});

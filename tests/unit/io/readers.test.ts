import { describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { strToU8, zipSync } from "fflate";
import { readCsv } from "@/lib/io/csv-read";
import { readXlsx, readXlsxWithExcelJs } from "@/lib/io/xlsx-read";
import { openXmlWorkbook } from "@/lib/io/xlsx-sheet-xml";
import { sniffFile } from "@/lib/io/file-kind";
import { looksLikeFixtureHeader } from "@/lib/io/fields";
import { FileProblem } from "@/lib/io/raw-table";

const bytes = (s: string) => new TextEncoder().encode(s);

describe("readCsv", () => {
  it("reads a BOM, semicolons, CRLF and quoted fields with commas and line breaks", () => {
    const t = readCsv(
      '\ufeffPosition;Unit;Notes\r\n"1st Electric";7;"hot, check lamp\r\nand frame"\r\n\r\n;;\r\nBoom SL;2;plain\r\n',
    );
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
    expect(sniffFile(new Uint8Array(0), "rig.csv")).toMatchObject({
      kind: "refused",
      message: expect.stringContaining("empty"),
    });
    expect(sniffFile(new Uint8Array(11), "big.csv", 10)).toMatchObject({
      kind: "refused",
      message: expect.stringContaining("limit"),
    });
    expect(sniffFile(new Uint8Array([0xd0, 0xcf, 0x11, 0xe0, 1, 2]))).toMatchObject({
      kind: "refused",
      message: expect.stringContaining(".xls"),
    });
    expect(sniffFile(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0, 0]), "photo.csv")).toMatchObject({
      kind: "refused",
      message: expect.stringContaining("binary"),
    });
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

  it.each([
    ["from the sheet XML", readXlsx],
    ["with ExcelJS's streaming reader (the fallback)", readXlsxWithExcelJs],
  ])(
    "fills merged blocks anywhere in a large sheet the way ExcelJS's full workbook model reads them (%s)",
    async (_, read) => {
      // Reference: ExcelJS's full (non-streaming) reader, whose cell.master gives each merged cell's value.
      // 2,000 rows of long text put the <mergeCell> list far into the sheet's XML, across many chunks.
      const file = await workbook((wb) => {
        wb.addWorksheet("Cover").addRow(["notes"]);
        const s = wb.addWorksheet("Rig");
        s.addRow(["Position", "Unit", "Purpose", "Colour"]);
        for (let i = 0; i < 2000; i++)
          s.addRow([i % 7 ? null : `Pipe ${i}`, i + 1, `wash ${"x".repeat(60)} ${i}`, i % 5 ? null : "pale blue"]);
        for (let i = 0; i < 2000; i += 7) s.mergeCells(`A${i + 2}:A${Math.min(i + 8, 2001)}`);
        for (let i = 0; i < 2000; i += 5) s.mergeCells(`D${i + 2}:D${i + 3}`);
      });
      const reference = new ExcelJS.Workbook();
      await reference.xlsx.load(file as unknown as ArrayBuffer);
      const expected: string[][] = [];
      reference.getWorksheet("Rig")!.eachRow((row, n) => {
        if (n > 1)
          expected.push(
            [1, 2, 3, 4].map((c) =>
              String((row.getCell(c).isMerged ? row.getCell(c).master : row.getCell(c)).value ?? ""),
            ),
          );
      });
      const t = await read(file, { looksLikeHeader: looksLikeFixtureHeader });
      expect(t.sheet).toBe("Rig");
      expect(t.rows.map((r) => r.cells)).toEqual(expected);
      expect(t.rows[1].cells[0]).toBe("Pipe 0");
      expect(t.rows[1999].cells[3]).toBe("");
    },
  );

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

  it("reads SpreadsheetML as other programs write it: tab order, rich and inline text, no cell refs, booleans, errors, dates", async () => {
    // Hand-written parts per ECMA-376 Part 1 (SpreadsheetML); the expected text follows from the markup.
    const ns =
      'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';
    const rel = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
    const file = zipSync({
      "[Content_Types].xml": strToU8("<Types/>"),
      "xl/workbook.xml": strToU8(
        `<workbook ${ns}><workbookPr date1904="1"/><sheets><sheet name="Notes &amp; cover" sheetId="2" r:id="rId2"/><sheet name="Rig" sheetId="1" r:id="rId1"/></sheets></workbook>`,
      ),
      "xl/_rels/workbook.xml.rels": strToU8(
        `<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="${rel}/worksheet" Target="worksheets/sheet1.xml"/><Relationship Id="rId2" Type="${rel}/worksheet" Target="/xl/worksheets/sheet2.xml"/><Relationship Id="rId3" Type="${rel}/sharedStrings" Target="sharedStrings.xml"/><Relationship Id="rId4" Type="${rel}/styles" Target="styles.xml"/></Relationships>`,
      ),
      "xl/sharedStrings.xml": strToU8(
        `<sst ${ns}><si><t>Position</t></si><si><t xml:space="preserve">Unit </t></si><si><r><rPr><b/></rPr><t>1st </t></r><r><t>Electric</t></r><rPh sb="0" eb="1"><t>x</t></rPh></si><si><t>a_x000D_b &lt;c&gt;</t></si></sst>`,
      ),
      "xl/styles.xml": strToU8(
        `<styleSheet ${ns}><numFmts count="1"><numFmt numFmtId="164" formatCode="&quot;on&quot; d mmm yyyy"/></numFmts><cellXfs count="3"><xf numFmtId="0"/><xf numFmtId="14"/><xf numFmtId="164"/></cellXfs></styleSheet>`,
      ),
      "xl/worksheets/sheet2.xml": strToU8(
        `<worksheet ${ns}><sheetData><row r="1"><c r="A1" t="inlineStr"><is><t>Cover</t></is></c></row></sheetData></worksheet>`,
      ),
      "xl/worksheets/sheet1.xml": strToU8(
        `<worksheet ${ns}><sheetData>` +
          `<row r="1"><c r="A1" t="s"><v>0</v></c><c r="B1" t="s"><v>1</v></c><c r="C1" t="inlineStr"><is><t>Hung</t></is></c><c r="D1" t="inlineStr"><is><t>Notes</t></is></c><c r="E1" t="inlineStr"><is><t>Date</t></is></c></row>` +
          `<row><c t="s"><v>2</v></c><c><v>007</v></c><c t="b"><v>1</v></c><c t="s"><v>3</v></c><c s="1"><v>0</v></c></row>` +
          `<row r="4"><c r="A4" t="str"><f>A2</f><v>Boom &amp; ladder</v></c><c r="B4"><v>2.50</v></c><c r="C4" t="b"><v>0</v></c><c r="D4" t="e"><v>#N/A</v></c><c r="E4" s="2"><v>1</v></c></row>` +
          `<row r="5"/></sheetData></worksheet>`,
      ),
    });
    const t = await readXlsx(file, { looksLikeHeader: looksLikeFixtureHeader });
    expect(t.sheetNames).toEqual(["Notes & cover", "Rig"]);
    expect(t.sheet).toBe("Rig");
    expect(t.headers).toEqual(["Position", "Unit", "Hung", "Notes", "Date"]);
    // 1904 date system: day 0 is 1904-01-01 (ECMA-376 Part 1, 18.17.4.1).
    expect(t.rows).toEqual([
      { rowNumber: 2, cells: ["1st Electric", "7", "yes", "a\rb <c>", "1904-01-01"] },
      { rowNumber: 4, cells: ["Boom & ladder", "2.5", "no", "", "1904-01-02"] },
    ]);
  });

  it("names the sheets when asked for one that does not exist, and refuses a broken zip", async () => {
    const file = await workbook((wb) => wb.addWorksheet("Rig").addRow(["Position", "Unit"]));
    await expect(readXlsx(file, { sheet: "Nope" })).rejects.toThrow(/Rig/);
    await expect(readXlsx(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3]))).rejects.toThrow(FileProblem);
  });
});

describe("a workbook that unpacks to far more than it weighs", () => {
  it("is refused from the parts' declared sizes, before they are inflated", () => {
    // 3 MB of one repeated character deflates to a few kilobytes: the shape of a zip bomb, in small.
    const sheet = `<worksheet><sheetData>${" ".repeat(3 * 1024 * 1024)}</sheetData></worksheet>`;
    const bytes = zipSync({
      "xl/workbook.xml": strToU8('<workbook><sheets><sheet name="Rig" r:id="rId1"/></sheets></workbook>'),
      "xl/worksheets/sheet1.xml": strToU8(sheet),
    });
    expect(bytes.length).toBeLessThan(64 * 1024);
    expect(() => openXmlWorkbook(bytes, { maxUnzippedBytes: 1024 * 1024 })).toThrow(FileProblem);
    expect(() => openXmlWorkbook(bytes, { maxUnzippedBytes: 1024 * 1024 })).toThrow(/unpacks to more than 1 MB/);
    // Under the cap the same file is simply read on (and, lacking its relationships, left to ExcelJS).
    expect(openXmlWorkbook(bytes, { maxUnzippedBytes: 8 * 1024 * 1024 })).toBeNull();
  });
});

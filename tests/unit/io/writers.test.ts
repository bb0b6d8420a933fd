import { describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { neutraliseCell, restoreCell } from "@/lib/io/neutralise";
import { writeCsv } from "@/lib/io/csv-write";
import { writeXlsx } from "@/lib/io/xlsx-write";
import { readCsv } from "@/lib/io/csv-read";

describe("neutraliseCell", () => {
  it("prefixes text starting with = + - @ tab or carriage return", () => {
    // OWASP CSV injection: these leading characters can start a formula
    for (const s of ["=1+1", "+SUM(A1)", "-2+3", "@cmd", "\tx", "\rx"]) expect(neutraliseCell(s)).toBe(`'${s}`);
    expect(neutraliseCell("pale blue + light frost")).toBe("pale blue + light frost");
  });

  it("leaves plain numbers alone and reverses on import", () => {
    expect(neutraliseCell("-3.25")).toBe("-3.25"); // common practice, no source: a signed number is not a formula
    expect(restoreCell("'=1+1")).toBe("=1+1");
    expect(restoreCell("'quoted")).toBe("'quoted");
  });
});

describe("writers", () => {
  const sheet = {
    name: "Hang",
    columns: [
      { header: "Position", width: 12 },
      { header: "X (m)", width: 8 },
      { header: "Notes", width: 20 },
    ],
    rows: [
      ["LX1", -3.5, '=cmd|"/c calc"!A0'],
      ["Boom, SL", 2, "line\nbreak"],
    ],
  };

  it("writes CSV that reads back cell for cell", () => {
    const csv = writeCsv(sheet);
    expect(csv.startsWith("\ufeffPosition,X (m),Notes\r\n")).toBe(true);
    const back = readCsv(csv);
    expect(back.rows.map((r) => r.cells)).toEqual([
      ["LX1", "-3.5", `'=cmd|"/c calc"!A0`],
      ["Boom, SL", "2", "line\nbreak"],
    ]);
  });

  it("writes a workbook with a frozen bold header, widths and numbers as numbers", async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await writeXlsx([sheet, { ...sheet, name: "Hang" }])) as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(["Hang", "Hang 2"]);
    const ws = wb.worksheets[0];
    expect(ws.views[0]).toMatchObject({ state: "frozen", ySplit: 1 });
    expect(ws.getRow(1).font?.bold).toBe(true);
    expect(ws.getColumn(3).width).toBe(20);
    expect(ws.getCell("B2").value).toBe(-3.5);
    expect(ws.getCell("C2").value).toBe(`'=cmd|"/c calc"!A0`); // OWASP CSV injection
  });
});

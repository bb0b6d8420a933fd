// Property tests over the file readers: CSV, .xlsx and the USITT ASCII cue reader. Whatever the bytes,
// the table readers return a table or throw their documented FileProblem (a message for the person
// importing); the cue reader never throws (problems are listed by line). And what a workbook or CSV
// holds, the reader gives back.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import ExcelJS from "exceljs";
import { strToU8, zipSync } from "fflate";
import { describe, expect, it } from "vitest";
import { readCsv } from "@/lib/io/csv-read";
import { readTable } from "@/lib/io/read-table";
import { readXlsx } from "@/lib/io/xlsx-read";
import { FileProblem } from "@/lib/io/raw-table";
import { readUsittAscii } from "@/lib/cues/usitt-ascii-read";

/** Runs `read`; it must give a table, or throw a FileProblem with a message, within 10 seconds. */
async function tableOrFileProblem(read: () => unknown) {
  let timer: NodeJS.Timeout | undefined;
  const deadline = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error("the reader neither answered nor gave up within 10 s")), 10_000);
  });
  try {
    const t = (await Promise.race([read(), deadline])) as {
      headers: string[];
      rows: Array<{ rowNumber: number; cells: string[] }>;
    };
    expect(Array.isArray(t.headers)).toBe(true);
    for (const r of t.rows) {
      expect(Number.isInteger(r.rowNumber)).toBe(true);
      expect(r.cells.every((c) => typeof c === "string")).toBe(true);
    }
  } catch (err) {
    if (!(err instanceof FileProblem)) throw err;
    expect(err.message.length).toBeGreaterThan(10);
  } finally {
    clearTimeout(timer);
  }
}

// Cell text with the characters that matter to CSV: quotes, delimiters, line ends, a BOM, non-ASCII.
const cellText = fc
  .array(
    fc.constantFrom("a", "B", "7", " ", ",", ";", "\t", "|", '"', "\n", "\r\n", "é", "\ufeff", "=1+2", "LX1", "3.2"),
    { maxLength: 6 },
  )
  .map((p) => p.join(""));

describe("CSV reader", () => {
  it("arbitrary text: a table or a FileProblem", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          fc.string({ maxLength: 200 }),
          fc.array(cellText, { maxLength: 30 }).map((c) => c.join("")),
        ),
        (text) => tableOrFileProblem(() => readCsv(text)),
      ),
      { numRuns: 2000 },
    );
  }, 120_000);

  it("a grid written with RFC 4180 quoting reads back cell for cell", async () => {
    // RFC 4180: a field with a comma, quote or line break is quoted, and a quote inside is doubled.
    const word = fc.stringMatching(/^[A-Za-z0-9 ,"\n]{0,8}$/).filter((s) => s.trim() !== "" && s === s.trim());
    await fc.assert(
      fc.asyncProperty(
        fc
          .integer({ min: 1, max: 5 })
          .chain((cols) =>
            fc.array(fc.array(word, { minLength: cols, maxLength: cols }), { minLength: 2, maxLength: 8 }),
          ),
        (grid) => {
          // Header cells unique and plain, so the reader keeps them as written.
          const headers = grid[0].map((_, i) => `Col${i + 1}`);
          const quote = (c: string) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c);
          const text = [headers, ...grid].map((row) => row.map(quote).join(",")).join("\r\n");
          const t = readCsv(text);
          expect(t.headers).toEqual(headers);
          expect(t.rows.map((r) => r.cells)).toEqual(grid);
        },
      ),
      { numRuns: 500 },
    );
  });
});

// A minimal SpreadsheetML package (ECMA-376 Part 1) around sheet XML the generator writes.
const ns =
  'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';
const rel = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
const workbook = (sheet: string) =>
  zipSync({
    "xl/workbook.xml": strToU8(
      `<workbook ${ns}><sheets><sheet name="Rig" sheetId="1" r:id="rId1"/></sheets></workbook>`,
    ),
    "xl/_rels/workbook.xml.rels": strToU8(
      `<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="${rel}/worksheet" Target="worksheets/sheet1.xml"/></Relationships>`,
    ),
    "xl/worksheets/sheet1.xml": strToU8(sheet),
  });

const colLetters = fc.constantFrom("A", "B", "Z", "AA", "IV", "IW", "XFD", "XFE", "ZZZZ", "");
const rowNum = fc.constantFrom("1", "2", "3", "20000", "20001", "1048576", "1048577", "0", "99999999999", "");
const ref = fc.tuple(colLetters, rowNum).map(([c, r]) => c + r);
const cell = fc
  .tuple(
    ref,
    fc.constantFrom("inlineStr", "s", "n", "b", "str", "e", "x"),
    fc.constantFrom("7", "-1", "1e308", "abc", "<", "&amp;", "&bogus;", "0", "99999"),
  )
  .map(([r, t, v]) =>
    t === "inlineStr" ? `<c r="${r}" t="inlineStr"><is><t>${v}</t></is></c>` : `<c r="${r}" t="${t}"><v>${v}</v></c>`,
  );
const row = fc.tuple(rowNum, fc.array(cell, { maxLength: 4 })).map(([r, cs]) => `<row r="${r}">${cs.join("")}</row>`);
const sheetXml = fc
  .tuple(
    fc.option(fc.tuple(ref, ref)),
    fc.array(row, { maxLength: 6 }),
    fc.array(fc.tuple(ref, ref), { maxLength: 3 }),
    fc.boolean(),
  )
  .map(([dim, rows, merges, truncate]) => {
    const xml = `<worksheet ${ns}>${dim ? `<dimension ref="${dim[0]}:${dim[1]}"/>` : ""}<sheetData>${rows.join("")}</sheetData>${merges.length ? `<mergeCells>${merges.map(([a, b]) => `<mergeCell ref="${a}:${b}"/>`).join("")}</mergeCells>` : ""}</worksheet>`;
    return truncate ? xml.slice(0, Math.floor(xml.length / 2)) : xml;
  });

describe(".xlsx reader", () => {
  it("generated sheet XML (odd refs, types, merges, dimensions, cut short): a table or a FileProblem, in bounded memory", async () => {
    const before = process.memoryUsage().heapUsed;
    await fc.assert(
      fc.asyncProperty(sheetXml, (xml) => tableOrFileProblem(() => readXlsx(workbook(xml)))),
      { numRuns: 400 },
    );
    expect(process.memoryUsage().heapUsed - before).toBeLessThan(300 * 1024 * 1024);
  }, 120_000);

  it("a row or cell index made unreadable by damage: the row after the one before, never row NaN (found by the fuzzing below)", async () => {
    // ECMA-376 Part 1, §18.3.1.73 (row) and §18.3.1.4 (c): r is optional; without it a row follows the
    // previous row and a cell the previous cell. A byte flipped in r ("2" → "j") must read the same way.
    const xml = `<worksheet ${ns}><sheetData><row r="1"><c r="A1" t="inlineStr"><is><t>Unit</t></is></c><c r="B1" t="inlineStr"><is><t>Type</t></is></c></row><row r="j"><c r="A2"><v>1</v></c><c r="jB2" t="inlineStr"><is><t>Spot</t></is></c></row><row r="3"><c r="A3"><v>2</v></c></row></sheetData></worksheet>`;
    const t = await readXlsx(workbook(xml));
    expect(t.rows.map((r) => r.rowNumber)).toEqual([2, 3]);
    expect(t.rows[0].cells).toEqual(["1", "Spot"]);
  });

  it("a workbook whose zip fflate reads but ExcelJS's streaming unzip waits on forever: a FileProblem (found by the fuzzing below)", async () => {
    // A workbook written by ExcelJS with a few bytes changed; it sent readXlsx to the ExcelJS fallback,
    // whose unzip never settled, so an upload of it would have hung its request.
    const bytes = new Uint8Array(readFileSync(join(import.meta.dirname, "files/damaged-local-header.xlsx")));
    await expect(tableOrFileProblem(() => readTable(bytes, "rig.xlsx"))).resolves.toBeUndefined();
  }, 30_000);

  it("a real workbook with bytes flipped or cut: a table or a FileProblem", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("Rig");
    ws.addRow(["Position", "Unit", "Type"]);
    for (let i = 1; i <= 20; i++) ws.addRow(["LX1", i, "Profile 26"]);
    const good = new Uint8Array(await wb.xlsx.writeBuffer());
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.tuple(fc.nat(good.length - 1), fc.integer({ min: 0, max: 255 })), { maxLength: 6 }),
        fc.option(fc.nat(good.length)),
        async (flips, cut) => {
          const bytes = good.slice(0, cut ?? good.length);
          for (const [at, v] of flips) if (at < bytes.length) bytes[at] = v;
          await tableOrFileProblem(() => readTable(bytes, "rig.xlsx"));
        },
      ),
      { numRuns: 300 },
    );
  }, 120_000);

  it("what a workbook holds reads back cell for cell", async () => {
    const text = fc.stringMatching(/^[A-Za-z0-9 é'.-]{1,12}$/).filter((s) => s.trim() === s && s !== "");
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.array(text, { minLength: 3, maxLength: 3 }), { minLength: 1, maxLength: 6 }),
        async (rows) => {
          const wb = new ExcelJS.Workbook();
          const ws = wb.addWorksheet("Rig");
          ws.addRow(["Position", "Unit", "Type"]);
          for (const r of rows) ws.addRow(r);
          const t = await readXlsx(new Uint8Array(await wb.xlsx.writeBuffer()));
          expect(t.headers).toEqual(["Position", "Unit", "Type"]);
          expect(t.rows.map((r) => r.cells)).toEqual(rows);
        },
      ),
      { numRuns: 60 },
    );
  }, 120_000);
});

describe("USITT ASCII reader", () => {
  it("a line that starts with delimiters is read like any other (found by the fuzzing below: it threw a TypeError)", () => {
    // REFERENCE.md: space , / < > = @ are interchangeable delimiters and a run of them counts as one.
    const r = readUsittAscii("IDENT 3:0\r\n, CUE 1\r\n@ CHAN 1@50\r\n,,,\r\nENDDATA\r\n");
    expect(r.errors).toEqual([]);
    expect(r.cues.map((c) => [c.number, c.levels])).toEqual([[1, { 1: 50 }]]);
  });

  // Lines built from the standard's keywords and delimiters (shared REFERENCE.md), with junk mixed in.
  const KEYWORDS = [
    "IDENT",
    "CUE",
    "PART",
    "UP",
    "DOWN",
    "FOLLOWON",
    "FOLLOW",
    "LINK",
    "TEXT",
    "CHAN",
    "PATCH",
    "GROUP",
    "ENDDATA",
    "CLEAR",
    "$TL-TEXT",
    "$TL-NOTE",
    "$TL-PAGE",
    "$TL-BLOCK",
    "$TL-PARTTEXT",
    "$OTHER",
    "!",
    "MANUFACTURER",
    "CONSOLE",
    "bogus",
  ];
  const ARGS = [
    "1",
    "2.5",
    "0",
    "-1",
    "3:0",
    "1@50",
    "2@FL",
    "3@H80",
    "4@HZZ",
    "5@101",
    "99999@1",
    "100000@1",
    "1/2",
    "1<2",
    "1:30",
    "25:00:00",
    ".5",
    "x",
    "\\u{1F600}",
    "\\n",
    "",
    "1 1 1",
  ];
  const line = fc
    .tuple(
      fc.constantFrom(...KEYWORDS),
      fc.array(fc.constantFrom(...ARGS), { maxLength: 5 }),
      fc.constantFrom(" ", ",", "/", "<", ">", "=", "@", "  "),
    )
    .map(([k, a, d]) => [k, ...a].join(d));
  const file = fc
    .tuple(
      fc.array(fc.oneof(line, fc.string({ maxLength: 90 })), { maxLength: 40 }),
      fc.constantFrom("\r\n", "\n", "\r"),
    )
    .map(([ls, end]) => ls.join(end));

  it("never throws; every problem names a line of the file (0: the file as a whole)", () => {
    fc.assert(
      fc.property(file, (text) => {
        const r = readUsittAscii(text);
        const lines = text.split(/\r\n|\n|\r/).length;
        for (const p of [...r.errors, ...r.notices]) {
          expect(p.line).toBeGreaterThanOrEqual(0);
          expect(p.line).toBeLessThanOrEqual(lines);
          expect(p.message.length).toBeGreaterThan(0);
        }
        for (const c of r.cues) {
          expect(c.number).toBeGreaterThan(0);
          for (const level of Object.values(c.levels))
            expect(level === null || (level >= 0 && level <= 100)).toBe(true);
        }
      }),
      { numRuns: 3000 },
    );
  });
});

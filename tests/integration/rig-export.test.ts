// Export of views and the workbook, the export → import round trip, and LibreOffice reading our files.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import ExcelJS from "exceljs";
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession, freshUser } from "./support/api";
import { readCsv } from "@/lib/io/csv-read";
import { download, fixturesOf, rigProduction, upload } from "./support/rig";

async function seeded(units: "metric" | "imperial") {
  const p = await rigProduction(units);
  const csv = [
    "Position,Unit,Type,Channel,Universe,Address,Colour,Purpose,X (m),Y (m),Lens height (m),Focus X (m),Focus Y (m),Cone,Hung,Notes,Gobo rotation,Barn door top",
    "LX1,1,Profile 26,1,1,1,pale blue + light frost,Area 1,-3.3333333,1,6.55,-2,3.1,24.5,yes,=SUM(A1:A2),112.5,",
    'LX1,2,Profile 26,2,1,2,N/C,Area 2,3.14159,1,,2,3,,no,"comma, and ""quote""",,',
    "Boom SL,1,Wash 13,3,1,10,,side,7,2,2.2,0,4,30,no,+1 spare lamp,,in halfway",
  ].join("\n");
  const r = await upload(p.s, p.id, { name: "seed.csv", body: csv }, { mode: "commit" });
  expect(r.status).toBe(200);
  return p;
}

describe("round trip", () => {
  for (const units of ["metric", "imperial"] as const) {
    for (const format of ["csv", "xlsx"] as const) {
      it(`${units} ${format}: export then re-import changes nothing`, async () => {
        const { s, id } = await seeded(units);
        const before = await fixturesOf(s, id);
        const file = await download(s, id, `view=all&format=${format}`);
        expect(file.status).toBe(200);
        const p = await upload(s, id, { name: `rig.${format}`, body: file.bytes }, { mode: "preview" });
        expect(p.json.preview).toMatchObject({ errorCount: 0, counts: { create: 0, update: 0, unchanged: 3 } });
        expect(p.json.preview.mapping.filter((m: string) => m !== "ignore")).toHaveLength(34); // 29 fields, gobo rotation and four barn-door leaves
        const c = await upload(s, id, { name: `rig.${format}`, body: file.bytes }, { mode: "commit" });
        expect(c.status).toBe(200);
        expect(await fixturesOf(s, id)).toEqual(before);
      });
    }
  }
});

describe("export files", () => {
  it("neutralises formula-like text (OWASP CSV injection) but leaves negative numbers as numbers", async () => {
    const { s, id } = await seeded("metric");
    const csv = new TextDecoder("utf-8", { ignoreBOM: true }).decode(
      (await download(s, id, "view=all&format=csv")).bytes,
    );
    expect(csv.startsWith("\ufeff")).toBe(true);
    expect(csv).toContain(",'=SUM(A1:A2)"); // OWASP CSV injection: prefix a quote
    expect(csv).toContain(",'+1 spare lamp");
    expect(csv).toContain(",-3.3333,"); // exported to 0.1 mm; a plain number is not a formula
    expect(csv).toContain("\r\n");
  });

  it("writes a formatted workbook: frozen header, widths, units in headers, one sheet per view", async () => {
    const { s, id } = await seeded("imperial");
    const file = await download(s, id, "view=workbook&format=xlsx");
    expect(file.type).toContain("spreadsheetml");
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(file.bytes as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual([
      "Hanging",
      "Patching",
      "Programming",
      "Focus values",
      "Every column",
      "Accessories",
      "Stock - units",
      "Stock - colour",
      "Stock - gobos",
      "Stock - accessories",
      "Stock - Y-cables",
    ]);
    const all = wb.getWorksheet("Every column")!;
    expect(all.views[0]).toMatchObject({ state: "frozen", ySplit: 1 });
    expect(all.getRow(1).values).toEqual(
      expect.arrayContaining(["X (ft)", "Lens height (ft)", "Cone (°)", "Throw (ft)"]),
    );
    expect(all.getColumn(1).width).toBeGreaterThan(8);
    const colour = wb.getWorksheet("Stock - colour")!;
    // common practice, from memory: 6.25 in cuts from a 20 × 24 in sheet → 3 × 3 = 9 per sheet
    expect(colour.getRow(2).values).toEqual([undefined, "light frost", "6.25 in", 1, 9, 1]);
  });

  it("lists each accessory on its own sheet and counts it in the stock", async () => {
    const { s, id } = await seeded("metric");
    const f = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures[0];
    const made = await s.post(`/api/productions/${id}/accessories`, {
      fixtureId: f.id,
      kind: "scroller",
      universe: 2,
      address: 101,
      footprint: 2,
      wattage: 40,
      weightKg: 2.5,
    });
    expect(made.status).toBe(201);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await download(s, id, "view=workbook&format=xlsx")).bytes as unknown as ArrayBuffer);
    const sheet = wb.getWorksheet("Accessories")!;
    expect(sheet.getRow(2).values).toEqual([undefined, f.positionName, f.unitNumber, "scroller", 2, 101, 2, 40, 2.5]);
    const stock = wb.getWorksheet("Stock - accessories")!;
    expect(stock.getRow(2).values).toEqual([undefined, "scroller", 1]);
  });

  it("lets every role export, and refuses the workbook as CSV", async () => {
    const viewer = await demoSession("viewer");
    const id = await demoProductionId(viewer);
    const hang = await download(viewer, id, "view=hang&format=csv");
    expect(hang.status).toBe(200);
    expect(hang.disposition).toContain("hanging.csv");
    expect((await download(viewer, id, "view=workbook&format=csv")).status).toBe(400);
    const { session: outsider } = await freshUser("outsider-export");
    expect((await download(outsider, id, "view=hang&format=csv")).status).toBe(404);
  });
});

describe("LibreOffice reads our exports", () => {
  // Debian's libreoffice-calc converts the files back to CSV; every value must match what we wrote.
  function viaLibreOffice(bytes: Uint8Array, ext: "csv" | "xlsx"): string[][] {
    const dir = mkdtempSync(path.join(os.tmpdir(), "rig-lo-"));
    try {
      const input = path.join(dir, `rig.${ext}`);
      writeFileSync(input, bytes);
      execFileSync(
        "libreoffice",
        [
          `-env:UserInstallation=file://${dir}/profile`,
          "--headless",
          ...(ext === "csv" ? ["--infilter=CSV:44,34,76,1"] : []),
          "--convert-to",
          "csv:Text - txt - csv (StarCalc):44,34,76,1",
          "--outdir",
          path.join(dir, "out"),
          input,
        ],
        { stdio: "pipe", timeout: 120_000 },
      );
      return readCsv(readFileSync(path.join(dir, "out", "rig.csv"), "utf8")).rows.map((r) => r.cells);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }
  const same = (a: string, b: string) =>
    a === b || (a !== "" && b !== "" && !Number.isNaN(Number(a)) && Math.abs(Number(a) - Number(b)) < 1e-9);

  for (const ext of ["xlsx", "csv"] as const) {
    it(`converts the exported .${ext} to CSV with the same values`, async () => {
      const viewer = await demoSession("viewer");
      const id = await demoProductionId(viewer);
      const ours = readCsv(
        new TextDecoder().decode((await download(viewer, id, "view=all&format=csv")).bytes),
      ).rows.map((r) => r.cells);
      const theirs = viaLibreOffice((await download(viewer, id, `view=all&format=${ext}`)).bytes, ext);
      expect(theirs.length).toBe(ours.length);
      expect(ours.length).toBeGreaterThan(100);
      for (const [r, row] of ours.entries())
        for (const [c, cell] of row.entries())
          if (!same(cell, theirs[r][c] ?? "")) expect(`${r}:${c} ${theirs[r][c]}`).toBe(`${r}:${c} ${cell}`);
    }, 180_000);
  }
});

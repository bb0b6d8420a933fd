import { describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { paginate } from "@/lib/focus/pages";
import { buildFocusChart } from "@/lib/focus/chart-model";
import { focusWorkbook, neutraliseCell } from "@/lib/focus/excel";
import { filterFixtures } from "@/lib/focus/filters";
import { makeFixture, PRODUCTION } from "./fixture-builder";

const charts = (n: number, positions = 1) =>
  Array.from({ length: n }, (_, i) =>
    buildFocusChart(
      makeFixture({
        id: i + 1,
        unitNumber: String(i + 1),
        positionId: (i % positions) + 1,
        positionName: `P${(i % positions) + 1}`,
      }),
      PRODUCTION,
    ),
  ).sort((a, b) => a.positionId - b.positionId);

describe("paging", () => {
  it.each([1, 2, 4, 6] as const)("120 charts at %i a page fill ceil(120/n) pages", (n) => {
    // arithmetic: ceil(120 / n)
    const sheets = paginate(charts(120), n, { newPagePerPosition: true });
    expect(sheets).toHaveLength(Math.ceil(120 / n));
    expect(sheets.every((s) => s.charts.length <= n && s.of === sheets.length)).toBe(true);
  });

  it("a new page for each position unless told otherwise", () => {
    const list = charts(10, 2); // 5 and 5
    expect(paginate(list, 4, { newPagePerPosition: true }).map((s) => s.charts.length)).toEqual([4, 1, 4, 1]);
    expect(paginate(list, 4, { newPagePerPosition: false }).map((s) => s.charts.length)).toEqual([4, 4, 2]);
  });
});

describe("filters", () => {
  it("by position, channel range, focus point and status", () => {
    const list = [
      { positionId: 1, focusPointId: 5, channel: 10, focused: true },
      { positionId: 1, focusPointId: null, channel: 20, focused: false },
      { positionId: 2, focusPointId: 5, channel: null, focused: false },
    ];
    expect(filterFixtures(list, { position: 1 })).toHaveLength(2);
    expect(filterFixtures(list, { chFrom: 15, chTo: 25 })).toEqual([list[1]]);
    expect(filterFixtures(list, { point: 5, status: "unfocused" })).toEqual([list[2]]);
    expect(filterFixtures(list, { status: "focused" })).toEqual([list[0]]);
  });
});

describe("Excel export", () => {
  it("neutralises cells that could run as formulas", () => {
    // OWASP CSV injection: = + - @ tab CR at the start of a cell
    for (const s of ["=1+1", "+A1", "-2+3", "@SUM(A1)", "\tx", "\rx"]) expect(neutraliseCell(s)).toBe(`'${s}`);
    expect(neutraliseCell("pale blue + light frost")).toBe("pale blue + light frost");
  });

  it("writes one row a fixture with every chart value", async () => {
    const list = charts(3);
    list[0].notes = '=HYPERLINK("http://x")';
    const buf = await focusWorkbook(list, { productionName: "Test" });
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(buf as unknown as ArrayBuffer);
    const ws = wb.getWorksheet("Focus charts")!;
    expect(ws.rowCount).toBe(4);
    const headers = (ws.getRow(1).values as string[]).filter(Boolean);
    for (const h of [
      "Channel",
      "Focus mark",
      "Hot spot",
      "Pool at deck",
      "Soft band at deck",
      "Edge",
      "Iris",
      "Cuts",
      "As-focused notes",
    ])
      expect(headers).toContain(h);
    const notesCol = headers.indexOf("Designer notes") + 1;
    expect(ws.getRow(2).getCell(notesCol).value).toBe(`'=HYPERLINK("http://x")`);
    expect(ws.getRow(2).getCell(headers.indexOf("Focus mark") + 1).value).toBe(
      "1.20 m SL of CL, 2.50 m US of the setting line",
    );
  });
});

import { describe, expect, it } from "vitest";
import { paginate, sheetCount, type ChartsPerPage } from "@/lib/focus/pages";
import { buildFocusChart } from "@/lib/focus/chart-model";
import { focusFileName, isoDay } from "@/lib/focus/file-name";
import { makeFixture, PRODUCTION } from "./fixture-builder";

/** Charts in hanging order: `sizes[i]` units on position i + 1. */
const chartsOf = (sizes: number[]) =>
  sizes.flatMap((n, p) =>
    Array.from({ length: n }, (_, i) =>
      buildFocusChart(
        makeFixture({ id: p * 100 + i + 1, unitNumber: String(i + 1), positionId: p + 1, positionName: `P${p + 1}` }),
        PRODUCTION,
      ),
    ),
  );

describe("the PDF button's page estimate", () => {
  it("counts a new sheet for each position, as the print view does", () => {
    // arithmetic by hand: 5 units → 2 sheets of 4, 3 → 1, 1 → 1; the old estimate ceil(9 / 4) = 3 was one short
    expect(sheetCount(chartsOf([5, 3, 1]), 4, { newPagePerPosition: true })).toBe(4);
    expect(sheetCount(chartsOf([5, 3, 1]), 4, { newPagePerPosition: false })).toBe(3);
    expect(sheetCount([], 4, { newPagePerPosition: true })).toBe(0);
  });

  it("matches the sheets paginate makes, for the demo's shape and odd mixes", () => {
    // The demo hangs 116 units on 12 positions (tests/support/demo.ts); these sizes add to 116.
    const mixes = [[20, 16, 16, 12, 12, 8, 8, 6, 6, 4, 4, 4], [1], [7, 7, 7], [13, 1, 2, 6, 5]];
    for (const sizes of mixes) {
      const charts = chartsOf(sizes);
      for (const n of [1, 2, 4, 6] as ChartsPerPage[]) {
        for (const newPagePerPosition of [true, false]) {
          // independent count: the sum over positions of ceil(size / n), or ceil(total / n) when positions share sheets
          const expected = newPagePerPosition
            ? sizes.reduce((s, k) => s + Math.ceil(k / n), 0)
            : Math.ceil(charts.length / n);
          expect(sheetCount(charts, n, { newPagePerPosition })).toBe(expected);
          expect(paginate(charts, n, { newPagePerPosition })).toHaveLength(expected);
        }
      }
    }
  });
});

describe("download names", () => {
  const at = new Date("2026-12-05T23:30:00Z");

  it("name the production, the one position and the day", () => {
    expect(
      focusFileName({
        production: "Salt and Lantern",
        positions: ["1st Electric", "1st Electric"],
        at,
        timeZone: "UTC",
        ext: "pdf",
      }),
    ).toBe("salt-and-lantern-1st-electric-focus-charts-2026-12-05.pdf");
    expect(
      focusFileName({
        production: "Salt and Lantern",
        positions: ["1st Electric", "Boom SR 2"],
        at,
        timeZone: "UTC",
        ext: "xlsx",
      }),
    ).toBe("salt-and-lantern-focus-charts-2026-12-05.xlsx");
  });

  it("use the reader's calendar day, and plain letters only", () => {
    // 23:30 UTC is already the next morning in Auckland (UTC+13 in December, NZDT)
    expect(isoDay(at, "Pacific/Auckland")).toBe("2026-12-06");
    expect(isoDay(at, "America/New_York")).toBe("2026-12-05");
    expect(
      focusFileName({ production: 'Señora Ópera / "Act 2"', positions: ["Boom SR"], at, timeZone: "UTC", ext: "pdf" }),
    ).toBe("senora-opera-act-2-boom-sr-focus-charts-2026-12-05.pdf");
    expect(focusFileName({ production: "???", positions: [], at, timeZone: "UTC", ext: "pdf" })).toBe(
      "production-focus-charts-2026-12-05.pdf",
    );
  });
});

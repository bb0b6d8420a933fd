import { describe, expect, it } from "vitest";
import {
  CHECK_CAUTIONS,
  DMX_CAUTIONS,
  LOAD_KIND_RULE,
  POWER_CAUTIONS,
  effectiveElectrical,
  runChecks,
} from "@/lib/checks";
import { REPORT_PARTS, reportSheet, reportWorkbook } from "@/lib/checks/report-sheets";
import type { ChecksReport } from "@/lib/dto/checks";
import { writeCsv } from "@/lib/io/csv-write";
import { unit } from "./fixtures";

function report(): ChecksReport {
  const settings = {
    productionId: 1,
    electricalCode: "us-nec" as const,
    supplySystem: "120-208-3ph" as const,
    voltage: 120,
    derating: null,
    cableKgPerM: 0.5,
    hardwareKgPerUnit: 1,
    version: 1,
  };
  const electrical = effectiveElectrical(settings);
  const result = runChecks({
    fixtures: [1, 2, 3].map((id) => unit({ id, circuit: "14", universe: 1, address: id, positionId: 1 })),
    accessories: [],
    positions: [
      {
        id: 1,
        name: "LX1",
        kind: "overhead-pipe",
        lengthM: 10,
        ratedLoadKg: 100,
        liftLines: 3,
        counterweighted: false,
      },
    ],
    circuits: [{ id: 1, name: "14", ratingA: 20, phase: "A", dimmed: true }],
    dataLines: [],
    cueChannels: [],
    electrical,
    rigging: settings,
  });
  return {
    ...result,
    settings,
    electrical,
    cautions: { general: CHECK_CAUTIONS, power: POWER_CAUTIONS, dmx: DMX_CAUTIONS, loadKindRule: LOAD_KIND_RULE },
    liftLines: [],
    computedAt: "2026-12-05T00:00:00.000Z",
    computeMs: 0,
  };
}

describe("report sheets", () => {
  it("every part has as many cells per row as headers, and the workbook carries every part", () => {
    const r = report();
    for (const part of REPORT_PARTS) {
      const sheet = reportSheet(r, part);
      for (const row of sheet.rows) expect(row).toHaveLength(sheet.columns.length);
    }
    expect(reportWorkbook(r).map((s) => s.name)).toEqual([
      "Findings",
      "Circuits",
      "Phases",
      "Rigging",
      "Universes",
      "Data lines",
      "Cautions",
    ]);
  });

  it("the circuits CSV gives 18.75 A and 93.8 % for 3 × 750 W on a 20 A circuit at 120 V", () => {
    const csv = writeCsv(reportSheet(report(), "circuits"));
    const [, row] = csv.replace("\ufeff", "").trim().split("\r\n");
    // P = V·I (REFERENCE.md): 2,250 W / 120 V = 18.75 A = 93.75 % of 20 A (shown to 0.1 %)
    expect(row.split(",")).toEqual([
      "14",
      "A",
      "dimmed",
      "20",
      "3",
      "2250",
      "18.75",
      "93.8",
      "1920",
      "over-continuous",
      "", // no powered accessories
      "", // nothing not counted
    ]);
  });

  it("the cautions sheet names the code and says the figures are planning aids", () => {
    const text = reportSheet(report(), "cautions")
      .rows.map((r) => r[0])
      .join("\n");
    expect(text).toMatch(/planning aids, not an engineering or electrical approval/);
    expect(text).toMatch(/US National Electrical Code/);
    expect(text).toMatch(/80 %/);
  });
});

// The checks report as sheets for CSV and .xlsx: findings, circuits, phases, positions, universes, data
// lines, and the cautions. Pure: the writers in lib/io turn these into files.
import type { ChecksReport } from "@/lib/dto/checks";
import type { SheetOut } from "@/lib/io/sheet";

export const REPORT_PARTS = [
  "findings",
  "circuits",
  "phases",
  "rigging",
  "universes",
  "data-lines",
  "cautions",
] as const;
export type ReportPart = (typeof REPORT_PARTS)[number];

const r1 = (n: number | null) => (n == null ? null : Math.round(n * 10) / 10);
const r2 = (n: number | null) => (n == null ? null : Math.round(n * 100) / 100);
const pct = (f: number | null) => (f == null ? null : Math.round(f * 1000) / 10);
const SEVERITY = { error: "must fix", warning: "look at", info: "note" } as const;

const col = (header: string, width = 14) => ({ header, width });

export function reportSheet(report: ChecksReport, part: ReportPart): SheetOut {
  switch (part) {
    case "findings":
      return {
        name: "Findings",
        columns: [col("Check", 10), col("Severity", 10), col("About", 30), col("What", 90)],
        rows: report.findings.map((f) => [
          f.area === "dmx" ? "DMX" : f.area === "power" ? "power" : "rigging",
          SEVERITY[f.severity],
          f.subject,
          f.message,
        ]),
      };
    case "circuits":
      return {
        name: "Circuits",
        columns: [
          col("Circuit"),
          col("Phase", 8),
          col("Power"),
          col("Rating A", 10),
          col("Units", 8),
          col("Load W/VA", 12),
          col("Amps", 10),
          col("% of rating", 12),
          col("Continuous limit W", 18),
          col("Status", 16),
          col("Accessories W/VA", 30),
          col("Not counted", 30),
        ],
        rows: report.power.circuits.map((c) => [
          c.name,
          c.phase,
          c.dimmed ? "dimmed" : "non-dim / constant",
          c.ratingA,
          c.units,
          r1(c.loadVA),
          r2(c.amps),
          pct(c.fraction),
          r1(c.continuousW),
          c.status,
          c.accessories.map((a) => `${a.kind} on ${a.unit}: ${a.wattage ?? "not counted"}`).join(", ") || null,
          c.notCounted.join(", ") || null,
        ]),
      };
    case "phases":
      return {
        name: "Phases",
        columns: [col("Phase", 8), col("Circuits", 10), col("Load W/VA", 12), col("Amps", 10)],
        rows: [
          ...report.power.phases.map((p) => [p.phase, p.circuits, r1(p.loadVA), r2(p.amps)]),
          ["imbalance %", null, null, pct(report.power.imbalance)],
          ["neutral A (linear loads)", null, null, r2(report.power.linearNeutralA)],
        ],
      };
    case "rigging":
      return {
        name: "Rigging",
        columns: [
          col("Position", 20),
          col("Units", 8),
          col("Fixtures kg", 12),
          col("Accessories kg", 14),
          col("Cable kg", 10),
          col("Hardware kg", 12),
          col("Total kg", 10),
          col("Rated kg", 10),
          col("% of rated", 10),
          col("Bending-equivalent kg", 20),
          col("Lift lines kg", 24),
          col("Add to arbor kg", 16),
          col("Not counted", 30),
        ],
        rows: report.rigging.positions.map((p) => [
          p.name,
          p.units,
          r1(p.fixturesKg),
          r1(p.accessoriesKg),
          r1(p.cableKg),
          r1(p.hardwareKg),
          r1(p.totalKg),
          p.ratedLoadKg,
          pct(p.fraction),
          r1(p.bendingEquivalentKg),
          p.liftLineKg?.map((x) => r1(x)).join(" / ") ?? null,
          r1(p.arborAddKg),
          p.notCounted.join(", ") || null,
        ]),
      };
    case "universes":
      return {
        name: "Universes",
        columns: [col("Universe", 10), col("Slots used", 10), col("From", 8), col("To", 8), col("Use", 10)],
        rows: report.dmx.universes.flatMap((u) =>
          u.segments.map((s) => [u.universe, u.slotsUsed, s.start, s.end, s.state]),
        ),
      };
    case "data-lines":
      return {
        name: "Data lines",
        columns: [
          col("Data line", 20),
          col("Universe", 10),
          col("Devices", 10),
          col("Over 32", 10),
          col("Last device (terminate)", 30),
        ],
        rows: report.dmx.dataLines.map((d) => [d.name, d.universe, d.devices, d.overLimit, d.lastDevice]),
      };
    case "cautions":
      return {
        name: "Cautions",
        columns: [col("Caution", 120)],
        rows: [
          ...report.cautions.general,
          `Electrical code: ${report.electrical.codeLabel}. ${report.electrical.codeNote}`,
          `Supply: ${report.electrical.supplyLabel}; ${report.electrical.voltage} V per circuit; continuous-load factor: ${report.electrical.derating == null ? "none" : `${Math.round(report.electrical.derating * 100)} %`} (${report.electrical.deratingSource}).`,
          ...report.cautions.power,
          ...report.cautions.dmx,
          report.cautions.loadKindRule,
        ].map((t) => [t]),
      };
  }
}

export function reportWorkbook(report: ChecksReport): SheetOut[] {
  return REPORT_PARTS.map((p) => reportSheet(report, p));
}

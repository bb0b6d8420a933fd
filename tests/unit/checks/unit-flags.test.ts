import { describe, expect, it } from "vitest";
import { effectiveElectrical, findingKey, runChecks, unitFlagLabel, unitFlags, type Finding } from "@/lib/checks";
import { unit } from "./fixtures";

const nec = effectiveElectrical({ electricalCode: "us-nec", supplySystem: "120-208-3ph", voltage: 0, derating: null });

describe("per-unit flags for the badges", () => {
  it("each unit gets its worst severity, every note once, and the worst finding's row", () => {
    const findings: Finding[] = [
      {
        area: "dmx",
        severity: "info",
        subject: "Unpatched",
        message: "1 unit",
        fixtureIds: [2],
        unitNote: "unpatched",
      },
      { area: "dmx", severity: "info", subject: "Data line A", message: "Terminate unit 1", fixtureIds: [1] },
      { area: "power", severity: "warning", subject: "Circuit 3", message: "m1", fixtureIds: [1], unitNote: "over" },
      { area: "power", severity: "error", subject: "Circuit 3", message: "m2", fixtureIds: [1, 2], unitNote: "bad" },
      { area: "power", severity: "warning", subject: "Wattage", message: "m3", fixtureIds: [1], unitNote: "over" },
    ];
    const flags = unitFlags(findings, new Map([[1, "1 (Pipe 1)"]]));
    expect(flags[1]).toEqual({
      unit: "1 (Pipe 1)",
      severity: "error",
      notes: ["bad", "over"],
      findingKey: findingKey(findings[3]),
    });
    expect(flags[2]).toMatchObject({ unit: "2", severity: "error", notes: ["bad", "unpatched"] });
    // a reminder about a run is no flag on its last unit
    expect(Object.keys(unitFlags([findings[1]], new Map()))).toEqual([]);
    expect(unitFlagLabel(flags[1])).toBe("Unit 1 (Pipe 1), checks to fix: bad; over. Open in the checks");
  });

  it("runChecks flags an overloaded circuit's units, an LED unit on a dimmer and an unpatched unit, keyed to rows", () => {
    const r = runChecks({
      fixtures: [
        // 4 × 750 W on 120 V = 25 A on a 20 A circuit (P = V·I)
        ...[1, 2, 3, 4].map((id) => unit({ id, label: `${id} (Pipe 1)`, circuit: "5", universe: 1, address: id })),
        unit({
          id: 5,
          label: "5 (Pipe 1)",
          circuit: "6",
          loadKind: "switch-mode",
          wattage: 100,
          universe: 1,
          address: 9,
        }),
        unit({ id: 6, label: "6 (Pipe 1)", circuit: "7" }),
      ],
      accessories: [],
      positions: [],
      circuits: [
        { id: 1, name: "5", ratingA: 20, phase: "A", dimmed: false },
        { id: 2, name: "6", ratingA: 20, phase: "B", dimmed: true },
        { id: 3, name: "7", ratingA: 20, phase: "C", dimmed: true },
      ],
      dataLines: [],
      cueChannels: [],
      electrical: nec,
      rigging: { cableKgPerM: 0, hardwareKgPerUnit: 0 },
    });
    expect(r.units[1].severity).toBe("error");
    expect(r.units[1].notes[0]).toBe("circuit 5 overloaded (25.0 A on 20 A)");
    expect(r.units[5].notes).toContain("electronic unit on dimmed circuit 6: set it to non-dim");
    expect(r.units[6]).toMatchObject({ severity: "info", notes: ["unpatched: no universe and address"] });
    // every flag's row is a finding on the page
    const keys = new Set(r.findings.map((f) => f.key));
    for (const flag of Object.values(r.units)) expect(keys.has(flag.findingKey)).toBe(true);
  });
});

import { describe, expect, it } from "vitest";
import { effectiveElectrical, runChecks } from "@/lib/checks";
import { checksStatusLines } from "@/lib/checks/status";
import { unit } from "./fixtures";

const electrical = effectiveElectrical({
  electricalCode: "us-nec",
  supplySystem: "120-208-3ph",
  voltage: 0,
  derating: null,
});
const base = {
  accessories: [],
  dataLines: [],
  cueChannels: [],
  electrical,
  rigging: { cableKgPerM: 0, hardwareKgPerUnit: 0 },
};

describe("overview status", () => {
  it("never says all clear before any check has something to check", () => {
    const r = runChecks({ ...base, fixtures: [], positions: [], circuits: [] });
    expect(checksStatusLines(r, { patched: 0, fixtures: 0 }).map((l) => l.text)).toEqual([
      "Nothing checked yet: the rig has no fixtures.",
    ]);
  });

  it("says which checks have not run: no circuits, nothing patched, no rated load", () => {
    const r = runChecks({
      ...base,
      fixtures: [unit({ id: 1, positionId: 5 })],
      positions: [
        {
          id: 5,
          name: "Boom",
          kind: "boom",
          lengthM: null,
          ratedLoadKg: null,
          liftLines: null,
          counterweighted: false,
        },
      ],
      circuits: [],
    });
    const text = checksStatusLines(r, { patched: 0, fixtures: 1 })
      .map((l) => l.text)
      .join("\n");
    expect(text).toMatch(/Power not checked/);
    expect(text).toMatch(/DMX not checked/);
    expect(text).toMatch(/no rated load/);
    expect(text).not.toMatch(/nothing to fix/);
  });

  it("counts problems; an all-clear only when every check ran", () => {
    const positions = [
      {
        id: 5,
        name: "LX1",
        kind: "overhead-pipe",
        lengthM: 10,
        ratedLoadKg: 100,
        liftLines: null,
        counterweighted: false,
      },
    ];
    const fixtures = [unit({ id: 1, positionId: 5, circuit: "1", universe: 1, address: 1 })];
    // One phase, so a single circuit is not an imbalance
    const single = {
      ...base,
      electrical: effectiveElectrical({
        electricalCode: "uk-bs7671",
        supplySystem: "230-1ph",
        voltage: 0,
        derating: null,
      }),
    };
    const ok = runChecks({
      ...single,
      fixtures,
      positions,
      circuits: [{ id: 1, name: "1", ratingA: 16, phase: null, dimmed: true }],
    });
    expect(checksStatusLines(ok, { patched: 1, fixtures: 1 })).toEqual([
      { tone: "ok", text: expect.stringMatching(/nothing to fix/) },
    ]);
    const over = runChecks({
      ...single,
      fixtures,
      positions,
      circuits: [{ id: 1, name: "1", ratingA: 3, phase: null, dimmed: true }],
    });
    expect(checksStatusLines(over, { patched: 1, fixtures: 1 })[0]).toEqual({
      tone: "error",
      text: "1 problem to fix in the checks.",
    }); // P = V·I: 750 W / 230 V = 3.26 A > 3 A
  });
});

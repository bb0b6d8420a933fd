import { describe, expect, it } from "vitest";
import { checkPower, drawsPower, effectiveElectrical, type CheckAccessory } from "@/lib/checks";
import { unit } from "./fixtures";

const nec = effectiveElectrical({ electricalCode: "us-nec", supplySystem: "120-208-3ph", voltage: 0, derating: null });
const constant = { id: 1, name: "7", ratingA: 20, phase: "A", dimmed: false };

function accessory(over: Partial<CheckAccessory> & { fixtureId: number }): CheckAccessory {
  return {
    id: 100 + over.fixtureId,
    kind: "scroller",
    universe: null,
    address: null,
    footprint: null,
    wattage: null,
    weightKg: 2,
    ...over,
  };
}

describe("accessories on the power check", () => {
  it("a 575 W unit with a 50 VA scroller on a 120 V, 20 A circuit draws 5.21 A", () => {
    // I = P / V: (575 W + 50 VA) / 120 V = 625 / 120 = 5.208 A (P = V·I, REFERENCE.md; the scroller's VA
    // counted as its current × voltage, as for any switch-mode load)
    const r = checkPower({
      fixtures: [unit({ id: 1, circuit: "7", wattage: 575 })],
      accessories: [accessory({ fixtureId: 1, wattage: 50 })],
      circuits: [constant],
      electrical: nec,
    });
    expect(r.circuits[0].loadVA).toBe(625);
    expect(r.circuits[0].amps).toBeCloseTo(625 / 120, 9);
    expect(r.circuits[0].amps).toBeCloseTo(5.2083, 4);
    expect(r.circuits[0].accessories).toEqual([
      { accessoryId: 101, fixtureId: 1, unit: "1", kind: "scroller", wattage: 50 },
    ]);
    expect(r.totalVA).toBe(625);
    expect(r.notCounted).toEqual([]);
  });

  it("three 575 W units with 50 VA scrollers: 15.6 A, under the 16 A continuous limit; a fourth scroller's unit is over it", () => {
    // 3 × 625 = 1,875 VA / 120 V = 15.625 A ≤ 16 A (NFPA 70 210.20(A): 80 % of 20 A)
    const three = checkPower({
      fixtures: [1, 2, 3].map((id) => unit({ id, circuit: "7", wattage: 575 })),
      accessories: [1, 2, 3].map((fixtureId) => accessory({ fixtureId, wattage: 50 })),
      circuits: [constant],
      electrical: nec,
    });
    expect(three.circuits[0].amps).toBeCloseTo(15.625, 9);
    expect(three.circuits[0].status).toBe("ok");
    // Without the scrollers the units alone are 1,725 W / 120 V = 14.375 A: the accessories change the answer
    // once a 120 W rotator is added: 1,995 VA / 120 V = 16.625 A > 16 A
    const withRotator = checkPower({
      fixtures: [1, 2, 3].map((id) => unit({ id, circuit: "7", wattage: 575 })),
      accessories: [
        ...[1, 2, 3].map((fixtureId) => accessory({ fixtureId, wattage: 50 })),
        accessory({ id: 200, fixtureId: 2, kind: "gobo rotator", wattage: 120 }),
      ],
      circuits: [constant],
      electrical: nec,
    });
    expect(withRotator.circuits[0].amps).toBeCloseTo(16.625, 9);
    expect(withRotator.circuits[0].status).toBe("over-continuous");
  });

  it("a powered accessory with no wattage is 'not counted', never 0 W; passive ones are no gap", () => {
    const r = checkPower({
      fixtures: [unit({ id: 4, circuit: "7", wattage: 575 })],
      accessories: [
        accessory({ fixtureId: 4, kind: "scroller", wattage: null }),
        accessory({ id: 300, fixtureId: 4, kind: "barn doors", wattage: null }),
        accessory({ id: 301, fixtureId: 4, kind: "top hat", wattage: null }),
      ],
      circuits: [constant],
      electrical: nec,
    });
    expect(r.circuits[0].loadVA).toBe(575);
    expect(r.circuits[0].notCounted).toEqual(["scroller on 4"]);
    expect(r.notCounted).toEqual([{ id: 4, label: "scroller on 4" }]);
    expect(r.findings.find((f) => f.subject === "Circuit 7")?.message).toMatch(/1 powered accessory with no wattage/);
    expect(r.findings.find((f) => f.subject === "Wattage")?.fixtureIds).toEqual([4]);
  });

  it("which accessories draw power: a wattage, a DMX patch or a motorised kind", () => {
    const base = { kind: "other", wattage: null, address: null, footprint: null };
    expect(drawsPower(base)).toBe(false);
    expect(drawsPower({ ...base, kind: "barn doors" })).toBe(false);
    expect(drawsPower({ ...base, kind: "Scroller" })).toBe(true);
    expect(drawsPower({ ...base, kind: "gobo rotator" })).toBe(true);
    expect(drawsPower({ ...base, kind: "iris", address: 40, footprint: 1 })).toBe(true); // motorised iris: patched
    expect(drawsPower({ ...base, kind: "iris" })).toBe(false); // a drop-in iris
    expect(drawsPower({ ...base, wattage: 15 })).toBe(true);
  });

  it("a powered accessory on a dimmed circuit is warned; its host's circuit carries it, an unlisted host's nothing", () => {
    const r = checkPower({
      fixtures: [unit({ id: 5, circuit: "7", wattage: 575 }), unit({ id: 6, circuit: "99", wattage: 575 })],
      accessories: [accessory({ fixtureId: 5, wattage: 50 }), accessory({ fixtureId: 6, wattage: 50 })],
      circuits: [{ ...constant, dimmed: true }],
      electrical: nec,
    });
    expect(r.circuits[0].loadVA).toBe(625);
    const warn = r.findings.find((f) => f.subject === "Circuit 7" && /accessory's driver/.test(f.message));
    expect(warn?.severity).toBe("warning");
    expect(warn?.fixtureIds).toEqual([5]);
    // the lamp unit itself is fine on a dimmer: no error
    expect(r.findings.filter((f) => f.severity === "error")).toEqual([]);
  });
});

import { describe, expect, it } from "vitest";
import {
  amps,
  checkPower,
  circuitCapacityW,
  continuousCapacityW,
  effectiveElectrical,
  linearNeutral,
} from "@/lib/checks";
import { unit } from "./fixtures";

const nec = effectiveElectrical({ electricalCode: "us-nec", supplySystem: "120-208-3ph", voltage: 0, derating: null });
const uk = effectiveElectrical({
  electricalCode: "uk-bs7671",
  supplySystem: "230-400-3ph",
  voltage: 0,
  derating: null,
});

describe("capacities", () => {
  it("120 V × 20 A = 2,400 W, 1,920 W continuous at 80 %", () => {
    expect(circuitCapacityW(120, 20)).toBe(2400); // P = V·I (REFERENCE.md)
    expect(continuousCapacityW(120, 20, 0.8)).toBeCloseTo(1920, 9); // NFPA 70 210.20(A): continuous ≤ 80 %
    expect(circuitCapacityW(120, 15)).toBe(1800); // P = V·I (REFERENCE.md)
  });

  it("230 V × 16 A = 3,680 W, and no continuous limit under BS 7671 until one is set", () => {
    expect(circuitCapacityW(230, 16)).toBe(3680); // P = V·I (REFERENCE.md)
    expect(uk.derating).toBeNull(); // BS 7671 Reg. 433.1.1: no blanket 80 % rule
    expect(continuousCapacityW(230, 16, uk.derating)).toBeNull();
  });

  it("the code, not the display units, sets the voltage and the factor", () => {
    expect(nec).toMatchObject({ voltage: 120, derating: 0.8 }); // NFPA 70 210.20(A)
    expect(uk).toMatchObject({ voltage: 230, derating: null });
    expect(
      effectiveElectrical({ electricalCode: "uk-bs7671", supplySystem: "230-400-3ph", voltage: 0, derating: 0.9 })
        .derating,
    ).toBe(0.9);
    expect(
      effectiveElectrical({ electricalCode: "none", supplySystem: "by-hand", voltage: 110, derating: null }),
    ).toMatchObject({ voltage: 110, derating: null });
    expect(
      effectiveElectrical({ electricalCode: "none", supplySystem: "100-1ph", voltage: 0, derating: null }).phases,
    ).toEqual(["L"]);
  });

  it("refuses a voltage of 0", () => {
    expect(() => amps(100, 0)).toThrow(/above 0/);
  });
});

describe("circuits", () => {
  const circuit = { id: 1, name: "14", ratingA: 20, phase: "A", dimmed: true };

  it("3 × 750 W on a 120 V, 20 A circuit is 18.75 A: over the 16 A continuous limit, under the rating", () => {
    // REFERENCE.md: 3 × 750 W on 120 V = 18.75 A; NFPA 70 210.20(A): 80 % of 20 A = 16 A
    const r = checkPower({
      fixtures: [1, 2, 3].map((id) => unit({ id, circuit: "14" })),
      circuits: [circuit],
      electrical: nec,
    });
    expect(r.circuits[0].amps).toBeCloseTo(18.75, 9);
    expect(r.circuits[0].status).toBe("over-continuous");
    expect(r.findings.filter((f) => f.severity === "warning" && f.subject === "Circuit 14")).toHaveLength(1);
    expect(r.findings.filter((f) => f.severity === "error")).toEqual([]);
  });

  it("the same load under BS 7671 with no factor set is not warned; 4 × 750 W (25 A) is over the rating", () => {
    const three = checkPower({
      fixtures: [1, 2, 3].map((id) => unit({ id, circuit: "14" })),
      circuits: [{ ...circuit, ratingA: 16 }],
      electrical: { ...uk, voltage: 120 },
    });
    expect(three.circuits[0].status).toBe("over-rating"); // 18.75 A > 16 A
    const fine = checkPower({
      fixtures: [1, 2, 3].map((id) => unit({ id, circuit: "14" })),
      circuits: [circuit],
      electrical: { ...uk, voltage: 120 },
    });
    expect(fine.circuits[0].status).toBe("ok"); // no blanket factor: 18.75 A ≤ 20 A
    const four = checkPower({
      fixtures: [1, 2, 3, 4].map((id) => unit({ id, circuit: "14" })),
      circuits: [circuit],
      electrical: nec,
    });
    expect(four.circuits[0].amps).toBeCloseTo(25, 9); // 3000 W / 120 V (P = V·I)
    expect(four.findings.find((f) => f.severity === "error")?.message).toMatch(/over its rating/);
  });

  it("an LED unit on a dimmed circuit is an error; on a non-dim circuit it is not", () => {
    const led = unit({ id: 9, circuit: "14", wattage: 300, loadKind: "switch-mode" });
    const dimmed = checkPower({ fixtures: [led], circuits: [circuit], electrical: nec });
    expect(dimmed.findings.find((f) => f.severity === "error")?.message).toMatch(
      /set that dimmer to non-dim or use a constant-power circuit/,
    );
    const nonDim = checkPower({ fixtures: [led], circuits: [{ ...circuit, dimmed: false }], electrical: nec });
    expect(nonDim.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(nonDim.circuits[0].amps).toBeCloseTo(2.5, 9); // 300 VA / 120 V
  });

  it("a unit with no wattage is listed as not counted, never as 0 W silently", () => {
    const r = checkPower({
      fixtures: [unit({ id: 1, circuit: "14" }), unit({ id: 2, circuit: "14", wattage: null })],
      circuits: [circuit],
      electrical: nec,
    });
    expect(r.circuits[0].notCounted).toEqual(["2"]);
    expect(r.notCounted.map((u) => u.id)).toEqual([2]);
    expect(r.findings.some((f) => /not counted/.test(f.message) && f.subject === "Circuit 14")).toBe(true);
  });

  it("a unit on a circuit missing from the list is warned; circuit names match without case or spaces", () => {
    const r = checkPower({
      fixtures: [unit({ id: 1, circuit: " 14 " }), unit({ id: 2, circuit: "99" }), unit({ id: 3, dimmer: "14" })],
      circuits: [circuit],
      electrical: nec,
    });
    expect(r.circuits[0].units).toBe(2);
    expect(r.findings.some((f) => /"99" is not in the circuit list/.test(f.message))).toBe(true);
  });
});

describe("phases", () => {
  it("neutral current of a balanced linear wye load is 0; one phase loaded carries it all", () => {
    // Phasor sum of three equal currents 120° apart is 0 (three-phase theory)
    expect(linearNeutral([10, 10, 10])).toBeCloseTo(0, 9);
    expect(linearNeutral([10, 0, 0])).toBeCloseTo(10, 9);
    // Independent reference: sum the phasors with cos/sin
    const I = [12, 7, 3];
    const re = I[0] + I[1] * Math.cos((-2 * Math.PI) / 3) + I[2] * Math.cos((2 * Math.PI) / 3);
    const im = I[1] * Math.sin((-2 * Math.PI) / 3) + I[2] * Math.sin((2 * Math.PI) / 3);
    expect(linearNeutral(I)).toBeCloseTo(Math.hypot(re, im), 9);
    expect(linearNeutral([10, 4])).toBe(6); // split-phase: legs 180° apart
  });

  it("totals per phase and the imbalance warning", () => {
    const circuits = [
      { id: 1, name: "1", ratingA: 20, phase: "A", dimmed: false },
      { id: 2, name: "2", ratingA: 20, phase: "B", dimmed: false },
      { id: 3, name: "3", ratingA: 20, phase: "C", dimmed: false },
    ];
    const r = checkPower({
      fixtures: [
        unit({ id: 1, circuit: "1", wattage: 1200 }),
        unit({ id: 2, circuit: "2", wattage: 1200 }),
        unit({ id: 3, circuit: "3", wattage: 600 }),
      ],
      circuits,
      electrical: nec,
    });
    expect(r.phases.map((p) => p.amps)).toEqual([10, 10, 5]); // I = P / V
    expect(r.imbalance).toBeCloseTo(0.5, 9);
    expect(r.linearNeutralA).toBeCloseTo(5, 9); // 10∠0 + 10∠−120 + 5∠120 → 5 A
    expect(r.findings.some((f) => f.subject === "Phases" && /out of balance/.test(f.message))).toBe(true);
  });
});

describe("a supply set by hand", () => {
  it("takes its phases from the circuits, or one phase when none is named", () => {
    const byHand = effectiveElectrical({
      electricalCode: "none",
      supplySystem: "by-hand",
      voltage: 230,
      derating: null,
    });
    const one = checkPower({
      fixtures: [unit({ id: 1, circuit: "1" })],
      circuits: [{ id: 1, name: "1", ratingA: 16, phase: null, dimmed: true }],
      electrical: byHand,
    });
    expect(one.phases.map((p) => p.phase)).toEqual(["L"]);
    expect(one.phases[0].amps).toBeCloseTo(750 / 230, 9); // P = V·I
    expect(one.findings.some((f) => f.subject === "Phases")).toBe(false);
    const two = checkPower({
      fixtures: [],
      circuits: [
        { id: 1, name: "1", ratingA: 16, phase: "X", dimmed: true },
        { id: 2, name: "2", ratingA: 16, phase: "Y", dimmed: true },
      ],
      electrical: byHand,
    });
    expect(two.phases.map((p) => p.phase)).toEqual(["X", "Y"]);
  });
});

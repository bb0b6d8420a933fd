// Electrical codes and supply systems: the one home for which voltage, phases and continuous-load
// factor a production's power check uses. The display units never choose any of these.

import type { ElectricalCode, SupplySystem } from "@/models/electrical-options";

export { ELECTRICAL_CODES, SUPPLY_SYSTEMS, type ElectricalCode, type SupplySystem } from "@/models/electrical-options";

type CodeInfo = { label: string; defaultSupply: SupplySystem; defaultDerating: number | null; note: string };

export const CODE_INFO: Record<ElectricalCode, CodeInfo> = {
  none: {
    label: "No code chosen",
    defaultSupply: "by-hand",
    defaultDerating: null,
    note: "No electrical code chosen: no continuous-load limit is applied until you choose a code or set a factor.",
  },
  "us-nec": {
    label: "US National Electrical Code (NFPA 70)",
    defaultSupply: "120-208-3ph",
    // NFPA 70 210.20(A): overcurrent protection at least 125 % of the continuous load, i.e. continuous
    // loads (3 h or more) at most 80 % of the rating. Section numbers move between editions.
    defaultDerating: 0.8,
    note: "NEC defaults: continuous loads (3 hours or more) at most 80 % of the circuit's rating (210.20(A); check the section in your edition).",
  },
  "uk-bs7671": {
    label: "UK wiring regulations (BS 7671)",
    defaultSupply: "230-400-3ph",
    // BS 7671 Reg. 433.1.1 coordinates design current, device rating and cable capacity: no blanket 80 % rule.
    defaultDerating: null,
    note: "BS 7671 has no blanket continuous-load factor (Ib ≤ In ≤ Iz): none is applied until you set one.",
  },
  "iec-60364": {
    label: "IEC 60364 based national rules",
    defaultSupply: "230-400-3ph",
    defaultDerating: null,
    note: "No blanket continuous-load factor in the IEC rules: none is applied until you set one.",
  },
  other: {
    label: "Another local code",
    defaultSupply: "by-hand",
    defaultDerating: null,
    note: "Another code: no continuous-load factor is applied until you set the one your code requires.",
  },
};

/** Phases a circuit can sit on, and the voltage from each phase to neutral. */
type SupplyInfo = { label: string; phases: string[]; lineToNeutral: number | null; lineToLine: number | null };

export const SUPPLY_INFO: Record<SupplySystem, SupplyInfo> = {
  "120-208-3ph": { label: "120/208 V three-phase wye", phases: ["A", "B", "C"], lineToNeutral: 120, lineToLine: 208 },
  "120-240-split": { label: "120/240 V split-phase", phases: ["A", "B"], lineToNeutral: 120, lineToLine: 240 },
  "230-400-3ph": { label: "230/400 V three-phase", phases: ["L1", "L2", "L3"], lineToNeutral: 230, lineToLine: 400 },
  "230-1ph": { label: "Single-phase 230 V", phases: ["L"], lineToNeutral: 230, lineToLine: null },
  "100-1ph": { label: "Single-phase 100 V", phases: ["L"], lineToNeutral: 100, lineToLine: null },
  "by-hand": { label: "Set by hand", phases: ["L1", "L2", "L3"], lineToNeutral: null, lineToLine: null },
};

export type ElectricalSettings = {
  electricalCode: ElectricalCode;
  supplySystem: SupplySystem;
  /** Used only when the supply is set by hand: phase-to-neutral volts. */
  voltage: number;
  /** Continuous-load factor the user set; null takes the code's default. */
  derating: number | null;
};

export type EffectiveElectrical = {
  code: ElectricalCode;
  codeLabel: string;
  codeNote: string;
  supply: SupplySystem;
  supplyLabel: string;
  phases: string[];
  /** Volts across a single-pole circuit (phase to neutral). */
  voltage: number;
  derating: number | null;
  /** Where the factor comes from, in words. */
  deratingSource: string;
};

export function effectiveElectrical(s: ElectricalSettings): EffectiveElectrical {
  const code = CODE_INFO[s.electricalCode];
  const supply = SUPPLY_INFO[s.supplySystem];
  const derating = s.derating ?? code.defaultDerating;
  return {
    code: s.electricalCode,
    codeLabel: code.label,
    codeNote: code.note,
    supply: s.supplySystem,
    supplyLabel: s.supplySystem === "by-hand" ? `Set by hand: ${s.voltage} V` : supply.label,
    phases: supply.phases,
    voltage: supply.lineToNeutral ?? s.voltage,
    derating,
    deratingSource:
      s.derating != null ? "set for this production" : derating != null ? `the default of ${code.label}` : "none set",
  };
}

/** Watts a circuit can carry: P = V·I for a resistive load (120 V × 20 A = 2,400 W). */
export function circuitCapacityW(voltage: number, ratingA: number): number {
  return voltage * ratingA;
}

/** Continuous-load capacity: the factor times the capacity, or null when no factor applies. */
export function continuousCapacityW(voltage: number, ratingA: number, derating: number | null): number | null {
  return derating == null ? null : voltage * ratingA * derating;
}

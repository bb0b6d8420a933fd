// Power check: the load on every circuit (or dimmer) from its fixtures, against its rating and the
// continuous-load limit of the chosen code; totals and balance per phase. Pure.
import { type AccessoryLoad, poweredAccessoriesByHost } from "./accessory-power";
import { circuitCapacityW, continuousCapacityW, type EffectiveElectrical } from "./electrical";
import type { CheckAccessory, CheckFixture, Finding } from "./types";

export type CheckCircuit = { id: number; name: string; ratingA: number; phase: string | null; dimmed: boolean };

export type CircuitStatus = "ok" | "over-continuous" | "over-rating";
export type CircuitLoad = {
  id: number;
  name: string;
  phase: string | null;
  ratingA: number;
  dimmed: boolean;
  units: number;
  /** Watts for lamp loads, VA for switch-mode ones and powered accessories, summed. */
  loadVA: number;
  amps: number;
  capacityW: number;
  continuousW: number | null;
  /** amps / rating, 0–1+. */
  fraction: number;
  status: CircuitStatus;
  /** Units, and accessories as "scroller on 12 (1st electric)", with no wattage entered. */
  notCounted: string[];
  switchModeUnits: number;
  /** Powered accessories drawing from this circuit through their host unit, listed per unit. */
  accessories: AccessoryLoad[];
};
export type PhaseLoad = { phase: string; loadVA: number; amps: number; circuits: number };
export type PowerResult = {
  electrical: EffectiveElectrical;
  circuits: CircuitLoad[];
  phases: PhaseLoad[];
  /** (largest − smallest) / largest phase current; null on a single phase or with no load. */
  imbalance: number | null;
  /** Neutral current if every load were linear at unity power factor (phasor sum); null on one phase. */
  linearNeutralA: number | null;
  totalVA: number;
  notCounted: { id: number; label: string }[];
  notOnCircuit: { id: number; label: string }[];
  findings: Finding[];
};

/** Phase imbalance above this is flagged for a look (common practice, no source). */
export const IMBALANCE_WARNING = 0.2;

const norm = (s: string) => s.trim().toLowerCase();

/** Amps drawn by a load: I = P / V (lamp loads) or VA / V (switch-mode). */
export function amps(loadVA: number, voltage: number): number {
  if (!(voltage > 0)) throw new RangeError("The voltage must be above 0 V.");
  return loadVA / voltage;
}

export function circuitStatus(a: number, ratingA: number, derating: number | null): CircuitStatus {
  if (a > ratingA) return "over-rating";
  if (derating != null && a > ratingA * derating) return "over-continuous";
  return "ok";
}

/** Neutral current of phase currents at 0°, −120°, +120° (three-phase wye) or 0°, 180° (split-phase). */
export function linearNeutral(currents: number[]): number | null {
  if (currents.length === 2) return Math.abs(currents[0] - currents[1]);
  if (currents.length === 3) {
    const [a, b, c] = currents;
    return Math.sqrt(Math.max(0, a * a + b * b + c * c - a * b - b * c - c * a));
  }
  return null;
}

/**
 * The phases circuits can sit on: the supply's, or for a supply set by hand the phase names the circuits
 * use (one phase when none names any), since the system's shape is not known.
 */
export function supplyPhases(e: EffectiveElectrical, circuits: { phase: string | null }[]): string[] {
  if (e.supply !== "by-hand") return e.phases;
  const named = [...new Set(circuits.map((c) => c.phase?.trim()).filter((p): p is string => !!p))].sort();
  return named.length ? named : ["L"];
}

function phaseTotals(circuits: CircuitLoad[], names: string[]) {
  const phases: PhaseLoad[] = names.map((phase) => ({ phase, loadVA: 0, amps: 0, circuits: 0 }));
  for (const c of circuits) {
    const p = names.length === 1 ? phases[0] : phases.find((x) => c.phase != null && norm(x.phase) === norm(c.phase));
    if (!p) continue;
    p.loadVA += c.loadVA;
    p.amps += c.amps;
    p.circuits += 1;
  }
  const currents = phases.map((p) => p.amps);
  const max = Math.max(...currents);
  const imbalance = phases.length > 1 && max > 0 ? (max - Math.min(...currents)) / max : null;
  return { phases, imbalance, linearNeutralA: phases.length > 1 ? linearNeutral(currents) : null };
}

export function checkPower(input: {
  fixtures: CheckFixture[];
  circuits: CheckCircuit[];
  electrical: EffectiveElectrical;
  /** Accessories of any kind; the powered ones count on their host unit's circuit. */
  accessories?: CheckAccessory[];
}): PowerResult {
  const e = input.electrical;
  const findings: Finding[] = [];
  if (!(e.voltage > 0)) throw new RangeError("The supply voltage must be above 0 V.");
  const byName = new Map(input.circuits.map((c) => [norm(c.name), c]));
  const members = new Map<number, CheckFixture[]>(input.circuits.map((c) => [c.id, []]));
  const notCounted: { id: number; label: string }[] = [];
  const notOnCircuit: { id: number; label: string }[] = [];
  const poweredOf = poweredAccessoriesByHost(input.accessories ?? []);
  const accessoryLoads = (u: CheckFixture): AccessoryLoad[] =>
    (poweredOf.get(u.id) ?? []).map((a) => ({
      accessoryId: a.id,
      fixtureId: u.id,
      unit: u.label,
      kind: a.kind,
      wattage: a.wattage,
    }));

  for (const f of input.fixtures) {
    // The circuit field names where the unit is plugged in; without one, its dimmer does.
    const ref = f.circuit?.trim() || f.dimmer?.trim() || "";
    if (f.wattage == null) notCounted.push({ id: f.id, label: f.label });
    for (const a of accessoryLoads(f))
      if (a.wattage == null) notCounted.push({ id: f.id, label: `${a.kind} on ${f.label}` });
    if (!ref) {
      notOnCircuit.push({ id: f.id, label: f.label });
      continue;
    }
    const circuit = byName.get(norm(ref));
    if (!circuit) {
      findings.push({
        area: "power",
        severity: "warning",
        subject: `Unit ${f.label}`,
        message: `Circuit "${ref}" is not in the circuit list: its load is not checked. Add the circuit with its rating.`,
        unitNote: `circuit "${ref}" not in the circuit list`,
        fixtureIds: [f.id],
      });
      continue;
    }
    members.get(circuit.id)!.push(f);
  }

  const circuits = input.circuits.map((c): CircuitLoad => {
    const units = members.get(c.id)!;
    const counted = units.filter((u) => u.wattage != null);
    const accessories = units.flatMap(accessoryLoads);
    const loadVA =
      counted.reduce((sum, u) => sum + (u.wattage as number), 0) +
      accessories.reduce((sum, a) => sum + (a.wattage ?? 0), 0);
    const a = amps(loadVA, e.voltage);
    const status = circuitStatus(a, c.ratingA, e.derating);
    const switchMode = units.filter((u) => u.loadKind === "switch-mode");
    const subject = `Circuit ${c.name}`;
    const ids = units.map((u) => u.id);
    const fmt = (n: number) => n.toFixed(1);
    if (status === "over-rating") {
      findings.push({
        area: "power",
        severity: "error",
        subject,
        message: `${fmt(a)} A on a ${c.ratingA} A circuit (${Math.round(loadVA)} W at ${e.voltage} V): over its rating.`,
        unitNote: `circuit ${c.name} overloaded (${fmt(a)} A on ${c.ratingA} A)`,
        fixtureIds: ids,
      });
    } else if (status === "over-continuous") {
      findings.push({
        area: "power",
        severity: "warning",
        subject,
        unitNote: `circuit ${c.name} over its continuous-load limit`,
        message: `${fmt(a)} A is over the continuous-load limit of ${fmt(c.ratingA * (e.derating as number))} A (${Math.round((e.derating as number) * 100)} % of ${c.ratingA} A).`,
        fixtureIds: ids,
      });
    }
    if (c.dimmed && switchMode.length) {
      findings.push({
        area: "power",
        severity: "error",
        subject,
        message: `${switchMode.map((u) => `Unit ${u.label}`).join(", ")} ${switchMode.length === 1 ? "has" : "have"} an electronic supply on a dimmed circuit: set that dimmer to non-dim or use a constant-power circuit. A dimmer can damage the unit's power supply.`,
        fixtureIds: switchMode.map((u) => u.id),
        unitNote: `electronic unit on dimmed circuit ${c.name}: set it to non-dim`,
      });
    }
    if (c.dimmed && accessories.length) {
      findings.push({
        area: "power",
        severity: "warning",
        subject,
        message: `${accessories.map((a) => `the ${a.kind} on unit ${a.unit}`).join(", ")} ${accessories.length === 1 ? "is" : "are"} counted on this dimmed circuit through ${accessories.length === 1 ? "its" : "their"} host: an accessory's driver needs constant power. Feed it from a non-dim circuit or its own supply.`,
        fixtureIds: [...new Set(accessories.map((a) => a.fixtureId))],
        unitNote: `powered accessory on dimmed circuit ${c.name}`,
      });
    }
    // Not an inference: a multi-slot type read as a lamp only because its Load is empty is worth a look.
    const unsure = c.dimmed
      ? units.filter((u) => u.loadKind === "lamp" && u.loadKindSource === "family" && (u.footprint ?? 1) > 1)
      : [];
    if (unsure.length) {
      findings.push({
        area: "power",
        severity: "warning",
        subject,
        message: `${unsure.map((u) => `Unit ${u.label} (${u.typeName})`).join(", ")} ${unsure.length === 1 ? "takes" : "take"} several DMX slots on this dimmed circuit and ${unsure.length === 1 ? "its type does" : "their types do"} not say lamp or switch-mode: counted as a lamp. If it has an electronic supply, set the type's Load to switch-mode.`,
        fixtureIds: unsure.map((u) => u.id),
        unitNote: `load kind not set, on dimmed circuit ${c.name}`,
      });
    }
    const missing = units.filter((u) => u.wattage == null);
    const missingAccessories = accessories.filter((a) => a.wattage == null);
    if (missing.length || missingAccessories.length) {
      const parts = [
        missing.length ? `${missing.length} unit${missing.length === 1 ? "" : "s"}` : "",
        missingAccessories.length
          ? `${missingAccessories.length} powered accessor${missingAccessories.length === 1 ? "y" : "ies"}`
          : "",
      ].filter(Boolean);
      findings.push({
        area: "power",
        severity: "warning",
        subject,
        message: `${parts.join(" and ")} with no wattage not counted: the total is incomplete.`,
        fixtureIds: [...new Set([...missing.map((u) => u.id), ...missingAccessories.map((a) => a.fixtureId)])],
        unitNote: "no wattage: not counted",
      });
    }
    return {
      id: c.id,
      name: c.name,
      phase: c.phase,
      ratingA: c.ratingA,
      dimmed: c.dimmed,
      units: units.length,
      loadVA,
      amps: a,
      capacityW: circuitCapacityW(e.voltage, c.ratingA),
      continuousW: continuousCapacityW(e.voltage, c.ratingA, e.derating),
      fraction: a / c.ratingA,
      status,
      notCounted: [...missing.map((u) => u.label), ...missingAccessories.map((a) => `${a.kind} on ${a.unit}`)],
      switchModeUnits: switchMode.length,
      accessories,
    };
  });

  const phaseNames = supplyPhases(e, input.circuits);
  if (phaseNames.length > 1) {
    const unphased = circuits.filter(
      (c) => c.phase == null || !phaseNames.some((p) => norm(p) === norm(c.phase as string)),
    );
    if (unphased.length)
      findings.push({
        area: "power",
        severity: "warning",
        subject: "Phases",
        message: `${unphased.length} circuit${unphased.length === 1 ? " has" : "s have"} no phase of this supply (${phaseNames.join(", ")}): left out of the phase totals.`,
      });
  }
  const totals = phaseTotals(circuits, phaseNames);
  if (totals.imbalance != null && totals.imbalance > IMBALANCE_WARNING) {
    findings.push({
      area: "power",
      severity: "warning",
      subject: "Phases",
      message: `The phases are ${Math.round(totals.imbalance * 100)} % out of balance (largest vs smallest phase current): move circuits to even them out.`,
    });
  }
  if (notCounted.length)
    findings.push({
      area: "power",
      severity: "warning",
      subject: "Wattage",
      message: `${notCounted.length} unit${notCounted.length === 1 ? " or powered accessory has" : "s or powered accessories have"} no wattage and ${notCounted.length === 1 ? "is" : "are"} not counted: the totals are incomplete.`,
      fixtureIds: [...new Set(notCounted.map((u) => u.id))],
      unitNote: "no wattage: not counted",
    });
  if (notOnCircuit.length)
    findings.push({
      area: "power",
      severity: "info",
      subject: "Circuits",
      message: `${notOnCircuit.length} unit${notOnCircuit.length === 1 ? " is" : "s are"} on no circuit or dimmer.`,
      fixtureIds: notOnCircuit.map((u) => u.id),
    });
  return {
    electrical: e,
    circuits,
    ...totals,
    totalVA: circuits.reduce((s, c) => s + c.loadVA, 0),
    notCounted,
    notOnCircuit,
    findings,
  };
}

// The checks: DMX data, power and rigging loads, computed from plain rows. No I/O.
import { checkDmx, type DataLineInput, type DmxResult } from "./dmx";
import type { EffectiveElectrical } from "./electrical";
import { checkPower, type CheckCircuit, type PowerResult } from "./power";
import {
  checkRigging,
  type CheckPosition,
  type RiggingFixture,
  type RiggingResult,
  type RiggingSettings,
} from "./rigging";
import type { CheckAccessory, Finding, Severity } from "./types";
import { findingKey, type UnitFlag, unitFlags } from "./unit-flags";

export type ChecksInput = {
  fixtures: RiggingFixture[];
  accessories: CheckAccessory[];
  positions: CheckPosition[];
  circuits: CheckCircuit[];
  dataLines: DataLineInput[];
  cueChannels: number[];
  electrical: EffectiveElectrical;
  rigging: RiggingSettings;
};

export type ChecksSummary = { errors: number; warnings: number; infos: number; fixtures: number };
export type ChecksResult = {
  dmx: DmxResult;
  power: PowerResult;
  rigging: RiggingResult;
  findings: Finding[];
  summary: ChecksSummary;
  /** The worst finding per fixture, for badges on the plot and the rig table. */
  fixtureSeverity: Record<number, Exclude<Severity, "info">>;
  /** Per unit: worst severity, short notes and the checks-page row (lib/checks/unit-flags.ts). */
  units: Record<number, UnitFlag>;
};

const RANK: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

export function runChecks(input: ChecksInput): ChecksResult {
  const dmx = checkDmx(input);
  const power = checkPower(input);
  const rigging = checkRigging({ ...input, settings: input.rigging });
  const findings = [...dmx.findings, ...power.findings, ...rigging.findings]
    .sort((a, b) => RANK[a.severity] - RANK[b.severity])
    .map((f) => ({ ...f, key: findingKey(f) }));
  const fixtureSeverity: Record<number, "error" | "warning"> = {};
  for (const f of findings) {
    if (f.severity === "info") continue;
    for (const id of f.fixtureIds ?? []) if (fixtureSeverity[id] !== "error") fixtureSeverity[id] = f.severity;
  }
  const count = (s: Severity) => findings.filter((f) => f.severity === s).length;
  return {
    dmx,
    power,
    rigging,
    findings,
    summary: {
      errors: count("error"),
      warnings: count("warning"),
      infos: count("info"),
      fixtures: input.fixtures.length,
    },
    fixtureSeverity,
    units: unitFlags(findings, new Map(input.fixtures.map((f) => [f.id, f.label]))),
  };
}

export * from "./accessory-power";
export * from "./beams";
export * from "./cautions";
export * from "./dmx";
export * from "./electrical";
export * from "./load-kind";
export * from "./power";
export * from "./rigging";
export * from "./types";
export * from "./unit-flags";

// What the checks API sends: circuits, data lines, the electrical settings, and the computed report.
// Types only, so client components import them freely.
import type { ChecksResult } from "@/lib/checks";
import type { EffectiveElectrical, ElectricalCode, SupplySystem } from "@/lib/checks/electrical";
import type { CircuitPower } from "@/models/circuit";

export type CircuitDto = {
  id: number;
  productionId: number;
  name: string;
  ratingA: number;
  phase: string | null;
  power: CircuitPower;
  version: number;
  updatedAt: string;
};

export type DataLineDto = {
  id: number;
  productionId: number;
  name: string;
  universe: number | null;
  fixtureIds: number[];
  version: number;
  updatedAt: string;
};

/** The production's settings the checks use; derating null means the code's default. */
export type ElectricalSettingsDto = {
  productionId: number;
  electricalCode: ElectricalCode;
  supplySystem: SupplySystem;
  voltage: number;
  derating: number | null;
  cableKgPerM: number;
  hardwareKgPerUnit: number;
  version: number;
};

/** The report as the checks page and the export read it; the per-unit flags go to the badges' own route. */
export type ChecksReport = Omit<ChecksResult, "units"> & {
  settings: ElectricalSettingsDto;
  electrical: EffectiveElectrical;
  cautions: { general: string[]; power: string[]; dmx: string[]; loadKindRule: string };
  /** Positions that carry lift lines, for the page's lift-line editor. */
  liftLines: { positionId: number; liftLines: number | null; version: number }[];
  computedAt: string;
  /** Milliseconds spent computing (after the reads), for the benchmark. */
  computeMs: number;
};

import type { FixtureMounting } from "@/models/fixture-mountings";

export type DmxMode = { name: string; footprint: number };

export type FixtureTypeDto = {
  id: number;
  productionId: number;
  name: string;
  family: string;
  coneMinDeg: number;
  coneMaxDeg: number;
  defaultSoftnessDeg: number;
  /** Peak candela at the widest cone (the only figure for a fixed-angle type). */
  peakCandela: number;
  /** A zoom's peak at its narrowest cone; null when only one figure is known. */
  peakCandelaNarrow: number | null;
  wattage: number;
  weightKg: number;
  dmxModes: DmxMode[];
  lensApertureM: number;
  frameSize: string | null;
  goboSize: string | null;
  lensDropM: number;
  mounting: FixtureMounting;
  lensRiseM: number;
  bodyWidthM: number;
  /** lamp or switch-mode; null: not said, the checks read it from the family. */
  loadKind: "lamp" | "switch-mode" | null;
  cells: number;
  version: number;
  updatedAt: string;
};

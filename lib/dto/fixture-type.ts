export type DmxMode = { name: string; footprint: number };

export type FixtureTypeDto = {
  id: number;
  productionId: number;
  name: string;
  family: string;
  coneMinDeg: number;
  coneMaxDeg: number;
  defaultSoftnessDeg: number;
  peakCandela: number;
  wattage: number;
  weightKg: number;
  dmxModes: DmxMode[];
  lensApertureM: number;
  frameSize: string | null;
  goboSize: string | null;
  lensDropM: number;
  cells: number;
  version: number;
  updatedAt: string;
};

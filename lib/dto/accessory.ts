export type AccessoryDto = {
  id: number;
  productionId: number;
  fixtureId: number;
  kind: string;
  universe: number | null;
  address: number | null;
  footprint: number | null;
  wattage: number;
  weightKg: number;
  notes: string | null;
  version: number;
  updatedAt: string;
};

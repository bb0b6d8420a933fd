// Test fixtures for focus charts: a FixtureDto built through the same geometry code the server uses.
import type { FixtureDto } from "@/lib/dto/fixture";
import { computeFixtureGeometry } from "@/lib/rig/fixture-geometry";
import { emptyFixture } from "@/lib/rig/fixture-fields";
import type { ChartProduction } from "@/lib/focus/chart-model";

export const PRODUCTION: ChartProduction = {
  name: "Test Production",
  displayUnits: "metric",
  datumName: "setting line",
  headHeight: 1.7,
  prosceniumWidth: 10,
  apronDepth: 1.5,
  backWallY: 9.5,
  stageWidth: 16,
};

type Over = Partial<FixtureDto> & {
  lens?: { x: number; y: number; z: number };
  mark?: { x: number; y: number };
  family?: string;
};

export function makeFixture(o: Over = {}): FixtureDto {
  const lens = o.lens ?? { x: 0, y: -8, z: 7 };
  const mark = o.mark ?? { x: 1.2, y: 2.5 };
  // Every field at a new fixture's empty value (the registry's), then this unit's own.
  const record = {
    ...emptyFixture(),
    id: 1,
    productionId: 1,
    positionId: 10,
    fixtureTypeId: 3,
    unitNumber: "7",
    channel: 107,
    universe: 1,
    address: 107,
    footprint: 1,
    circuit: "A12",
    colour: "pale blue",
    purpose: "front light",
    x: lens.x,
    y: lens.y,
    lensHeight: lens.z,
    focusX: mark.x,
    focusY: mark.y,
    coneDeg: 26,
    softnessDeg: 2,
    hung: true,
    version: 1,
    updatedAt: "2026-12-02T10:00:00.000Z",
    ...o,
  };
  const computed = computeFixtureGeometry(
    {
      ...record,
      focusPoint: null,
      position: { trimHeight: 8 },
      type: { coneMinDeg: 19, coneMaxDeg: 50, defaultSoftnessDeg: 2, lensDropM: 0.4 },
    },
    PRODUCTION.headHeight,
  );
  return {
    ...record,
    positionName: o.positionName ?? "FOH Bridge",
    typeName: "Profile 26°",
    family: o.family ?? "profile",
    focusPointName: o.focusPointName ?? null,
    computed,
  } as FixtureDto;
}

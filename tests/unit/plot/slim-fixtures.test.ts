import { describe, expect, it } from "vitest";
import { beamAim } from "@/lib/optics";
import {
  expandPlotFixtures,
  fromPlotFixtureWire,
  toPlotFixtureWire,
  type PlotFixtureRecord,
} from "@/lib/plot/slim-fixtures";
import type { PositionDto } from "@/lib/dto/plan";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { FocusPointDto } from "@/lib/dto/plan";

// Invented example rig: one pipe at 7.5 m trim, one profile type with a 0.3 m lens drop.
const position = { id: 1, name: "Pipe 1", kind: "pipe", trimHeight: 7.5 } as unknown as PositionDto;
const type = {
  id: 2,
  name: "Profile 26",
  family: "profile",
  coneMinDeg: 26,
  coneMaxDeg: 26,
  defaultSoftnessDeg: 3,
  lensDropM: 0.3,
} as unknown as FixtureTypeDto;
const point = { id: 3, name: "Area 3", x: 1, y: 2 } as unknown as FocusPointDto;

const record: PlotFixtureRecord = {
  id: 10,
  positionId: 1,
  fixtureTypeId: 2,
  focusPointId: null,
  unitNumber: "4",
  channel: 21,
  x: 1.23456789,
  y: -6.0004,
  lensHeight: null,
  focusX: 1.0001,
  focusY: 0.5,
  aim: "deck",
  coneDeg: null,
  softnessDeg: null,
  shutterCuts: null,
  purpose: "warm front",
  colour: "pale blue",
  version: 3,
};

describe("the plot's slim fixture shape", () => {
  it("round-trips every kept field, lengths rounded to the millimetre", () => {
    const back = fromPlotFixtureWire(JSON.parse(JSON.stringify(toPlotFixtureWire(record))));
    expect(back).toEqual({ ...record, x: 1.235, y: -6, focusX: 1 }); // millimetre rounding, common practice, no source
  });

  it("rebuilds names and geometry: lens at trim less lens drop, throw from the optics module", () => {
    const [f] = expandPlotFixtures([record], { positions: [position], fixtureTypes: [type], focusPoints: [] }, 1.7);
    expect(f.positionName).toBe("Pipe 1");
    expect(f.family).toBe("profile");
    // lens height default per DESIGN.md: trim minus the type's lens drop
    expect(f.computed.lensHeight).toBeCloseTo(7.2, 12);
    expect(f.computed.coneDeg).toBe(26); // type default when the unit sets none
    // throw = straight-line distance lens → mark (Pythagoras)
    const expected = Math.hypot(1.0001 - 1.23456789, 0.5 - -6.0004, 7.2);
    expect(f.computed.throw).toBeCloseTo(expected, 9);
    expect(f.computed.throw).toBeCloseTo(
      beamAim({ source: { x: record.x, y: record.y, z: 7.2 }, focus: { x: 1.0001, y: 0.5, z: 0 } }).throw,
      12,
    );
    expect(f.computed.deck?.status).toBe("ok");
  });

  it("aims at a shared focus point by name, at head height when asked", () => {
    const shared = { ...record, focusPointId: 3, aim: "head" as const };
    const [f] = expandPlotFixtures(
      [shared],
      { positions: [position], fixtureTypes: [type], focusPoints: [point] },
      1.7,
    );
    expect(f.focusPointName).toBe("Area 3");
    expect(f.computed.focus).toEqual({ x: 1, y: 2, z: 1.7 });
  });

  it("leaves out a unit whose position or type is unknown", () => {
    expect(
      expandPlotFixtures(
        [{ ...record, positionId: 99 }],
        { positions: [position], fixtureTypes: [type], focusPoints: [] },
        1.7,
      ),
    ).toEqual([]);
  });
});

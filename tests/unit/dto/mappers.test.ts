// The data layer's shared mapping helpers and the one fixture join.
import { describe, expect, it } from "vitest";
import { iso, plain } from "@/lib/data/plain";
import { jsonColumn } from "@/lib/data/json-column";
import { fixtureJoiner, joinFixtures } from "@/lib/rig/fixture-join";
import { expandPlotFixtures, PLOT_FIXTURE_FIELDS, type PlotFixtureRecord } from "@/lib/plot/slim-fixtures";
import { emptyFixture } from "@/lib/rig/fixture-fields";
import type { FixtureRecord } from "@/lib/dto/fixture";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { FocusPointDto, PositionDto } from "@/lib/dto/plan";

describe("plain(row, keys)", () => {
  // A stand-in for a model instance: fields behind getters, plus things that must not leak.
  class Row {
    #secret = "hash";
    get id() {
      return 7;
    }
    get name() {
      return "Pipe 1";
    }
    get x2() {
      return null;
    }
    get sortOrder() {
      return undefined;
    }
    get updatedAt() {
      return new Date(Date.UTC(2026, 11, 5, 14, 3, 9, 120));
    }
    get focusedAt() {
      return null as Date | null;
    }
    get passwordHash() {
      return this.#secret;
    }
  }

  it("copies only the listed fields, dates as ISO 8601 UTC strings", () => {
    const out = plain(new Row(), ["id", "name", "x2", "updatedAt", "focusedAt"]);
    // ISO 8601 extended format with milliseconds, as Date.prototype.toISOString writes it (ECMA-262).
    expect(out).toEqual({ id: 7, name: "Pipe 1", x2: null, updatedAt: "2026-12-05T14:03:09.120Z", focusedAt: null });
    expect(out).not.toHaveProperty("passwordHash");
    expect(JSON.parse(JSON.stringify(out))).toEqual(out); // survives the trip to the browser unchanged
  });

  it("sends a missing field as null, never undefined (so the key is not dropped from JSON)", () => {
    expect(plain(new Row(), ["sortOrder"])).toEqual({ sortOrder: null });
  });

  it("iso() reads Dates and the driver's date strings alike", () => {
    expect(iso(new Date(Date.UTC(2026, 0, 2, 3, 4, 5)))).toBe("2026-01-02T03:04:05.000Z");
    expect(iso("2026-01-02T03:04:05Z")).toBe("2026-01-02T03:04:05.000Z");
    expect(iso(null)).toBeNull();
  });
});

describe("jsonColumn", () => {
  it("parses text from a raw read and passes a parsed value through", () => {
    const cuts = [{ label: "top", a: { x: 0, y: 1 }, b: { x: 2, y: 1 } }];
    expect(jsonColumn(JSON.stringify(cuts))).toEqual(cuts);
    expect(jsonColumn(cuts)).toBe(cuts);
    expect(jsonColumn(null)).toBeNull();
    expect(jsonColumn("[3,1,2]")).toEqual([3, 1, 2]);
  });

  it("refuses text that is not JSON rather than passing it on", () => {
    expect(() => jsonColumn("{not json")).toThrow(SyntaxError);
  });
});

// Invented example rig: a pipe and a boom, one profile type, one focus point.
const positions = [
  { id: 1, name: "Pipe 1", kind: "overhead-pipe", trimHeight: 7.5 },
  { id: 2, name: "SL boom", kind: "boom", trimHeight: 4 },
] as unknown as PositionDto[];
const types = [
  {
    id: 5,
    name: "Profile 26",
    family: "profile",
    coneMinDeg: 26,
    coneMaxDeg: 26,
    defaultSoftnessDeg: 3,
    lensDropM: 0.3,
  },
] as unknown as FixtureTypeDto[];
const points = [{ id: 9, name: "Area C", x: 0.5, y: 2 }] as unknown as FocusPointDto[];

const record = (over: Partial<FixtureRecord>): FixtureRecord =>
  ({
    ...emptyFixture(),
    id: 1,
    productionId: 1,
    positionId: 1,
    fixtureTypeId: 5,
    unitNumber: "1",
    x: 0,
    y: 0,
    version: 1,
    updatedAt: "2026-12-05T00:00:00.000Z",
    ...over,
  }) as FixtureRecord;

const rig = [
  record({ id: 1, unitNumber: "1", x: -2, y: -4, focusPointId: 9 }),
  record({ id: 2, unitNumber: "2", x: 2, y: -4, focusX: 1, focusY: 1, aim: "head", coneDeg: 19, softnessDeg: 5 }),
  record({ id: 3, positionId: 2, unitNumber: "1", x: -6, y: 1, lensHeight: 1.2, focusX: 0, focusY: 1 }),
  record({ id: 4, positionId: 99, unitNumber: "3" }), // its position was deleted while the rig was read
];

describe("one fixture join for the API and the plot", () => {
  const join = fixtureJoiner({ positions, types, points }, 1.7);

  it("the plot's slim records expand to the same names and beams as the API's full fixtures", () => {
    const api = joinFixtures(rig, join);
    const slim = rig.map((f) => Object.fromEntries(PLOT_FIXTURE_FIELDS.map((k) => [k, f[k]])) as PlotFixtureRecord);
    const plot = expandPlotFixtures(slim, { positions, fixtureTypes: types, focusPoints: points }, 1.7);
    expect(plot.map((f) => f.id)).toEqual(api.map((f) => f.id));
    for (const [i, f] of plot.entries()) {
      const a = api[i];
      expect([f.positionName, f.typeName, f.family, f.focusPointName]).toEqual([
        a.positionName,
        a.typeName,
        a.family,
        a.focusPointName,
      ]);
      expect(f.computed).toEqual(a.computed);
    }
  });

  it("names the position, type and focus point, and leaves out a fixture whose position is gone", () => {
    const out = joinFixtures(rig, join);
    expect(out.map((f) => f.id)).toEqual([1, 2, 3]);
    expect(out[0]).toMatchObject({
      positionName: "Pipe 1",
      typeName: "Profile 26",
      family: "profile",
      focusPointName: "Area C",
    });
    expect(out[1].focusPointName).toBeNull();
    expect(join(rig[3])).toBeNull();
  });

  it("works the beam out from the position, the type and the mark (lens at trim less the lens drop)", () => {
    const [first, , boom] = joinFixtures(rig, join);
    // DESIGN.md: an unset lens height is the position's trim less the type's lens drop.
    expect(first.computed.lensHeight).toBeCloseTo(7.2, 12);
    expect(boom.computed.lensHeight).toBe(1.2);
    // Throw: straight-line distance from the lens to the focus point on the deck (Pythagoras).
    expect(first.computed.throw).toBeCloseTo(Math.hypot(0.5 - -2, 2 - -4, 7.2), 12);
  });
});

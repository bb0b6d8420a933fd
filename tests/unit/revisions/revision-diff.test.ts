// The grouped change list between two hand-built snapshots. Every expectation below is worked out by hand
// from the two snapshots in this file (common practice, no source): the diff must find exactly these.
import { describe, expect, it } from "vitest";
import { changedIds, diffSnapshots, isUnchanged, levelChanges, summarise } from "@/lib/revisions/diff";
import type { SnapCue, SnapFixture, Snapshot } from "@/lib/revisions/types";

function fixture(id: number, over: Partial<SnapFixture> = {}): SnapFixture {
  return {
    id,
    positionId: 1,
    positionName: "LX1",
    unitNumber: String(id),
    fixtureTypeId: 7,
    typeName: "Profile 26",
    focusPointId: null,
    focusPointName: null,
    accessories: [],
    channel: id,
    universe: 1,
    address: id * 10,
    circuit: `C${id}`,
    dimmer: null,
    colour: "pale lavender",
    gobo: null,
    purpose: "front wash",
    coneDeg: 26,
    softnessDeg: 3,
    focusX: 0,
    focusY: 2,
    shutterCuts: null,
    notes: null,
    ...over,
  };
}

function cue(id: number, number: number, over: Partial<SnapCue> = {}): SnapCue {
  return { id, number, label: "", upTime: 5, downTime: null, delay: 0, follow: null, levels: {}, ...over };
}

const snap = (fixtures: SnapFixture[], cues: SnapCue[] = []): Snapshot => ({
  format: 1,
  takenAt: "2026-12-05T00:00:00.000Z",
  fixtures,
  positions: [{ id: 1, name: "LX1", kind: "overhead pipe", trimHeight: 7 }],
  types: [{ id: 7, name: "Profile 26", wattage: 750 }],
  cues,
});

describe("diffSnapshots: fixtures", () => {
  const before = snap([fixture(1), fixture(2), fixture(3), fixture(4)]);
  const after = snap([
    fixture(1), // untouched
    fixture(2, { focusX: 1.5, coneDeg: 19 }), // refocused: two fields
    fixture(3, { address: 101, colour: "full CTB" }), // re-patched and recoloured
    fixture(5, { positionName: "LX2", positionId: 2 }), // added; 4 is gone
  ]);
  const diff = diffSnapshots(before, after);

  it("finds the added and the removed unit, by id", () => {
    expect(diff.fixtures.added.map((l) => l.id)).toEqual([5]);
    expect(diff.fixtures.removed.map((l) => l.id)).toEqual([4]);
    expect(diff.fixtures.added[0].name).toBe("LX2 unit 5 (channel 5)");
  });

  it("puts each changed field in its group, with before and after", () => {
    expect(diff.fixtures.refocused).toEqual([
      {
        id: 2,
        name: "LX1 unit 2 (channel 2)",
        changes: [
          { field: "focusX", label: expect.any(String), before: 0, after: 1.5 },
          { field: "coneDeg", label: expect.any(String), before: 26, after: 19 },
        ],
      },
    ]);
    expect(diff.fixtures.repatched.map((l) => [l.id, l.changes.map((c) => [c.field, c.before, c.after])])).toEqual([
      [3, [["address", 30, 101]]],
    ]);
    expect(diff.fixtures.recoloured.map((l) => [l.id, l.changes[0].before, l.changes[0].after])).toEqual([
      [3, "pale lavender", "full CTB"],
    ]);
    expect(diff.fixtures.otherwise).toEqual([]);
  });

  it("shows a moved unit's position by name, not by id", () => {
    const moved = diffSnapshots(snap([fixture(1)]), snap([fixture(1, { positionId: 2, positionName: "LX2" })]));
    expect(moved.fixtures.otherwise[0].changes).toEqual([
      { field: "positionId", label: "Position", before: "LX1", after: "LX2" },
    ]);
  });

  it("counts the groups, and marks every added or changed unit (not the removed one)", () => {
    expect(summarise(diff).fixtures).toEqual({
      added: 1,
      removed: 1,
      refocused: 1,
      repatched: 1,
      recoloured: 1,
      otherwise: 0,
    });
    expect(changedIds(diff).fixtureIds).toEqual([2, 3, 5]);
  });

  it("sees no change in a value that only went through a decimal column (1e-9 apart)", () => {
    const d = diffSnapshots(snap([fixture(1, { focusX: 0.1 + 0.2 })]), snap([fixture(1, { focusX: 0.3 })]));
    expect(isUnchanged(summarise(d))).toBe(true);
  });

  it("lists everything as added for the first revision", () => {
    const first = diffSnapshots(null, before);
    expect(first.fixtures.added.map((l) => l.id)).toEqual([1, 2, 3, 4]);
    expect(first.positions.added).toHaveLength(1);
    expect(first.types.added).toHaveLength(1);
  });

  it("compares shutter cuts as whole values (a list of cut lines)", () => {
    const cut = [{ a: { x: 0, y: 0 }, b: { x: 1, y: 0 } }];
    const d = diffSnapshots(
      snap([fixture(1, { shutterCuts: cut })]),
      snap([fixture(1, { shutterCuts: [{ a: { x: 0, y: 0 }, b: { x: 1, y: 0.2 } }] })]),
    );
    expect(d.fixtures.refocused.map((l) => l.changes.map((c) => c.field))).toEqual([["shutterCuts"]]);
  });
});

describe("diffSnapshots: cues", () => {
  const before = snap(
    [],
    [cue(10, 1, { levels: { 1: 50, 2: 80 } }), cue(11, 2, { upTime: 3 }), cue(12, 3, { label: "Sunset" })],
  );
  const after = snap(
    [],
    [
      cue(10, 1, { levels: { 1: 60, 3: 100 } }), // 1: 50→60, 2 no longer moves, 3 new
      cue(11, 2, { upTime: 8, follow: 2 }), // retimed
      cue(13, 4), // added; 12 removed
    ],
  );
  const diff = diffSnapshots(before, after);

  it("finds added, removed, retimed and re-levelled cues", () => {
    expect(diff.cues.added.map((l) => l.name)).toEqual(["Cue 4"]);
    expect(diff.cues.removed.map((l) => l.name)).toEqual(['Cue 3 "Sunset"']);
    expect(diff.cues.retimed[0].changes.map((c) => [c.field, c.before, c.after])).toEqual([
      ["upTime", 3, 8],
      ["follow", null, 2],
    ]);
    expect(diff.cues.relevelled[0].levels).toEqual([
      { channel: 1, before: 50, after: 60 },
      { channel: 2, before: 80, after: null },
      { channel: 3, before: null, after: 100 },
    ]);
    expect(changedIds(diff).cueIds).toEqual([10, 11, 13]);
  });

  it("levelChanges ignores channels that stay the same", () => {
    expect(levelChanges({ 1: 50, 5: 0 }, { 1: 50, 5: 0 })).toEqual([]);
    expect(levelChanges({ 5: 0 }, {})).toEqual([{ channel: 5, before: 0, after: null }]);
  });
});

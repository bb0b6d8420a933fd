// The import preview's old → new list, built from a real plan (planImport) over an invented rig.
import { describe, expect, it } from "vitest";
import { EMPTY, importDiff } from "@/lib/io/import-diff";
import { planImport, type Snapshot } from "@/lib/rig/import-plan";

const snap: Snapshot = {
  positions: [
    { id: 1, name: "LX1", x1: -5, y1: 1, x2: 5, y2: 1 },
    { id: 2, name: "SL boom", x1: -6, y1: 3, x2: null, y2: null },
  ],
  types: [
    { id: 1, name: "Profile 26", dmxModes: [{ name: "dimmer", footprint: 1 }] },
    { id: 2, name: "Fresnel 150", dmxModes: [{ name: "dimmer", footprint: 1 }] },
  ],
  focusPoints: [{ id: 7, name: "Area 1" }],
  fixtures: [
    {
      id: 10,
      version: 3,
      positionId: 1,
      fixtureTypeId: 1,
      unitNumber: "1",
      address: null,
      footprint: null,
      channel: 12,
      colour: "pale blue",
      x: 1.2,
      coneDeg: null,
      hung: false,
      focusPointId: null,
    },
    {
      id: 11,
      version: 1,
      positionId: 1,
      fixtureTypeId: 1,
      unitNumber: "2",
      address: null,
      footprint: null,
      channel: 13,
      colour: null,
      x: 2.4,
      coneDeg: 26,
      hung: true,
      focusPointId: 7,
    },
  ],
};
const designer = { role: "designer" as const, isOwner: true };
const plan = (rows: Parameters<typeof planImport>[0]) =>
  planImport(rows, snap, { member: designer, createMissing: true, columnOf: (k) => k }).plans;

describe("importDiff", () => {
  it("counts new, changed and unchanged rows as the plan decided them", () => {
    const plans = plan([
      { rowNumber: 2, values: { position: "LX1", unitNumber: "1", channel: 12 } }, // unchanged
      { rowNumber: 3, values: { position: "LX1", unitNumber: "2", channel: 14 } }, // changed
      { rowNumber: 4, values: { position: "LX1", unitNumber: "3", type: "Profile 26", channel: 15 } }, // new
      { rowNumber: 5, values: { position: "LX1", unitNumber: "4", type: "Profile 26" } }, // new
    ]);
    const d = importDiff(plans, snap, "metric");
    expect(d.counts).toEqual({ new: 2, changed: 1, unchanged: 1 });
    expect(d.changedTotal).toBe(1);
    expect(d.changed.map((c) => [c.position, c.unitNumber, c.row])).toEqual([["LX1", "2", 3]]);
  });

  it("lists every changed field, old → new, with names for types and focus points and blanks as a dash", () => {
    const plans = plan([
      {
        rowNumber: 2,
        values: {
          position: "lx1",
          unitNumber: "1",
          channel: 21,
          colour: "light frost",
          type: "fresnel 150",
          focusPoint: "Area 1",
          hung: true,
          coneDeg: 30,
        },
      },
      { rowNumber: 3, values: { position: "LX1", unitNumber: "2", colour: "full CTB", focusPoint: null, hung: true } },
    ]);
    const d = importDiff(plans, snap, "metric");
    const byField = (i: number) => Object.fromEntries(d.changed[i].fields.map((f) => [f.field, [f.from, f.to]]));
    expect(byField(0)).toEqual({
      channel: ["12", "21"],
      colour: ["pale blue", "light frost"],
      type: ["Profile 26", "Fresnel 150"],
      focusPoint: [EMPTY, "Area 1"],
      hung: ["no", "yes"],
      coneDeg: [EMPTY, "30°"],
    });
    // unchanged fields (hung stays yes) are not listed
    expect(byField(1)).toEqual({ colour: [EMPTY, "full CTB"], focusPoint: ["Area 1", EMPTY] });
    expect(d.changed[0].fields.find((f) => f.field === "colour")?.header).toBe("Colour");
  });

  it("shows lengths in the production's units, finer where the usual rounding would hide the change", () => {
    // 1 ft = 0.3048 m exactly (NIST SP 811); 2.4384 m = 8' 0", 2.5908 m = 8' 6"
    const moved = plan([{ rowNumber: 2, values: { position: "LX1", unitNumber: "2", x: 2.5908 } }]);
    expect(importDiff(moved, snap, "imperial").changed[0].fields[0]).toMatchObject({
      field: "x",
      from: `7' 10 1/2"`, // 2.4 m = 94.49 in → nearest half inch 94.5 in = 7' 10 1/2"
      to: `8' 6"`,
    });
    expect(importDiff(moved, snap, "metric").changed[0].fields[0]).toMatchObject({ from: "2.40 m", to: "2.59 m" });
    // 2 mm: both read 1.20 m at two decimals, so the list shows tenths of a millimetre
    const nudged = plan([{ rowNumber: 2, values: { position: "LX1", unitNumber: "1", x: 1.202 } }]);
    expect(importDiff(nudged, snap, "metric").changed[0].fields[0]).toMatchObject({
      from: "1.2000 m",
      to: "1.2020 m",
    });
  });

  it("keeps the list short on a large file but counts every change", () => {
    const plans = plan([
      { rowNumber: 2, values: { position: "LX1", unitNumber: "1", channel: 40 } },
      { rowNumber: 3, values: { position: "LX1", unitNumber: "2", channel: 41 } },
    ]);
    const d = importDiff(plans, snap, "metric", 1);
    expect(d.changed).toHaveLength(1);
    expect(d.changedTotal).toBe(2);
    expect(d.counts.changed).toBe(2);
  });
});

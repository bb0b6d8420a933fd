import { describe, expect, it } from "vitest";
import { planImport, type Snapshot } from "@/lib/rig/import-plan";

const snap: Snapshot = {
  positions: [{ id: 1, name: "LX1", x1: -5, y1: 1, x2: 5, y2: 1 }],
  types: [
    { id: 1, name: "Profile 26", dmxModes: [{ name: "dimmer", footprint: 1 }] },
    { id: 2, name: "Wash", dmxModes: [{ name: "std", footprint: 13 }] },
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
      colour: "pale blue",
      circuit: "A1",
      x: 1.23456,
      lensHeight: 6,
      hung: false,
      focusPointId: null,
    },
  ],
};
const designer = { role: "designer" as const, isOwner: true };
const electrician = { role: "electrician" as const, isOwner: false };
const columnOf = (k: string) => k;

describe("planImport", () => {
  it("treats lengths within 0.1 mm as unchanged and matches names case-insensitively", () => {
    const r = planImport(
      [{ rowNumber: 2, values: { position: "lx1", unitNumber: "1", x: 1.23459, colour: "pale blue" } }],
      snap,
      { member: designer, createMissing: false, columnOf },
    );
    expect(r.plans).toEqual([{ rowNumber: 2, action: "unchanged", fixtureId: 10 }]);
  });

  it("plans an update with only the changed fields and the version read", () => {
    const r = planImport(
      [
        {
          rowNumber: 2,
          values: { position: "LX1", unitNumber: "1", colour: "pale amber", circuit: "A1", focusPoint: "area 1" },
        },
      ],
      snap,
      { member: designer, createMissing: false, columnOf },
    );
    expect(r.plans[0]).toMatchObject({
      action: "update",
      fixtureId: 10,
      version: 3,
      changes: { colour: "pale amber", focusPointId: 7 },
    });
  });

  it("refuses the electrician's designer-field changes by name, and new units", () => {
    const r = planImport(
      [
        { rowNumber: 2, values: { position: "LX1", unitNumber: "1", colour: "pale amber", circuit: "B2" } },
        { rowNumber: 3, values: { position: "LX1", unitNumber: "2", type: "Profile 26" } },
      ],
      snap,
      { member: electrician, createMissing: true, columnOf },
    );
    expect(r.plans).toEqual([]);
    expect(r.errors).toEqual([
      {
        row: 2,
        column: "colour",
        message: 'Your role cannot change Colour (it would go from "pale blue" to "pale amber")',
      },
      { row: 3, column: "unitNumber", message: "Unit 2 on LX1 is not in the rig; only the designer can add fixtures" },
    ]);
  });

  it("lets the electrician change electrics", () => {
    const r = planImport(
      [{ rowNumber: 2, values: { position: "LX1", unitNumber: "1", circuit: "B2", hung: true } }],
      snap,
      { member: electrician, createMissing: false, columnOf },
    );
    expect(r.plans[0]).toMatchObject({ action: "update", changes: { circuit: "B2", hung: true } });
  });

  it("checks the DMX range with the type's footprint", () => {
    // ANSI E1.11: a 13-slot unit at 500 ends on 512; at 501 it would need slot 513
    const ok = planImport(
      [{ rowNumber: 2, values: { position: "LX1", unitNumber: "5", type: "Wash", address: 500 } }],
      snap,
      { member: designer, createMissing: false, columnOf },
    );
    expect(ok.counts.create).toBe(1);
    const bad = planImport(
      [{ rowNumber: 2, values: { position: "LX1", unitNumber: "5", type: "Wash", address: 501 } }],
      snap,
      { member: designer, createMissing: false, columnOf },
    );
    expect(bad.errors[0].message).toBe("A 13-slot fixture at address 501 runs past slot 512");
  });

  it("collects missing positions and types once each when asked to create them", () => {
    const rows = [2, 3].map((n) => ({
      rowNumber: n,
      values: { position: "Boom SR", unitNumber: String(n), type: "Par" },
    }));
    const r = planImport(rows, snap, { member: designer, createMissing: true, columnOf });
    expect(r).toMatchObject({ newPositions: ["Boom SR"], newTypes: ["Par"], counts: { create: 2 } });
  });
});

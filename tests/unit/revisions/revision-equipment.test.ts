// Equipment counts and the shop's add / return list, checked against counts done by hand on the small
// rigs built here (common practice, no source: spares are rounded up to whole units).
import { describe, expect, it } from "vitest";
import { addReturnList, equipmentList, sparesFor } from "@/lib/revisions/equipment";
import { letterAt, letterIndex, nextLetter } from "@/lib/revisions/letters";
import type { SnapFixture } from "@/lib/revisions/types";

let nextId = 1;
function unit(typeName: string, over: Partial<SnapFixture> = {}): SnapFixture {
  return {
    id: nextId++,
    positionId: 1,
    positionName: "LX1",
    typeName,
    focusPointName: null,
    accessories: [],
    bodyKey: null,
    ...over,
  };
}

describe("sparesFor", () => {
  it("rounds up to whole units and never adds spares to nothing", () => {
    expect(sparesFor(30, 10)).toBe(3); // 3.0 exactly, not 4 from binary rounding
    expect(sparesFor(31, 10)).toBe(4); // 3.1 → 4
    expect(sparesFor(1, 10)).toBe(1); // 0.1 → 1
    expect(sparesFor(12, 0)).toBe(0);
    expect(sparesFor(0, 50)).toBe(0);
  });
});

describe("equipmentList", () => {
  it("counts units by type and accessories by kind, each with its spares", () => {
    const rig = [
      ...Array.from({ length: 12 }, () => unit("Profile 26")),
      ...Array.from({ length: 5 }, () => unit("Fresnel 1k", { accessories: ["barn doors"] })),
      unit("Profile 36", { accessories: ["iris", "gobo rotator"] }),
    ];
    expect(equipmentList(rig, 10)).toEqual([
      { kind: "accessory", name: "barn doors", inUse: 5, spares: 1, total: 6 },
      { kind: "accessory", name: "gobo rotator", inUse: 1, spares: 1, total: 2 },
      { kind: "accessory", name: "iris", inUse: 1, spares: 1, total: 2 },
      { kind: "type", name: "Fresnel 1k", inUse: 5, spares: 1, total: 6 },
      { kind: "type", name: "Profile 26", inUse: 12, spares: 2, total: 14 },
      { kind: "type", name: "Profile 36", inUse: 1, spares: 1, total: 2 },
    ]);
  });

  it("counts the cells of one multi-cell body once, on its own position", () => {
    const rig = [
      unit("Batten 4-cell", { bodyKey: "B1", positionId: 1 }),
      unit("Batten 4-cell", { bodyKey: "B1", positionId: 1 }),
      unit("Batten 4-cell", { bodyKey: "B1", positionId: 1 }),
      unit("Batten 4-cell", { bodyKey: "B1", positionId: 2 }), // same key on another position: another body
    ];
    expect(equipmentList(rig, 0)).toEqual([{ kind: "type", name: "Batten 4-cell", inUse: 2, spares: 0, total: 2 }]);
  });
});

describe("addReturnList", () => {
  it("sends what the new list has more of and takes back what it has less of", () => {
    const a = equipmentList([...Array.from({ length: 10 }, () => unit("Profile 26")), unit("Fresnel 1k")], 0);
    const b = equipmentList(
      [...Array.from({ length: 14 }, () => unit("Profile 26")), unit("Wash 7", { accessories: ["top hat"] })],
      0,
    );
    expect(addReturnList(a, b)).toEqual([
      { kind: "accessory", name: "top hat", before: 0, after: 1, add: 1, return: 0 },
      { kind: "type", name: "Fresnel 1k", before: 1, after: 0, add: 0, return: 1 },
      { kind: "type", name: "Profile 26", before: 10, after: 14, add: 4, return: 0 },
      { kind: "type", name: "Wash 7", before: 0, after: 1, add: 1, return: 0 },
    ]);
  });

  it("is empty when nothing changes", () => {
    const a = equipmentList([unit("Profile 26")], 10);
    expect(addReturnList(a, a)).toEqual([]);
  });
});

describe("revision letters", () => {
  it("runs A … Z without I and O, then AA", () => {
    expect([0, 1, 7, 8, 12, 13, 23, 24, 25].map(letterAt)).toEqual(["A", "B", "H", "J", "N", "P", "Z", "AA", "AB"]);
    for (let n = 0; n < 700; n++) expect(letterIndex(letterAt(n))).toBe(n);
  });

  it("takes the letter after the highest one used, skipping typed labels", () => {
    expect(nextLetter([])).toBe("A");
    expect(nextLetter(["A", "B"])).toBe("C");
    expect(nextLetter(["A", "Tech 2"])).toBe("B");
    expect(nextLetter(["C"])).toBe("D");
    expect(nextLetter(["H"])).toBe("J");
  });
});

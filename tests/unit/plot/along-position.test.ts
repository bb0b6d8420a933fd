import { describe, expect, it } from "vitest";
import {
  nearestPosition,
  numberingOrder,
  numberingOrderVertical,
  projectOntoPosition,
  renumber,
  snap,
  spreadAlong,
  unitNumberForInsert,
} from "@/lib/plot/along-position";

const pipe = { id: 1, x1: -7, y1: 1, x2: 7, y2: 1 };
const boom = { id: 2, x1: 6.5, y1: 2, x2: null, y2: null };

describe("projection onto a position", () => {
  it("drops a point perpendicularly onto a pipe and clamps to its ends", () => {
    const hit = projectOntoPosition(pipe, { x: 2, y: 1.4 });
    expect(hit.point).toEqual({ x: 2, y: 1 });
    expect(hit.distance).toBeCloseTo(0.4, 12);
    expect(hit.t).toBeCloseTo(9 / 14, 12);
    expect(projectOntoPosition(pipe, { x: 20, y: 0 }).point).toEqual({ x: 7, y: 1 });
  });
  it("a point position answers its own point", () => {
    expect(projectOntoPosition(boom, { x: 0, y: 0 }).point).toEqual({ x: 6.5, y: 2 });
  });
  it("finds the nearest position within the tolerance only", () => {
    expect(nearestPosition([pipe, boom], { x: 6.3, y: 2.1 }, 0.5)?.position.id).toBe(2);
    expect(nearestPosition([pipe, boom], { x: 0, y: 3 }, 0.5)).toBeNull();
  });
});

describe("numbering along a position", () => {
  const units = [
    { id: 10, x: -3, y: 1 },
    { id: 11, x: 4, y: 1 },
    { id: 12, x: 0, y: 1 },
  ];
  it("from stage left puts the unit with the largest x first", () => {
    // DESIGN.md, common practice: overhead positions numbered from stage left (+x).
    expect(numberingOrder(units, "from-stage-left").map((u) => u.id)).toEqual([11, 12, 10]);
    expect(numberingOrder(units, "from-stage-right").map((u) => u.id)).toEqual([10, 12, 11]);
  });
  it("booms number from the top", () => {
    // DESIGN.md, common practice: booms from the top.
    const onBoom = [
      { id: 1, lensHeight: 0.6 },
      { id: 2, lensHeight: 3.3 },
      { id: 3, lensHeight: 1.5 },
    ];
    expect(numberingOrderVertical(onBoom).map((u) => u.id)).toEqual([2, 3, 1]);
  });
  it("renumbers 1…n in order", () => {
    expect([...renumber([7, 3, 9])]).toEqual([
      [7, "1"],
      [3, "2"],
      [9, "3"],
    ]);
  });
});

describe("a unit slotted in never renumbers the others", () => {
  // DESIGN.md: unit numbers are text sorted naturally (7, 7A, 8) so adding a unit never renumbers a position.
  it("after the last unit takes the next whole number", () => {
    expect(unitNumberForInsert(["1", "2", "3"], "3")).toBe("4");
    expect(unitNumberForInsert([], null)).toBe("1");
  });
  it("between two units takes a letter", () => {
    expect(unitNumberForInsert(["1", "2", "3"], "2")).toBe("2A");
    expect(unitNumberForInsert(["1", "2", "2A", "3"], "2A")).toBe("2B");
    expect(unitNumberForInsert(["1", "2", "2A", "3"], "2")).toBe("2B");
  });
  it("uses a free whole number when there is a gap", () => {
    expect(unitNumberForInsert(["1", "5"], "1")).toBe("2");
    expect(unitNumberForInsert(["3", "4"], null)).toBe("2");
  });
  it("before unit 1 takes 0, then letters of 0", () => {
    expect(unitNumberForInsert(["1", "2"], null)).toBe("0");
    expect(unitNumberForInsert(["0", "1"], null)).toBe("0A");
  });
});

describe("spreading and snapping", () => {
  it("spreads units evenly inset from the ends", () => {
    expect(spreadAlong(pipe, 2)).toEqual([
      { x: -3.5, y: 1 },
      { x: 3.5, y: 1 },
    ]);
  });
  it("snaps to the step", () => {
    expect(snap(1.234, 0.05)).toBeCloseTo(1.25, 12);
    expect(snap(1.234, 0)).toBe(1.234);
  });
});

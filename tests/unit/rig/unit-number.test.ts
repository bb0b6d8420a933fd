import { describe, expect, it } from "vitest";
import { compareUnitNumbers, unitSortKey } from "@/lib/rig/unit-number";

describe("unit numbers sort naturally", () => {
  // DESIGN.md: "Unit numbers are text sorted naturally (7, 7A, 8, 12A–12D)".
  it("orders numbers with letter suffixes as a crew expects", () => {
    const shuffled = ["12B", "8", "12A", "7A", "10", "7", "12D", "1", "12C", "9"];
    expect([...shuffled].sort(compareUnitNumbers)).toEqual([
      "1",
      "7",
      "7A",
      "8",
      "9",
      "10",
      "12A",
      "12B",
      "12C",
      "12D",
    ]);
  });
  it("plain string order of the keys equals natural order (what the database sorts by)", () => {
    const units = ["2", "10", "100", "11A", "11"];
    const byKey = [...units].sort((a, b) => (unitSortKey(a) < unitSortKey(b) ? -1 : 1));
    expect(byKey).toEqual(["2", "10", "11", "11A", "100"]);
  });
  it("ignores case and leading zeros", () => {
    expect(unitSortKey("07a")).toBe(unitSortKey("7A"));
  });
});

// A change-log entry turned into the history's lines, one per field: checked against entries written out
// by hand here (common practice, no source).
import { describe, expect, it } from "vitest";
import { historyLines, showValue } from "@/lib/revisions/history-lines";

const entry = (before: Record<string, unknown> | null, after: Record<string, unknown> | null, action = "update") => ({
  id: 7,
  action: action as "create" | "update" | "delete",
  who: "Ada Lumen",
  at: "2026-12-05T17:00:00.000Z",
  before,
  after,
});

describe("historyLines", () => {
  it("gives one line per changed field, leaving bookkeeping and unchanged fields out", () => {
    const lines = historyLines(
      "fixture",
      entry(
        { id: 1, version: 3, updatedAt: "a", colour: "pale lavender", channel: 11, coneDeg: 26 },
        { id: 1, version: 4, updatedAt: "b", colour: "full CTB", channel: 11, coneDeg: 19 },
      ),
    );
    expect(lines.map((l) => [l.field, l.label, l.before, l.after, l.who])).toEqual([
      ["colour", "Colour", "pale lavender", "full CTB", "Ada Lumen"],
      ["coneDeg", expect.any(String), 26, 19, "Ada Lumen"],
    ]);
  });

  it("shows a moved unit's position by name, and a deleted one as deleted", () => {
    const names = { positionId: new Map([[2, "LX2"]]) };
    const [line] = historyLines("fixture", entry({ positionId: 1 }, { positionId: 2 }), names);
    expect([line.before, line.after]).toEqual(["#1 (deleted)", "LX2"]);
  });

  it("splits a cue's levels into a line per channel, and marks a restore", () => {
    const lines = historyLines(
      "cue",
      entry(
        { levels: { 1: 50, 2: 80 }, upTime: 5 },
        { levels: { 1: 50, 2: 60, 3: 100 }, upTime: 5, restoredFrom: "B" },
      ),
    );
    expect(lines.map((l) => [l.label, l.before, l.after, l.restoredFrom])).toEqual([
      ["Channel 2 level", 80, 60, "B"],
      ["Channel 3 level", null, 100, "B"],
    ]);
  });

  it("makes a create or a delete one line", () => {
    expect(historyLines("position", entry(null, { name: "LX1" }, "create"))).toHaveLength(1);
    expect(historyLines("position", entry({ name: "LX1" }, null, "delete"))[0].label).toBe("deleted");
  });
});

describe("showValue", () => {
  it("writes empty values as a dash and booleans as words", () => {
    expect([showValue(null), showValue(""), showValue(true), showValue(0.12345), showValue("x")]).toEqual([
      "—",
      "—",
      "yes",
      "0.123",
      "x",
    ]);
  });
});

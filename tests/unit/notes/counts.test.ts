// The badges' words and keys: what a screen reader hears for each count, and the key a row looks its count up by.
import { describe, expect, it } from "vitest";
import { countFor, noteCountLabel, noteTargetKey } from "@/lib/notes/counts";

describe("open-note counts", () => {
  it("key a thing by its subject and id; the production has no id", () => {
    expect(noteTargetKey("fixture", 7)).toBe("fixture:7");
    expect(noteTargetKey("production", null)).toBe("production:");
    expect(noteTargetKey("production", 12)).toBe("production:"); // one production per key space
  });

  it("find a thing's count, and zero for a thing with none", () => {
    const counts = { "fixture:7": { open: 3, high: 1 } };
    expect(countFor(counts, "fixture", 7)).toEqual({ open: 3, high: 1 });
    expect(countFor(counts, "fixture", 8)).toEqual({ open: 0, high: 0 });
    expect(countFor(undefined, "cue", 1)).toEqual({ open: 0, high: 0 });
  });

  it("name the badge in words: count, priority and the thing", () => {
    expect(noteCountLabel({ open: 3, high: 0 }, "unit 7, 1st Electric")).toBe("3 open notes on unit 7, 1st Electric");
    expect(noteCountLabel({ open: 1, high: 1 }, "cue 12")).toBe("1 open note (1 high priority) on cue 12");
    expect(noteCountLabel({ open: 0, high: 0 }, "position FOH Bridge")).toBe("No open notes on position FOH Bridge");
  });
});

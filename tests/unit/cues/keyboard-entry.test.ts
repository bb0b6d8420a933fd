import { describe, expect, it } from "vitest";
import { parseEntry } from "@/lib/cues";

describe("typed level entry", () => {
  it("reads a channel and a level", () => {
    expect(parseEntry("12 75")).toEqual({ kind: "levels", channels: [12], level: 75 });
    expect(parseEntry(" 12 = 75 ")).toEqual({ kind: "levels", channels: [12], level: 75 });
  });

  it("reads ranges, lists and words", () => {
    expect(parseEntry("1-4 full")).toEqual({ kind: "levels", channels: [1, 2, 3, 4], level: 100 });
    expect(parseEntry("3,5,9-11 out")).toEqual({ kind: "levels", channels: [3, 5, 9, 10, 11], level: 0 });
    expect(parseEntry("6-4 50")).toMatchObject({ channels: [4, 5, 6] });
    expect(parseEntry("7 track")).toEqual({ kind: "levels", channels: [7], level: null });
  });

  it("goes to a cue", () => {
    expect(parseEntry("cue 12.5")).toEqual({ kind: "cue", number: 12.5 });
    expect(parseEntry("CUE 3")).toEqual({ kind: "cue", number: 3 });
  });

  it("says what is wrong", () => {
    expect(() => parseEntry("12 120")).toThrow(/outside 0–100/);
    expect(() => parseEntry("12 -5")).toThrow(/outside 0–100/);
    expect(() => parseEntry("12")).toThrow(/not understood/);
    expect(() => parseEntry("a 50")).toThrow(/not understood/);
    expect(() => parseEntry("12 lots")).toThrow(/not a level/);
    expect(() => parseEntry("0 50")).toThrow(/start at 1/);
    expect(() => parseEntry("cue x")).toThrow(/not a cue number/);
  });
});

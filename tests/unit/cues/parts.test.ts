// Parts: channels of one cue that fade with their own times, and the running time they give.
import { describe, expect, it } from "vitest";
import {
  checkParts,
  computeTracking,
  formatChannels,
  movesByPart,
  normaliseParts,
  parseChannels,
  runningTimeWithParts,
  countMoves,
} from "@/lib/cues";

describe("checking a cue's parts", () => {
  it("accepts parts with distinct numbers and channels", () => {
    expect(
      checkParts([
        { part: 1, channels: [1, 2] },
        { part: 2, channels: [3] },
      ]),
    ).toEqual([]);
  });

  it("names a part number out of range or used twice, and a channel in two parts", () => {
    expect(checkParts([{ part: 0, channels: [] }])).toEqual(["part 0: part numbers run from 1 to 20"]);
    expect(checkParts([{ part: 21, channels: [] }])).toEqual(["part 21: part numbers run from 1 to 20"]);
    expect(
      checkParts([
        { part: 2, channels: [1] },
        { part: 2, channels: [5] },
      ]),
    ).toEqual(["part 2 appears twice"]);
    expect(
      checkParts([
        { part: 1, channels: [4, 7] },
        { part: 3, channels: [7] },
      ]),
    ).toEqual(["channel 7 is in part 1 and part 3; a channel can be in one part only"]);
  });

  it("sorts parts and their channels", () => {
    const p = { label: "", upTime: 1, downTime: null, delay: 0 };
    expect(
      normaliseParts([
        { ...p, part: 3, channels: [9, 2, 9] },
        { ...p, part: 1, channels: [] },
      ]).map((x) => [x.part, x.channels]),
    ).toEqual([
      [1, []],
      [3, [2, 9]],
    ]);
  });
});

describe("channel lists as people type them", () => {
  it("reads ranges and lists and writes them back short", () => {
    expect(parseChannels("1-4, 9, 12-13")).toEqual([1, 2, 3, 4, 9, 12, 13]);
    expect(parseChannels("6-4")).toEqual([4, 5, 6]);
    expect(formatChannels([9, 1, 2, 3, 4, 12, 13])).toBe("1-4, 9, 12-13");
    expect(formatChannels([])).toBe("");
    expect(() => parseChannels("1-4, x")).toThrow(/"x" is not a channel/);
  });
});

describe("running time with parts", () => {
  // Cue 1 brings 1–4 up from dark; cue 2 takes 1 and 2 down, brings 3 higher and leaves 4 alone.
  const show = computeTracking([
    { id: 1, number: 1, block: false, levels: { 1: 50, 2: 50, 3: 50, 4: 50 } },
    { id: 2, number: 2, block: false, levels: { 1: 0, 2: 20, 3: 90 } },
  ]);
  const changed = countMoves(show, 1).changed;

  it("counts up and down moves in each part and in the rest of the cue", () => {
    const parts = [
      { part: 1, upTime: 10, downTime: null, delay: 0, channels: [1] },
      { part: 2, upTime: 2, downTime: null, delay: 6, channels: [4] },
    ];
    expect(movesByPart(show, 1, 0, changed, parts)).toEqual({
      base: { up: 1, down: 1 },
      parts: [
        { up: 0, down: 1 },
        { up: 0, down: 0 },
      ],
    });
  });

  // common practice, no source: a part runs for its delay plus its time, the cue until its slowest part arrives
  it("lasts until the slowest group that moves has arrived", () => {
    const cue = { upTime: 3, downTime: 4, delay: 0 };
    const slowDown = { ...cue, parts: [{ part: 1, upTime: 10, downTime: 12, delay: 1, channels: [1] }] };
    expect(runningTimeWithParts(slowDown, movesByPart(show, 1, 0, changed, slowDown.parts))).toBe(13); // channel 1 goes down in part 1: 1 + 12
    const idlePart = { ...cue, parts: [{ part: 2, upTime: 30, downTime: null, delay: 30, channels: [4] }] };
    expect(runningTimeWithParts(idlePart, movesByPart(show, 1, 0, changed, idlePart.parts))).toBe(4); // channel 4 does not move: the part's 60 s do not count
  });

  it("counts every timer when nothing moves, and the cue's own time without parts", () => {
    const cue = {
      upTime: 3,
      downTime: null,
      delay: 0,
      parts: [{ part: 1, upTime: 2, downTime: 9, delay: 1, channels: [8] }],
    };
    expect(runningTimeWithParts(cue, { base: { up: 0, down: 0 }, parts: [{ up: 0, down: 0 }] })).toBe(10);
    expect(
      runningTimeWithParts({ upTime: 3, downTime: 8, delay: 0, parts: [] }, { base: { up: 1, down: 0 }, parts: [] }),
    ).toBe(3);
  });
});

import { describe, expect, it } from "vitest";
import { computeTracking, groupStandbys, runningTime, summarizeCue, type ChannelInfo } from "@/lib/cues";

const info: ChannelInfo = new Map([
  [1, { purposes: ["front light"], areas: ["Area 1"] }],
  [2, { purposes: ["front light"], areas: ["Area 2"] }],
  [3, { purposes: ["cyc"], areas: [] }],
]);

describe("one-line summary", () => {
  const show = computeTracking([
    { id: 1, number: 1, block: false, levels: { 1: 60, 2: 60 } },
    { id: 2, number: 2, block: false, levels: { 1: 80, 3: 50, 2: 40 } },
    { id: 3, number: 3, block: false, levels: {} },
    { id: 4, number: 4, block: false, levels: { 1: 0, 2: 0, 3: 0 } },
  ]);

  it("counts channels up and down and names what gets brighter and darker", () => {
    expect(summarizeCue(show, 0, info).text).toBe("2 up · from dark · brighter: Area 1, Area 2, front light");
    expect(summarizeCue(show, 1, info)).toMatchObject({
      up: 2,
      down: 1,
      text: "2 up, 1 down · brighter: Area 1, cyc, front light · darker: Area 2, front light",
    });
    expect(summarizeCue(show, 2, info).text).toBe("no level changes");
    expect(summarizeCue(show, 3, info).text).toBe("3 down · to blackout");
  });

  it("shortens long lists", () => {
    const many: ChannelInfo = new Map([[1, { purposes: [], areas: ["A", "B", "C", "D", "E"] }]]);
    const s = computeTracking([{ id: 1, number: 1, block: false, levels: { 1: 50 } }]);
    expect(summarizeCue(s, 0, many).text).toBe("1 up · from dark · brighter: A, B, C +2 more");
  });
});

describe("running time", () => {
  // common practice, no source: a fade runs from GO for its delay plus its time
  it("takes the longer of the up and down fades that actually happen", () => {
    expect(runningTime({ upTime: 3, downTime: 8, delay: 0 }, { up: 2, down: 1 })).toBe(8);
    expect(runningTime({ upTime: 3, downTime: 8, delay: 0 }, { up: 2, down: 0 })).toBe(3);
    expect(runningTime({ upTime: 3, downTime: 8, delay: 2 }, { up: 0, down: 4 })).toBe(10);
    expect(runningTime({ upTime: 5, downTime: null, delay: 0 })).toBe(5);
    expect(runningTime({ upTime: 3, downTime: 8, delay: 1 }, { up: 0, down: 0 })).toBe(9);
  });
});

describe("standbys", () => {
  it("groups cues that follow within the window", () => {
    const groups = groupStandbys([
      { id: 1, number: 1, follow: null },
      { id: 2, number: 2, follow: 2 },
      { id: 3, number: 2.5, follow: 0 },
      { id: 4, number: 2.7, follow: 30 },
      { id: 5, number: 3, follow: null },
      { id: 6, number: 4, follow: 5 },
      { id: 7, number: 5, follow: null },
    ]);
    expect(groups).toEqual([
      { cueIds: [1], label: "1" },
      { cueIds: [2, 3, 4], label: "2 to 2.7 (3 cues)" },
      { cueIds: [5], label: "3" }, // 2.7 follows after 30 s: called on its own
      { cueIds: [6, 7], label: "4 and 5" }, // exactly 5 s is within the window
    ]);
  });
});

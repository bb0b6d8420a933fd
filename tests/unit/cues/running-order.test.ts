// Links: the cue that runs next when it is not the following number. The running order, and the cue
// sheet's standbys, summaries and running times computed along it.
import { describe, expect, it } from "vitest";
import { buildCueSheet, runningOrder, type SheetCue } from "@/lib/cues";

const cue = (id: number, number: number, extra: Partial<SheetCue> = {}): SheetCue => ({
  id,
  number,
  upTime: 3,
  downTime: null,
  delay: 0,
  follow: null,
  link: null,
  block: false,
  levels: {},
  parts: [],
  ...extra,
});

describe("running order", () => {
  it("is the numeric order when no cue links", () => {
    const r = runningOrder([cue(1, 1), cue(2, 2), cue(3, 3)]);
    expect(r.steps.map((s) => s.index)).toEqual([0, 1, 2]);
    expect(r.steps.map((s) => s.from)).toEqual([-1, 0, 1]);
    expect(r).toMatchObject({ unreached: [], loopsTo: null, brokenLinks: [] });
  });

  it("jumps to the linked cue and leaves the skipped ones unreached", () => {
    const r = runningOrder([cue(1, 1), cue(2, 2, { link: 5 }), cue(3, 3), cue(4, 4), cue(5, 5)]);
    expect(r.steps).toEqual([
      { index: 0, from: -1, linked: false },
      { index: 1, from: 0, linked: false },
      { index: 4, from: 1, linked: true },
    ]);
    expect(r.unreached).toEqual([2, 3]);
  });

  it("stops at a loop back and names where it loops to", () => {
    const r = runningOrder([cue(1, 1), cue(2, 2), cue(3, 3, { link: 2 }), cue(4, 4)]);
    expect(r.steps.map((s) => s.index)).toEqual([0, 1, 2]);
    expect(r.loopsTo).toBe(1);
    expect(r.unreached).toEqual([3]);
  });

  it("goes on to the following number when a link names no cue", () => {
    const r = runningOrder([cue(1, 1, { link: 77 }), cue(2, 2)]);
    expect(r.steps.map((s) => s.index)).toEqual([0, 1]);
    expect(r.brokenLinks).toEqual([0]);
  });

  it("compares linked numbers as cue numbers, not floats", () => {
    const r = runningOrder([cue(1, 1, { link: 2.3 }), cue(2, 2.1), cue(3, 2.3)]);
    expect(r.steps.map((s) => s.index)).toEqual([0, 2]);
  });
});

describe("the cue sheet along links", () => {
  const info = new Map([
    [1, { purposes: ["front light"], areas: ["Area 1"] }],
    [2, { purposes: ["cyc"], areas: [] }],
  ]);
  // 10 lights channel 1 and follows on after 2 s, linking past 11 to 20; 11 would light the cyc; 20 fades 1 out.
  const cues = [
    cue(1, 10, { levels: { 1: 80 }, follow: 2, link: 20 }),
    cue(2, 11, { levels: { 2: 60 }, upTime: 9 }),
    cue(3, 20, { levels: { 1: 0 }, upTime: 1, downTime: 6 }),
  ];
  const sheet = buildCueSheet(cues, info);

  it("lists cues in running order, then the ones no GO reaches", () => {
    expect(sheet.rows.map((r) => [r.number, r.reached, r.after, r.linked])).toEqual([
      [10, true, null, false],
      [20, true, 10, true],
      [11, false, null, false],
    ]);
  });

  it("groups a follow with the linked cue in one standby", () => {
    expect(sheet.standbys).toEqual([
      { cueIds: [1, 3], label: "10 and 20" },
      { cueIds: [2], label: "11" },
    ]);
    expect(sheet.rows[1].startsBy).toBe("follow");
  });

  it("computes the linked cue's moves from the look that ran before it", () => {
    // Tracking follows the numbers, so cue 20 holds the cyc that 11 brought up; run after 10 (not
    // 11), the cyc comes up in 20 and channel 1 goes out: 1 up in 1 s, 1 down in 6 s.
    expect(sheet.rows[1]).toMatchObject({
      up: 1,
      down: 1,
      summary: "1 up, 1 down · brighter: cyc · darker: Area 1, front light",
      runningTime: 6,
    });
    // Read in number order (after 11) the same cue would only take channel 1 out.
    expect(
      buildCueSheet(
        cues.map((c) => ({ ...c, link: null })),
        info,
      ).rows[2],
    ).toMatchObject({ up: 0, down: 1 });
  });

  it("names links that loop back and links to no cue", () => {
    const loop = buildCueSheet([cue(1, 1, { levels: { 1: 50 } }), cue(2, 2, { link: 1 })], info);
    expect(loop.rows.map((r) => r.loopsTo)).toEqual([null, 1]);
    const broken = buildCueSheet([cue(1, 1, { link: 9 }), cue(2, 2)], info);
    expect(broken.rows[0].brokenLink).toBe(true);
  });

  it("names a standby that jumps cue by cue", () => {
    const three = buildCueSheet(
      [cue(1, 1, { follow: 0, link: 5 }), cue(2, 2), cue(3, 5, { follow: 1 }), cue(4, 6)],
      info,
    );
    expect(three.standbys[0]).toEqual({ cueIds: [1, 3, 4], label: "1, 5 and 6" });
  });
});

// PART records in the USITT ASCII Text Representation for Lighting Console Data, version 3.0
// (USITT, 1990/1992). That PART exists and that a part's UP, DOWN and CHAN lines follow it is from
// memory (see /work/shared/REFERENCE.md); the 80-character lines and `$` keywords are confirmed.
import { describe, expect, it } from "vitest";
import { readUsittAscii } from "@/lib/cues/usitt-ascii-read";
import { writeUsittAscii } from "@/lib/cues/usitt-ascii-write";
import { toStoredMoves } from "@/lib/cues/import-plan";
import { computeTracking, levelAt, CUE_DEFAULTS, type CueWithMoves } from "@/lib/cues";
import { cuesToCsv, describeParts } from "@/lib/cues/table-export";

const HAND_WRITTEN = [
  "IDENT 3:0", // USITT ASCII 3.0: IDENT first
  "CUE 7",
  "TEXT Sunrise in two parts",
  "UP 4", // from memory: the cue's own time, for channels in no part
  "CHAN 1@40 2@40",
  "PART 2", // from memory: PART n opens a part of the open cue
  "UP 10 3", // from memory: UP time [delay], here for the part
  "DOWN 6",
  "TEXT sky",
  "CHAN 20@FL 21@80",
  "PART 3",
  "UP 1",
  "CHAN 30@50",
  "FOLLOW 2", // from memory: FOLLOW belongs to the cue even after a PART
  "CUE 8",
  "CHAN 1@0",
  "ENDDATA",
].join("\r\n");

describe("reading parts", () => {
  const r = readUsittAscii(HAND_WRITTEN);

  it("puts each part's times and channels into the part, and its levels into the cue", () => {
    expect(r.errors).toEqual([]);
    const [c7, c8] = r.cues;
    expect(c7).toMatchObject({
      label: "Sunrise in two parts",
      upTime: 4,
      follow: 2,
      levels: { 1: 40, 2: 40, 20: 100, 21: 80, 30: 50 },
    });
    expect(c7.parts).toEqual([
      { part: 2, label: "sky", upTime: 10, downTime: 6, delay: 3, channels: [20, 21] },
      { part: 3, label: "", upTime: 1, downTime: null, delay: 0, channels: [30] },
    ]);
    expect(c8.parts).toEqual([]); // a new CUE closes the parts of the one before
  });

  it("refuses a bad part number or a channel in two parts, naming the line", () => {
    const bad = (...l: string[]) => readUsittAscii(["IDENT 3:0", "CUE 1", ...l, "ENDDATA"].join("\r\n")).errors[0];
    expect(bad("PART 0")).toEqual({ line: 3, message: 'PART "0": a part number is a whole number from 1 to 20' });
    expect(bad("PART 21")?.message).toMatch(/from 1 to 20/);
    expect(bad("PART 2", "CHAN 5@10", "PART 3", "CHAN 5@20")).toEqual({
      line: 2,
      message: "cue 1: channel 5 is in part 2 and part 3; a channel can be in one part only",
    });
    expect(bad("PART 2", "PART 2")?.message).toMatch(/part 2 appears twice/);
  });
});

describe("writing parts, then reading them back", () => {
  const cue = (c: Partial<CueWithMoves> & { number: number }): CueWithMoves => ({ ...CUE_DEFAULTS, levels: {}, ...c });
  const show: CueWithMoves[] = [
    cue({ number: 1, upTime: 3, levels: { 1: 50, 2: 50, 5: 70 } }),
    cue({
      number: 2,
      upTime: 5,
      downTime: 8,
      levels: { 1: 0, 3: 90, 9: 0 },
      parts: [
        { part: 1, label: "Höhe — sky", upTime: 12, downTime: 2, delay: 1.5, channels: [3, 4] }, // 4 never moves: its place in the part must survive
        { part: 4, label: "", upTime: 0.5, downTime: null, delay: 0, channels: [5] },
      ],
    }),
    cue({ number: 3, upTime: 2, levels: { 2: 10 } }),
  ];
  const text = writeUsittAscii({ title: "Parts", cues: show });

  it("writes PART lines inside 80 plain characters", () => {
    const lines = text.split("\r\n");
    expect(Math.max(...lines.map((l) => l.length))).toBeLessThanOrEqual(80); // USITT ASCII 3.0: at most 80 characters
    expect(lines.every((l) => /^[\x20-\x7e]*$/.test(l))).toBe(true);
    expect(text).toContain("PART 1\r\nUP 12 1.5\r\nDOWN 2 1.5\r\n"); // from memory: UP time [delay]
    expect(text).toContain("CHAN 3@90 4@0"); // the part lists each of its channels with its level
    expect(text).toContain("PART 4\r\nUP 0.5\r\nCHAN 5@70");
  });

  it("comes back with the same parts and the same looks, read as states or as changes", () => {
    const read = readUsittAscii(text);
    expect(read.errors).toEqual([]);
    expect(read.cues.map((c) => c.parts)).toEqual(show.map((c) => c.parts));
    const a = computeTracking(show.map((c, i) => ({ ...c, id: i })));
    for (const mode of ["state", "moves"] as const) {
      const b = computeTracking(toStoredMoves(read.cues, mode).map((c, i) => ({ ...c, id: i })));
      for (let i = 0; i < show.length; i++)
        for (const ch of a.channels) expect(levelAt(b, i, ch)).toBe(levelAt(a, i, ch));
    }
  });
});

describe("parts in CSV", () => {
  it("describes each part in one cell, neutralised against formulas", () => {
    const parts = [{ part: 2, label: "=HYPERLINK(1)", upTime: 3, downTime: 5, delay: 1, channels: [1, 2, 3, 7] }];
    expect(describeParts(parts)).toBe("part 2 (=HYPERLINK(1)) 3/5 wait 1: ch 1-3, 7");
    const csv = cuesToCsv([{ ...CUE_DEFAULTS, number: 4, parts, runningTime: 6, summary: "" }]);
    expect(csv.split("\r\n")[0]).toContain("Parts");
    expect(csv).toContain("part 2 (=HYPERLINK(1)) 3/5 wait 1: ch 1-3, 7"); // starts with "part", so nothing to neutralise
    const risky = cuesToCsv([{ ...CUE_DEFAULTS, number: 4, label: "=1+1", parts: [], runningTime: 6, summary: "" }]);
    expect(risky).toContain("'=1+1"); // OWASP CSV injection: a leading = is prefixed with '
  });
});

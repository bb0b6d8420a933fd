// USITT ASCII Text Representation for Lighting Console Data, version 3.0 (USITT, 1990/1992).
// Confirmed facts are cited as "USITT ASCII 3.0"; details recalled but not checked say "from memory".
import { describe, expect, it } from "vitest";
import { readUsittAscii, parseAsciiLevel } from "@/lib/cues/usitt-ascii-read";
import { writeUsittAscii } from "@/lib/cues/usitt-ascii-write";
import { toStoredMoves } from "@/lib/cues/import-plan";
import { computeTracking, levelAt, CUE_DEFAULTS, type CueWithMoves } from "@/lib/cues";

// Written by hand for this test, following the structure the standard describes: IDENT first, then
// header records, then CUE records with their secondary keywords, and ENDDATA last.
const HAND_WRITTEN = [
  "! A small show written by hand", // USITT ASCII 3.0: ! starts a comment
  "IDENT 3:0", // USITT ASCII 3.0: IDENT 3:0 first
  "Manufacturer Someone", // USITT ASCII 3.0: keywords are case-insensitive
  "CONSOLE Anything",
  "$SPECIAL 1 2 3", // USITT ASCII 3.0: $ keywords are manufacturer-specific, ignored when unknown
  "CLEAR ALL", // from memory: a record Throwline does not use
  "GROUP 1", // from memory: a group record; its CHAN must not land in a cue
  "CHAN 9@FL",
  "CUE 1",
  "TEXT House to half",
  "UP 5",
  "CHAN 1@50, 2@FL", // USITT ASCII 3.0: space , @ are interchangeable delimiters, runs count as one
  "CUE 1.5",
  "UP 3 2", // from memory: UP time [delay]
  "DOWN 1:30", // from memory: times as seconds or m:ss
  "FOLLOW 4",
  "CHAN 1/H80   3>30", // from memory: Hxx = hexadecimal of 255 (H80 ≈ 50.2 %)
  "WOBBLE 7", // not a keyword of the standard: ignored
  "CUE 2",
  "TEXT Storm! builds",
  "LINK 1",
  "chan 3=0",
  "ENDDATA",
  "CUE 99", // after ENDDATA: not read
].join("\r\n");

describe("reading a hand-written file", () => {
  const r = readUsittAscii(HAND_WRITTEN);

  it("reads the cues and nothing else", () => {
    expect(r.errors).toEqual([]);
    expect(r.manufacturer).toBe("Someone");
    expect(r.cues.map((c) => c.number)).toEqual([1, 1.5, 2]);
    const [c1, c15, c2] = r.cues;
    expect(c1).toMatchObject({ label: "House to half", upTime: 5, downTime: null, levels: { 1: 50, 2: 100 } }); // FL = full (from memory)
    // H80 = 128/255 of full = 50.196 % (from memory), stored as the whole percentage 50 with a notice;
    // FOLLOW (the shorter spelling some tools write) is read as FOLLOWON (from memory)
    expect(c15).toMatchObject({ upTime: 3, delay: 2, downTime: 90, follow: 4, levels: { 1: 50, 3: 30 } });
    expect(c2).toMatchObject({ label: "Storm! builds", link: 1, levels: { 3: 0 } });
    expect(Object.keys(c1.levels)).not.toContain("9"); // the GROUP's channel stayed out of the cues
  });

  it("lists what it ignored, with line numbers", () => {
    const text = r.notices.map((n) => `${n.line}: ${n.message}`).join("\n");
    expect(text).not.toMatch(/IDENT/); // a comment before IDENT is not an instruction
    expect(text).toMatch(/6: CLEAR ignored/);
    expect(text).toMatch(/7: GROUP ignored/);
    expect(text).toMatch(/18: unknown keyword WOBBLE ignored/);
    expect(text).toMatch(/1 manufacturer-specific/);
    expect(text).toMatch(/17: 1 level was rounded to whole percentages .* line 17: H80 → 50/);
  });
});

describe("bad files", () => {
  const lines = (...l: string[]) => ["IDENT 3:0", ...l].join("\r\n");
  const firstError = (text: string) => readUsittAscii(text).errors[0];

  it("names the line of a level out of range", () => {
    expect(firstError(lines("CUE 1", "CHAN 5@120", "ENDDATA"))).toEqual({
      line: 3,
      message: "level 120 for channel 5 is above 100",
    });
    expect(firstError(lines("CUE 1", "CHAN 5@-5", "ENDDATA"))).toEqual({
      line: 3,
      message: "level -5 for channel 5 is below 0",
    });
    expect(firstError(lines("CUE 1", "CHAN 5@abc", "ENDDATA"))?.message).toMatch(/not a level/);
    expect(firstError(lines("CUE 1", "CHAN 5", "ENDDATA"))?.message).toMatch(/channel 5 has no level/);
  });

  it("names the line of a bad time", () => {
    expect(firstError(lines("CUE 1", "UP abc", "ENDDATA"))).toMatchObject({
      line: 3,
      message: expect.stringMatching(/UP time "abc" is not a time/),
    });
  });

  it("names both lines of a duplicate cue", () => {
    expect(firstError(lines("CUE 4", "CUE 5", "CUE 4.000", "ENDDATA"))).toEqual({
      line: 4,
      message: "cue 4 appears twice (first on line 2)",
    });
  });

  it("refuses a file cut short before ENDDATA", () => {
    expect(firstError(lines("CUE 1", "CHAN 1@50", ""))).toMatchObject({
      line: 3,
      message: expect.stringMatching(/without ENDDATA/),
    });
  });

  it("refuses carriage returns without line feeds", () => {
    expect(firstError("IDENT 3:0\rCUE 1\rENDDATA\r")?.message).toMatch(/line ends are wrong/);
  });

  it("reads a file without IDENT as version 3.0, with a notice", () => {
    const r = readUsittAscii("CUE 1\r\nENDDATA\r\n");
    expect(r.errors).toEqual([]);
    expect(r.notices[0]).toEqual({ line: 1, message: "no IDENT line at the start; read as version 3.0" });
  });

  it("accepts LF line ends as well as CR LF", () => {
    expect(readUsittAscii("IDENT 3:0\nCUE 1\nCHAN 1@10\nENDDATA\n").errors).toEqual([]);
  });

  it("reads levels in every written form", () => {
    expect(parseAsciiLevel("FL")).toBe(100); // from memory
    expect(parseAsciiLevel("HFF")).toBe(100); // from memory: FF = full
    expect(parseAsciiLevel("h00")).toBe(0);
    // from memory: Hxx is hexadecimal of 255. Read exactly (0x80 = 128, 128/255 = 50.196 %); the import then
    // stores whole percentages (50) and says so in a notice (usitt-ascii-standard.test.ts).
    expect(parseAsciiLevel("H80")).toBeCloseTo((128 / 255) * 100, 12);
    expect(parseAsciiLevel("H80")).not.toBe(50);
    expect(parseAsciiLevel("42")).toBe(42);
    expect(parseAsciiLevel("x")).toBeNull();
  });
});

describe("export, then import", () => {
  const cue = (c: Partial<CueWithMoves> & { number: number }): CueWithMoves => ({ ...CUE_DEFAULTS, levels: {}, ...c });
  const show: CueWithMoves[] = [
    cue({ number: 0.5, label: "Preset", upTime: 0, levels: { 1: 30, 2: 30 }, page: "1" }),
    cue({
      number: 1,
      label: "Dawn — on the harbour",
      upTime: 8,
      downTime: 12,
      delay: 1.5,
      levels: { 1: 80, 3: 100 },
      callNote: "Standby on the foghorn\nwarn sound",
    }),
    cue({ number: 1.5, label: "x".repeat(120), upTime: 90, follow: 2, levels: { 2: 0 } }),
    cue({ number: 2, upTime: 3, levels: { 5: 45 }, block: true, link: 0.5 }),
    cue({ number: 3, upTime: 4, levels: {} }),
    cue({ number: 4, upTime: 5, levels: Object.fromEntries(Array.from({ length: 40 }, (_, i) => [100 + i, i + 1])) }),
  ];
  const text = writeUsittAscii({ title: "Salt and Lantern", cues: show });

  it("writes lines the standard allows", () => {
    const lines = text.split("\r\n");
    expect(lines[0]).toBe("IDENT 3:0"); // USITT ASCII 3.0: IDENT first
    expect(Math.max(...lines.map((l) => l.length))).toBeLessThanOrEqual(80); // USITT ASCII 3.0: at most 80 characters
    expect(lines.every((l) => /^[\x20-\x7e]*$/.test(l))).toBe(true); // plain ASCII
    expect(text).toMatch(/\r\nENDDATA\r\n$/);
    expect(text).toContain("UP 8 1.5\r\nDOWN 12 1.5"); // from memory: UP time [delay]
  });

  it("comes back as the same cues and the same tracked looks", () => {
    const read = readUsittAscii(text);
    expect(read.errors).toEqual([]);
    const stored = toStoredMoves(read.cues, "state");
    const fields = (c: CueWithMoves) => ({ ...c, levels: undefined, line: undefined });
    expect(stored.map(fields)).toEqual(show.map(fields));
    const a = computeTracking(show.map((c, i) => ({ ...c, id: i })));
    const b = computeTracking(stored.map((c, i) => ({ ...c, id: i })));
    for (let i = 0; i < show.length; i++)
      for (const ch of a.channels) expect(levelAt(b, i, ch)).toBe(levelAt(a, i, ch));
  });

  it("reads the same looks when the file is taken as changes only", () => {
    const stored = toStoredMoves(readUsittAscii(text).cues, "moves");
    const a = computeTracking(show.map((c, i) => ({ ...c, id: i })));
    const b = computeTracking(stored.map((c, i) => ({ ...c, id: i })));
    for (let i = 0; i < show.length; i++)
      for (const ch of a.channels) expect(levelAt(b, i, ch)).toBe(levelAt(a, i, ch));
  });
});

// What Throwline writes and reads against the USITT ASCII Text Representation for Lighting Console Data,
// version 3.0 (USITT, 1990/1992). Confirmed facts (REFERENCE.md) are cited as "USITT ASCII 3.0"; the keyword
// set, FOLLOWON, the UP/DOWN delay and the PATCH layout are "from memory" (REFERENCE.md says so too).
import { describe, expect, it } from "vitest";
import { readUsittAscii, parseAsciiLevel } from "@/lib/cues/usitt-ascii-read";
import { writeUsittAscii } from "@/lib/cues/usitt-ascii-write";
import { patchToCsv, type PatchEntry } from "@/lib/cues/usitt-ascii-patch";
import { emptyFileReason, toStoredMoves } from "@/lib/cues/import-plan";
import { CUE_DEFAULTS, runningTime, type CueWithMoves } from "@/lib/cues";

const cue = (c: Partial<CueWithMoves> & { number: number }): CueWithMoves => ({ ...CUE_DEFAULTS, levels: {}, ...c });
const file = (...l: string[]) => ["IDENT 3:0", ...l, "ENDDATA"].join("\r\n");

// From memory (REFERENCE.md, USITT ASCII): the keywords of the standard. `$` keywords are the makers' own.
const STANDARD = new Set([
  "IDENT",
  "MANUFACTURER",
  "CONSOLE",
  "CLEAR",
  "SET",
  "PATCH",
  "GROUP",
  "SUB",
  "CUE",
  "PART",
  "UP",
  "DOWN",
  "FOLLOWON",
  "LINK",
  "TEXT",
  "CHAN",
  "ENDDATA",
]);

describe("the follow time keyword", () => {
  it("writes FOLLOWON, the standard's keyword as remembered, never FOLLOW", () => {
    // from memory (REFERENCE.md): FOLLOWON is the follow time; write FOLLOWON
    const text = writeUsittAscii({ title: "t", cues: [cue({ number: 1, follow: 2.5, levels: { 1: 50 } })] });
    expect(text).toContain("\r\nFOLLOWON 2.5\r\n");
    expect(text).not.toMatch(/^FOLLOW /m);
  });

  it("reads FOLLOWON, and FOLLOW from tools that use the shorter word", () => {
    // from memory (REFERENCE.md): read FOLLOW too
    const r = readUsittAscii(file("CUE 1", "FOLLOWON 4", "CUE 2", "FOLLOW 1:05", "CUE 3", "followon 0"));
    expect(r.errors).toEqual([]);
    expect(r.cues.map((c) => c.follow)).toEqual([4, 65, 0]);
    expect(r.notices.filter((n) => /FOLLOW/.test(n.message))).toEqual([]);
  });
});

describe("no keyword the standard does not define", () => {
  it("every line Throwline writes starts with a keyword of the standard, a `$` keyword or `!`", () => {
    // from memory (REFERENCE.md): WAIT and DELAY are dialect keywords; delays ride inside UP and DOWN
    const text = writeUsittAscii({
      title: "Salt and Lantern",
      cues: [
        cue({
          number: 1,
          label: "Dawn",
          upTime: 8,
          downTime: 12,
          delay: 1.5,
          downDelay: 4,
          follow: 3,
          link: 3,
          page: "2",
          callNote: "warn",
          block: true,
          levels: { 1: 80 },
        }),
        cue({
          number: 2,
          upTime: 3,
          downDelay: 2,
          levels: { 2: 40 },
          parts: [{ part: 2, label: "sky", upTime: 6, downTime: 2, delay: 1, channels: [2] }],
        }),
        cue({ number: 3, levels: { 1: 0 } }),
      ],
      patch: [
        { channel: 1, universe: 1, address: 1 },
        { channel: 2, universe: 2, address: 5 },
      ],
    });
    const keywords = text
      .split("\r\n")
      .filter((l) => l && !l.startsWith("!"))
      .map((l) => l.split(/[\s,/<>=@]+/)[0]);
    for (const k of keywords) expect(k.startsWith("$") || STANDARD.has(k), k).toBe(true);
    expect(text).not.toMatch(/^(WAIT|DELAY)\b/m);
  });
});

describe("a down-only delay", () => {
  it("is kept for the down fade and not applied to the up fade", () => {
    // from memory (REFERENCE.md): `DOWN time delay`; here the up fade has no delay at all
    const r = readUsittAscii(file("CUE 5", "UP 3", "DOWN 6 2"));
    expect(r.errors).toEqual([]);
    expect(r.cues[0]).toMatchObject({ upTime: 3, delay: 0, downTime: 6, downDelay: 2 });
    // Hand-worked: the up fade ends at 0 + 3 s, the down fade at 2 + 6 = 8 s, so the cue runs 8 s;
    // with the delay wrongly on the up fade too it would read 2 + max(3, 6) = 8 — so check an up-only move:
    // only channels going up, so the cue ends at 0 + 3 = 3 s, not 2 + 3 = 5 s.
    expect(runningTime(r.cues[0], { up: 1, down: 0 })).toBe(3);
    expect(runningTime(r.cues[0], { up: 1, down: 1 })).toBe(8);
  });

  it("a delay on both lines, the same, is the cue's one delay", () => {
    // from memory: UP time [delay] and DOWN time [delay]
    const r = readUsittAscii(file("CUE 5", "UP 3 1.5", "DOWN 6 1.5"));
    expect(r.cues[0]).toMatchObject({ delay: 1.5, downDelay: null });
    const other = readUsittAscii(file("CUE 5", "DOWN 6 4", "UP 3 1"));
    expect(other.cues[0]).toMatchObject({ delay: 1, downDelay: 4 });
  });

  it("survives a round trip", () => {
    const show = [
      cue({ number: 1, upTime: 3, downTime: 6, downDelay: 2, levels: { 1: 50 } }),
      cue({ number: 2, upTime: 4, downTime: 5, delay: 1, downDelay: 0, levels: { 1: 0, 2: 70 } }),
      cue({ number: 3, upTime: 2, downTime: 2, delay: 1, levels: { 2: 10 } }),
    ];
    const text = writeUsittAscii({ title: "t", cues: show });
    expect(text).toContain("CUE 1\r\nUP 3\r\nDOWN 6 2\r\n");
    expect(text).toContain("CUE 2\r\nUP 4 1\r\nDOWN 5 0\r\n");
    const back = toStoredMoves(readUsittAscii(text).cues, "state");
    expect(back.map((c) => [c.delay, c.downDelay ?? null])).toEqual([
      [0, 2],
      [1, 0],
      [1, null],
    ]);
  });

  it("a part's separate down delay cannot be kept, and the import says so", () => {
    // Parts carry one wait (Throwline's model): never drop a different down delay silently.
    const r = readUsittAscii(file("CUE 1", "CHAN 1@10", "PART 2", "UP 4 1", "DOWN 6 3", "CHAN 2@50"));
    expect(r.cues[0].parts[0]).toMatchObject({ upTime: 4, downTime: 6, delay: 1 });
    expect(r.notices).toContainEqual({
      line: 6,
      message:
        "part 2 of cue 1: its down delay (3 s) differs from its up delay (1 s); a part keeps one wait, so it waits 1 s",
    });
  });
});

describe("levels Throwline rounds", () => {
  it("H80 is 128/255 of full, 50.196 %, and is stored as 50 with a notice", () => {
    // from memory (REFERENCE.md): Hxx is hexadecimal 0–255 of full; hand-worked: 0x80 = 128, 128/255 = 0.501961
    expect(parseAsciiLevel("H80")).toBeCloseTo((128 / 255) * 100, 12);
    expect(parseAsciiLevel("HFF")).toBe(100); // 255/255
    expect(parseAsciiLevel("33.5")).toBe(33.5);
    const r = readUsittAscii(file("CUE 1", "CHAN 1@H80 2@50", "CUE 2", "CHAN 3@33.5 4@12.25 5@FL"));
    // Throwline keeps whole percentages (its level schema): 50.196 → 50, 33.5 → 34 (half rounds up), 12.25 → 12
    expect(r.cues[0].levels).toEqual({ 1: 50, 2: 50 });
    expect(r.cues[1].levels).toEqual({ 3: 34, 4: 12, 5: 100 });
    const rounding = r.notices.filter((n) => /rounded/.test(n.message));
    expect(rounding).toEqual([
      {
        line: 3,
        message:
          "3 levels were rounded to whole percentages (Throwline keeps whole percentages), the first on line 3: H80 → 50",
      },
    ]);
  });

  it("whole levels give no notice", () => {
    expect(
      readUsittAscii(file("CUE 1", "CHAN 1@50 2@FL 3@H00")).notices.filter((n) => /rounded/.test(n.message)),
    ).toEqual([]);
  });
});

describe("the patch", () => {
  const patch: PatchEntry[] = [
    { channel: 1, universe: 1, address: 1 },
    { channel: 1, universe: 1, address: 9 },
    { channel: 12, universe: 2, address: 1 },
    { channel: 40, universe: 3, address: 512 },
  ];

  it("writes PATCH records with absolute addresses and reads them back", () => {
    // from memory: PATCH page channel<dimmer@level; common practice (REFERENCE.md, DMX512-A): absolute address
    // (U − 1)·512 + address, so 2/1 → 513 and 3/512 → 1536 (hand-worked: 2·512 + 512)
    const text = writeUsittAscii({ title: "t", cues: [cue({ number: 1, levels: { 1: 50 } })], patch });
    expect(text).toContain("\r\nPATCH 1 1<1@FL 1<9@FL 12<513@FL 40<1536@FL\r\n");
    const r = readUsittAscii(text);
    expect(r.errors).toEqual([]);
    expect(r.patch).toEqual(patch);
    expect(r.notices.filter((n) => /PATCH/.test(n.message))).toEqual([]);
    // The patch sits before the cues (it is a setup record) and ends no cue.
    expect(text.indexOf("PATCH")).toBeLessThan(text.indexOf("CUE 1"));
  });

  it("keeps PATCH lines within 80 characters", () => {
    // USITT ASCII 3.0: at most 80 characters a line
    const many = Array.from({ length: 200 }, (_, i) => ({
      channel: i + 1,
      universe: 1 + Math.floor(i / 100),
      address: 1 + (i % 100) * 5,
    }));
    const text = writeUsittAscii({ title: "t", cues: [], patch: many });
    const lines = text.split("\r\n");
    expect(Math.max(...lines.map((l) => l.length))).toBeLessThanOrEqual(80);
    expect(readUsittAscii(text).patch).toEqual(many);
  });

  it("names the line of a bad PATCH entry", () => {
    const r = readUsittAscii(file("PATCH 1 5<0@FL"));
    expect(r.errors).toEqual([
      {
        line: 2,
        message: "PATCH: address 0 for channel 5 is not a DMX address (1 to 32,767,488 counted across universes)",
      },
    ]);
    expect(readUsittAscii(file("PATCH 1 5<7")).errors[0]?.message).toMatch(/channel, address and level/);
  });

  it("as CSV: channel, universe, address and the absolute address", () => {
    // common practice (REFERENCE.md): absolute numbering (U − 1)·512 + address
    expect(patchToCsv(patch)).toBe(
      "Channel,Universe,Address,Absolute address\r\n1,1,1,1\r\n1,1,9,9\r\n12,2,1,513\r\n40,3,512,1536\r\n",
    );
  });
});

describe("a file with no cues", () => {
  it("cannot replace the cue list: the reason says so in words", () => {
    for (const text of [file(), file("$TL-PAGE 4", "$OTHER 1"), "IDENT 3:0\r\n! only a comment\r\nENDDATA\r\n"]) {
      const read = readUsittAscii(text);
      expect(read.errors).toEqual([]);
      expect(emptyFileReason(read)).toMatch(/^The file holds no cues, so importing it would delete every cue/);
    }
    expect(emptyFileReason(readUsittAscii(file("PATCH 1 1<1@FL")))).toMatch(/holds no cues \(it holds a patch only\)/);
    expect(emptyFileReason(readUsittAscii(file("CUE 1")))).toBeNull();
  });
});

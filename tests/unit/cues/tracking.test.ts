// Tracking as the trade uses the word: a channel keeps its level in later cues until a cue changes
// it (common practice, no source); a block cue sets every channel (Throwline's stated assumption:
// unrecorded channels are 0 in a block cue).
import { describe, expect, it } from "vitest";
import { classifyMoves, computeTracking, levelAt, movesToReach, stateOf, type CueMoves } from "@/lib/cues";

const cue = (id: number, number: number, levels: Record<number, number>, block = false): CueMoves => ({
  id,
  number,
  levels,
  block,
});

describe("tracking", () => {
  const show = computeTracking([
    cue(3, 3, { 2: 0 }),
    cue(1, 1, { 1: 50, 2: 80 }),
    cue(2, 2, { 1: 70 }),
    cue(4, 3.5, { 3: 40 }),
    cue(5, 4, { 3: 60 }, true),
    cue(6, 5, {}),
  ]);

  it("orders cues by number and computes every channel in every cue", () => {
    expect(show.cueIds).toEqual([1, 2, 3, 4, 5, 6]);
    const table = show.cueIds.map((_, i) => [1, 2, 3].map((ch) => levelAt(show, i, ch)));
    expect(table).toEqual([
      [50, 80, 0], // cue 1 records 1 and 2
      [70, 80, 0], // cue 2 moves 1; 2 tracks at 80
      [70, 0, 0], // cue 3 takes 2 out; 1 tracks
      [70, 0, 40], // cue 3.5 brings 3 up
      [0, 0, 60], // block cue 4: only what it records
      [0, 0, 60], // cue 5 records nothing: everything tracks
    ]);
    expect(levelAt(show, 0, 999)).toBe(0);
    expect(stateOf(show, 1)).toEqual(
      new Map([
        [1, 70],
        [2, 80],
      ]),
    );
  });

  it("classifies up, down, tracked and held", () => {
    const kinds = (i: number) => Object.fromEntries(classifyMoves(show, i).map((m) => [m.channel, m.kind]));
    expect(kinds(1)).toEqual({ 1: "up", 2: "tracked", 3: "tracked" });
    expect(kinds(2)).toEqual({ 1: "tracked", 2: "down", 3: "tracked" });
    expect(kinds(4)).toEqual({ 1: "down", 2: "held", 3: "up" }); // block: everything is recorded
    const again = computeTracking([cue(1, 1, { 1: 50 }), cue(2, 2, { 1: 50 })]);
    expect(classifyMoves(again, 1)[0].kind).toBe("held");
  });

  it("carries a change in an early cue forward until a later cue records the channel", () => {
    const before = computeTracking([cue(1, 1, { 1: 50 }), cue(2, 2, {}), cue(3, 3, { 1: 20 }), cue(4, 4, {})]);
    const after = computeTracking([cue(1, 1, { 1: 90 }), cue(2, 2, {}), cue(3, 3, { 1: 20 }), cue(4, 4, {})]);
    expect([0, 1, 2, 3].map((i) => levelAt(before, i, 1))).toEqual([50, 50, 20, 20]);
    expect([0, 1, 2, 3].map((i) => levelAt(after, i, 1))).toEqual([90, 90, 20, 20]);
  });

  it("matches a direct replay on a random show", () => {
    let seed = 7;
    const rnd = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    const cues: CueMoves[] = Array.from({ length: 60 }, (_, i) => {
      const levels: Record<number, number> = {};
      for (let k = 0; k < 5; k++) levels[1 + Math.floor(rnd() * 30)] = Math.floor(rnd() * 101);
      return cue(i + 1, i + 1, levels, rnd() < 0.05);
    });
    const tracked = computeTracking(cues);
    const replay = new Map<number, number>();
    cues.forEach((c, i) => {
      if (c.block) replay.clear();
      for (const [ch, l] of Object.entries(c.levels)) replay.set(Number(ch), l);
      for (let ch = 1; ch <= 30; ch++) expect(levelAt(tracked, i, ch)).toBe(replay.get(ch) ?? 0);
    });
  });

  it("finds the moves that reach a target state", () => {
    const before = new Map([
      [1, 50],
      [2, 30],
      [3, 0],
    ]);
    const target = new Map([
      [1, 50],
      [4, 100],
    ]);
    expect(movesToReach(before, target)).toEqual({ 2: 0, 4: 100 });
  });
});

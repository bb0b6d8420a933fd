// Turns cues read from a file into the moves Throwline stores. A file's cue may be meant as a full
// state (channels it does not list are out) or as changes only (they keep their level): the person
// importing chooses; Throwline's own exports read the same either way (see usitt-ascii-write.ts).
import { compareCueNumbers } from "./cue-number";
import { movesToReach } from "./tracking";
import type { CueWithMoves } from "./types";

export type ImportMode = "state" | "moves";

export function toStoredMoves<C extends CueWithMoves>(cues: ReadonlyArray<C>, mode: ImportMode): C[] {
  const ordered = [...cues].sort((a, b) => compareCueNumbers(a.number, b.number));
  let state = new Map<number, number>();
  return ordered.map((cue) => {
    const listed = new Map(Object.entries(cue.levels).map(([ch, l]) => [Number(ch), l]));
    if (cue.block) {
      state = new Map([...listed].filter(([, l]) => l > 0));
      return { ...cue, levels: Object.fromEntries(state) };
    }
    if (mode === "moves") {
      for (const [ch, l] of listed) state.set(ch, l);
      return { ...cue, levels: Object.fromEntries(listed) };
    }
    const target = new Map([...listed].filter(([, l]) => l > 0));
    const moves = movesToReach(state, target);
    state = target;
    return { ...cue, levels: moves };
  });
}

/**
 * Why a file cannot replace the cue list, or null when it can. A file with no CUE record (only IDENT and
 * ENDDATA, only `$` lines, only a patch) would delete every cue and put nothing back: refuse it by name.
 */
export function emptyFileReason(read: { cues: readonly unknown[]; patch?: readonly unknown[] }): string | null {
  if (read.cues.length) return null;
  const patchOnly = read.patch?.length ? " (it holds a patch only)" : "";
  return `The file holds no cues${patchOnly}, so importing it would delete every cue in the list. Nothing was changed; check that this is the cue file you meant.`;
}

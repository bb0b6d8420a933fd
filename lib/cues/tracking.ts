// The tracking engine. A cue stores only its moves (the channels it records); every other channel
// keeps the level it had in the cue before — "tracking", as the trade says. Before the first cue
// every channel is at 0.
//
// Throwline's assumption for a block cue: it is a full state. Channels it records take those
// levels; channels it does not record are at 0, whatever came before. So nothing tracks into or
// through a block cue. (When the designer marks a cue as block, the data layer first writes the
// tracked state into the cue so that its look does not change.)
import { compareCueNumbers } from "./cue-number";

export type CueMoves = {
  id: number;
  number: number;
  block: boolean;
  /** channel → level 0–100, only the channels this cue records */
  levels: Readonly<Record<number, number>>;
};

export type TrackedShow = {
  cueIds: number[];
  channels: number[];
  column: Map<number, number>;
  /** one row per cue in running order: the level of every channel (column) */
  states: Float32Array[];
  /** 1 where the cue records the channel itself (a move, a hard level, or anything in a block cue) */
  recorded: Uint8Array[];
};

export type MoveKind = "up" | "down" | "tracked" | "held";
export type ChannelMove = { channel: number; from: number; to: number; kind: MoveKind };

/** Sorts the cues by number and computes every channel's level in every cue. */
export function computeTracking(cues: ReadonlyArray<CueMoves>, extraChannels: Iterable<number> = []): TrackedShow {
  const ordered = [...cues].sort((a, b) => compareCueNumbers(a.number, b.number));
  const set = new Set<number>(extraChannels);
  for (const cue of ordered) for (const ch in cue.levels) set.add(Number(ch));
  const channels = [...set].sort((a, b) => a - b);
  const column = new Map(channels.map((ch, i) => [ch, i]));
  const states: Float32Array[] = [];
  const recorded: Uint8Array[] = [];
  // One buffer for every state (and one for the marks), each cue a view into it: thousands of small
  // typed arrays each get their own backing store, and their garbage collection cost more than the work.
  const width = channels.length;
  const allStates = new Float32Array(width * ordered.length);
  const allMarks = new Uint8Array(width * ordered.length);
  let previous: Float32Array | null = null;
  for (let i = 0; i < ordered.length; i++) {
    const cue = ordered[i];
    const state = allStates.subarray(i * width, (i + 1) * width);
    const marks = allMarks.subarray(i * width, (i + 1) * width);
    if (cue.block) marks.fill(1);
    else if (previous) state.set(previous);
    for (const ch in cue.levels) {
      const col = column.get(Number(ch))!;
      state[col] = cue.levels[ch];
      marks[col] = 1;
    }
    states.push(state);
    recorded.push(marks);
    previous = state;
  }
  return { cueIds: ordered.map((c) => c.id), channels, column, states, recorded };
}

/** A channel's level in the cue at `index` (running order); 0 for a channel the show never uses. */
export function levelAt(show: TrackedShow, index: number, channel: number): number {
  const col = show.column.get(channel);
  return col === undefined ? 0 : show.states[index][col];
}

/** The state of a cue as channel → level (channels at 0 left out). */
export function stateOf(show: TrackedShow, index: number): Map<number, number> {
  const out = new Map<number, number>();
  show.states[index].forEach((level, col) => {
    if (level > 0) out.set(show.channels[col], level);
  });
  return out;
}

/**
 * What each channel does in the cue at `index`: up, down, tracked (not recorded here, level carried
 * from before) or held (recorded here at the level it already had).
 */
export function classifyMoves(show: TrackedShow, index: number): ChannelMove[] {
  const now = show.states[index];
  const before = index > 0 ? show.states[index - 1] : new Float32Array(show.channels.length);
  const marks = show.recorded[index];
  const out: ChannelMove[] = [];
  for (let col = 0; col < show.channels.length; col++) {
    const from = before[col];
    const to = now[col];
    const kind: MoveKind = to > from ? "up" : to < from ? "down" : marks[col] ? "held" : "tracked";
    out.push({ channel: show.channels[col], from, to, kind });
  }
  return out;
}

/**
 * Counts of each kind in a cue, cheaper than classifyMoves when only the numbers are needed.
 * `from` is the cue that ran before it (running order, which a link can change); -1 means dark.
 */
export function countMoves(
  show: TrackedShow,
  index: number,
  from = index - 1,
): { up: number; down: number; changed: number[] } {
  const now = show.states[index];
  const before = from >= 0 ? show.states[from] : null;
  let up = 0;
  let down = 0;
  const changed: number[] = [];
  for (let col = 0; col < now.length; col++) {
    const from = before ? before[col] : 0;
    if (now[col] > from) up++;
    else if (now[col] < from) down++;
    else continue;
    changed.push(col);
  }
  return { up, down, changed };
}

/**
 * The moves a cue must record so that its tracked state becomes `target` given the state before it
 * (used by import of full states and by "copy a cue's levels"). Channels already at the target
 * level are left to track.
 */
export function movesToReach(
  before: ReadonlyMap<number, number>,
  target: ReadonlyMap<number, number>,
): Record<number, number> {
  const moves: Record<number, number> = {};
  for (const [ch, level] of target) if ((before.get(ch) ?? 0) !== level) moves[ch] = level;
  for (const [ch, level] of before) if (level !== 0 && !target.has(ch)) moves[ch] = 0;
  return moves;
}

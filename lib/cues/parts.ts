// Parts: groups of channels inside one cue with their own up, down and delay times (a trade idea;
// Throwline's rules below are its own). A channel moves with the part it is in; channels in no part
// move with the cue's own times. The fade runs until the slowest group that moves has arrived.
import { runningTime, type CueTiming } from "./summary";
import { MAX_PARTS, type CuePart } from "./types";
import type { TrackedShow } from "./tracking";

export type PartTiming = CueTiming & { part: number; channels: readonly number[] };
export type GroupMoves = { up: number; down: number };

/** Up and down counts for the cue's own channels (`base`) and for each part, from the changed columns. */
export function movesByPart(
  show: TrackedShow,
  index: number,
  from: number,
  changed: readonly number[],
  parts: readonly PartTiming[],
): { base: GroupMoves; parts: GroupMoves[] } {
  const partOf = new Map<number, number>();
  parts.forEach((p, k) => p.channels.forEach((ch) => partOf.set(ch, k)));
  const base = { up: 0, down: 0 };
  const counts = parts.map(() => ({ up: 0, down: 0 }));
  const now = show.states[index];
  const before = from >= 0 ? show.states[from] : null;
  for (const col of changed) {
    const k = partOf.get(show.channels[col]);
    const group = k === undefined ? base : counts[k];
    if (now[col] > (before ? before[col] : 0)) group.up++;
    else group.down++;
  }
  return { base, parts: counts };
}

/**
 * Running time of a cue with parts: the longest of its groups that move. When nothing moves at all
 * the console still runs every timer, so then the longest of all groups counts.
 */
export function runningTimeWithParts(
  cue: CueTiming & { parts?: readonly PartTiming[] },
  moves?: { base: GroupMoves; parts: GroupMoves[] },
): number {
  const parts = cue.parts ?? [];
  if (!parts.length) return runningTime(cue, moves?.base);
  const groups: Array<[CueTiming, GroupMoves | undefined]> = [
    [cue, moves?.base],
    ...parts.map((p, k): [CueTiming, GroupMoves | undefined] => [p, moves?.parts[k]]),
  ];
  const anything = moves && groups.some(([, m]) => m && m.up + m.down > 0);
  if (!anything) return Math.max(...groups.map(([t]) => runningTime(t)));
  return Math.max(0, ...groups.filter(([, m]) => m && m.up + m.down > 0).map(([t, m]) => runningTime(t, m)));
}

/** Problems with a cue's parts in words (empty when fine): numbers 1–20 used once, a channel in one part only. */
export function checkParts(parts: ReadonlyArray<Pick<CuePart, "part" | "channels">>): string[] {
  const problems: string[] = [];
  if (parts.length > MAX_PARTS) problems.push(`at most ${MAX_PARTS} parts in a cue`);
  const numbers = new Set<number>();
  const owner = new Map<number, number>();
  for (const p of parts) {
    if (!Number.isInteger(p.part) || p.part < 1 || p.part > MAX_PARTS)
      problems.push(`part ${p.part}: part numbers run from 1 to ${MAX_PARTS}`);
    if (numbers.has(p.part)) problems.push(`part ${p.part} appears twice`);
    numbers.add(p.part);
    for (const ch of p.channels) {
      const other = owner.get(ch);
      if (other !== undefined && other !== p.part)
        problems.push(`channel ${ch} is in part ${other} and part ${p.part}; a channel can be in one part only`);
      owner.set(ch, p.part);
    }
  }
  return problems;
}

/** Parts sorted by number, each part's channels sorted and once. */
export function normaliseParts<P extends CuePart>(parts: readonly P[]): P[] {
  return [...parts]
    .sort((a, b) => a.part - b.part)
    .map((p) => ({ ...p, channels: [...new Set(p.channels)].sort((a, b) => a - b) }));
}

// The running order: the order in which GO (or a follow) takes the cues. It is the numeric order,
// except that a cue with a link jumps to the linked cue instead of the following number (a trade
// idea; the rules below are Throwline's). Tracking still follows the numeric order — a link changes
// what runs next, not what a cue's levels are — but the fade into a linked cue starts from the look
// of the cue that ran before it, so its moves, summary and running time are computed from there.
import { cueKey } from "./cue-number";

export type RunStep = {
  /** index of the cue in numeric order */
  index: number;
  /** index of the cue that ran before it, -1 for the first cue (from dark) */
  from: number;
  /** true when it was reached by a link rather than by the following number */
  linked: boolean;
};

export type RunningOrder = {
  steps: RunStep[];
  /** cues no GO ever reaches (a link jumps past them), in numeric order */
  unreached: number[];
  /** the last step links back to a cue already run (a loop): that cue's index, else null */
  loopsTo: number | null;
  /** indexes of cues whose link names a cue that does not exist (they go on to the following number) */
  brokenLinks: number[];
};

/** Walks from the first cue: link when set (and the cue exists), else the following number; stops at the end or a repeat. */
export function runningOrder(cues: ReadonlyArray<{ number: number; link: number | null }>): RunningOrder {
  const byKey = new Map(cues.map((c, i) => [cueKey(c.number), i]));
  const seen = new Set<number>();
  const steps: RunStep[] = [];
  const brokenLinks: number[] = [];
  let loopsTo: number | null = null;
  let at = 0;
  let from = -1;
  let linked = false;
  while (at < cues.length) {
    if (seen.has(at)) {
      loopsTo = at;
      break;
    }
    seen.add(at);
    steps.push({ index: at, from, linked });
    const link = cues[at].link;
    const target = link == null ? undefined : byKey.get(cueKey(link));
    if (link != null && target === undefined) brokenLinks.push(at);
    from = at;
    linked = target !== undefined && target !== at + 1;
    at = target ?? at + 1;
  }
  const unreached = cues.map((_, i) => i).filter((i) => !seen.has(i));
  return { steps, unreached, loopsTo, brokenLinks };
}

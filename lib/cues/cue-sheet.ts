// The stage manager's cue sheet computed from the cue list: rows in running order (links followed),
// each with its one-line summary, running time (parts included) and how it starts; then the
// standbys. Pure, so the data layer, the benchmark and the tests share it.
import { compareCueNumbers } from "./cue-number";
import { computeTracking, type TrackedShow } from "./tracking";
import { groupStandbys, summarizeCue, type ChannelInfo, type StandbyGroup } from "./summary";
import { movesByPart, runningTimeWithParts, type PartTiming } from "./parts";
import { runningOrder } from "./running-order";

export type SheetCue = {
  id: number;
  number: number;
  upTime: number;
  downTime: number | null;
  delay: number;
  follow: number | null;
  link: number | null;
  block: boolean;
  levels: Readonly<Record<number, number>>;
  parts: readonly PartTiming[];
};

export type SheetFacts = {
  runningTime: number;
  summary: string;
  up: number;
  down: number;
  /** how this cue is started: called (GO) or by the follow of the cue before it */
  startsBy: "go" | "follow";
  /** the cue that runs before it in the running order (null for the first, and for unreached cues) */
  after: number | null;
  /** reached by a link rather than by the following number */
  linked: boolean;
  /** false when a link jumps past it, so no GO ever runs it */
  reached: boolean;
  /** its link names a cue that does not exist (it goes on to the following number) */
  brokenLink: boolean;
  /** its link goes back to a cue already run: the number it loops to */
  loopsTo: number | null;
};

export function buildCueSheet<C extends SheetCue>(
  input: readonly C[],
  info: ChannelInfo,
): { rows: Array<C & SheetFacts>; standbys: StandbyGroup[]; show: TrackedShow } {
  const cues = [...input].sort((a, b) => compareCueNumbers(a.number, b.number));
  const show = computeTracking(cues);
  const order = runningOrder(cues);
  const broken = new Set(order.brokenLinks);
  const lastStep = order.steps.at(-1);
  const facts = (index: number, from: number, reached: boolean, linked: boolean): C & SheetFacts => {
    const cue = cues[index];
    const s = summarizeCue(show, index, info, from);
    const moves = cue.parts.length ? movesByPart(show, index, from, s.changed, cue.parts) : { base: s, parts: [] };
    return {
      ...cue,
      summary: s.text,
      up: s.up,
      down: s.down,
      runningTime: runningTimeWithParts(cue, moves),
      startsBy: reached && from >= 0 && cues[from].follow != null ? "follow" : "go",
      after: reached && from >= 0 ? cues[from].number : null,
      linked,
      reached,
      brokenLink: broken.has(index),
      loopsTo: reached && lastStep?.index === index && order.loopsTo !== null ? cues[order.loopsTo].number : null,
    };
  };
  const ran = order.steps.map((st) => facts(st.index, st.from, true, st.linked));
  // A cue nobody reaches is still shown, read as if it ran after the cue numbered before it.
  const skipped = order.unreached.map((i) => facts(i, i - 1, false, false));
  const standbys = [
    ...groupStandbys(ran),
    ...skipped.map((r) => ({ cueIds: [r.id], label: groupStandbys([r])[0].label })),
  ];
  return { rows: [...ran, ...skipped], standbys, show };
}

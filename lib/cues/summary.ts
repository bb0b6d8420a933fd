// What the stage manager reads: each cue's running time, a one-line summary of what it does to the
// stage, and the standbys (cues called together because one follows the other within seconds).
import { countMoves, type TrackedShow } from "./tracking";
import { formatCueNumber } from "./cue-number";

export type CueTiming = { upTime: number; downTime: number | null; delay: number; downDelay?: number | null };

/** What a channel lights: the purposes and focus points (acting areas) of its fixtures. */
export type ChannelInfo = ReadonlyMap<number, { purposes: readonly string[]; areas: readonly string[] }>;

/**
 * How long the fade runs from GO until the last channel arrives: the up delay plus the up time when
 * something goes up and the down delay plus the down time when something goes down (the later of the
 * two). A cue that moves nothing still takes its time on the console, so then the later end counts.
 */
export function runningTime(cue: CueTiming, moves?: { up: number; down: number }): number {
  const down = cue.downTime ?? cue.upTime;
  const downDelay = cue.downDelay ?? cue.delay;
  const none = !moves || (moves.up === 0 && moves.down === 0);
  const up = none || moves!.up > 0 ? cue.delay + cue.upTime : 0;
  const dn = none || moves!.down > 0 ? downDelay + down : 0;
  return Math.max(up, dn);
}

const MAX_NAMES = 3;

function names(list: string[]): string {
  if (list.length <= MAX_NAMES) return list.join(", ");
  return `${list.slice(0, MAX_NAMES).join(", ")} +${list.length - MAX_NAMES} more`;
}

// One collator for all: localeCompare with options builds a new one on every call (slow in a sort).
const byName = new Intl.Collator(undefined, { numeric: true });

function allZero(levels: Float32Array): boolean {
  for (let i = 0; i < levels.length; i++) if (levels[i] !== 0) return false;
  return true;
}

/** Acting areas first (where on stage), then purposes (what kind of light), each once. */
function lit(cols: number[], show: TrackedShow, info: ChannelInfo): string[] {
  const areas = new Set<string>();
  const purposes = new Set<string>();
  for (const col of cols) {
    const i = info.get(show.channels[col]);
    i?.areas.forEach((a) => areas.add(a));
    i?.purposes.forEach((p) => purposes.add(p));
  }
  return [...[...areas].sort(byName.compare), ...[...purposes].sort(byName.compare)];
}

/**
 * One line for the cue at `index`, e.g. "4 up, 2 down · brighter: Area 2, front light · darker: cyc".
 * `from` is the cue that runs before it (-1: from dark); by default the one numbered before.
 */
export function summarizeCue(
  show: TrackedShow,
  index: number,
  info: ChannelInfo,
  from = index - 1,
): { up: number; down: number; changed: number[]; text: string } {
  const { up, down, changed } = countMoves(show, index, from);
  if (!changed.length) return { up, down, changed, text: "no level changes" };
  const now = show.states[index];
  const before = from >= 0 ? show.states[from] : null;
  const brighter = changed.filter((col) => now[col] > (before ? before[col] : 0));
  const darker = changed.filter((col) => now[col] < (before ? before[col] : 0));
  const counts = [up ? `${up} up` : "", down ? `${down} down` : ""].filter(Boolean).join(", ");
  const parts = [counts];
  const wasDark = !before || allZero(before);
  const isDark = allZero(now);
  if (isDark) parts.push("to blackout");
  else if (wasDark) parts.push("from dark");
  const b = lit(brighter, show, info);
  const d = lit(darker, show, info);
  if (b.length) parts.push(`brighter: ${names(b)}`);
  if (d.length && !isDark) parts.push(`darker: ${names(d)}`);
  return { up, down, changed, text: parts.join(" · ") };
}

/** Cues that start by themselves this soon after the one before are called in the same standby. */
export const STANDBY_WINDOW_SECONDS = 5; // Throwline's choice, no source

export type StandbyGroup = { cueIds: number[]; label: string };

/**
 * Groups cues in running order: a cue whose follow is set and at most `window` seconds joins the
 * cue before it in one standby ("Standby LX 14 and 14.5"); everything else is its own standby.
 * Give the cues in running order (see running-order.ts); `linked` marks a cue reached by a link,
 * so a group that jumps is named cue by cue rather than as a range.
 */
export function groupStandbys(
  cues: ReadonlyArray<{ id: number; number: number; follow: number | null; linked?: boolean }>,
  window = STANDBY_WINDOW_SECONDS,
): StandbyGroup[] {
  const groups: Array<{ cues: Array<{ id: number; number: number; linked?: boolean }> }> = [];
  let joinNext = false;
  for (const cue of cues) {
    if (joinNext && groups.length) groups[groups.length - 1].cues.push(cue);
    else groups.push({ cues: [cue] });
    joinNext = cue.follow != null && cue.follow <= window;
  }
  return groups.map((g) => {
    const nums = g.cues.map((c) => formatCueNumber(c.number));
    const jumps = g.cues.slice(1).some((c) => c.linked);
    const label =
      nums.length === 1
        ? nums[0]
        : nums.length === 2
          ? `${nums[0]} and ${nums[1]}`
          : jumps
            ? `${nums.slice(0, -1).join(", ")} and ${nums.at(-1)}`
            : `${nums[0]} to ${nums.at(-1)} (${nums.length} cues)`;
    return { cueIds: g.cues.map((c) => c.id), label };
  });
}

// Typed levels for channels that no unit in the rig answers to. Recording one is allowed (a channel may be
// hung later, or belong to a practical patched elsewhere), but never silently: the line waits for a
// second Enter, and the warning says which channels and why.
import { formatChannels } from "./keyboard-entry";

/** The typed channels with no fixture in the rig, in the order typed, without repeats. */
export function unpatchedChannels(typed: readonly number[], rigChannels: Iterable<number>): number[] {
  const known = new Set(rigChannels);
  return [...new Set(typed)].filter((ch) => !known.has(ch));
}

/** The warning shown before such a line is recorded, in the words of the level entry. */
export function unpatchedWarning(unpatched: readonly number[]): string {
  const one = unpatched.length === 1;
  const list = formatChannels(unpatched).replace(/-/g, "–");
  return `${one ? "Channel" : "Channels"} ${list} ${one ? "has" : "have"} no unit in the rig${
    one ? "" : ` (${unpatched.length} channels)`
  }. Press Enter again to record ${one ? "it" : "them"} anyway, or change the line.`;
}

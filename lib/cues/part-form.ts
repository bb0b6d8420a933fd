// The designer's part rows as typed (text), and reading them back into parts with a message per
// field. Pure, so the form and the tests share it.
import { formatFadeTime, formatSplitTime, parseFadeTime, parseSplitTime } from "./fade-time";
import { formatChannels, parseChannels } from "./keyboard-entry";
import { checkParts, normaliseParts } from "./parts";
import { MAX_PARTS, type CuePart } from "./types";

export type PartDraft = { key: string; part: string; label: string; time: string; delay: string; channels: string };

let counter = 0;
const newKey = () => `p${++counter}`;

export function toPartDrafts(parts: readonly CuePart[]): PartDraft[] {
  return parts.map((p) => ({
    key: newKey(),
    part: String(p.part),
    label: p.label,
    time: formatSplitTime(p.upTime, p.downTime),
    delay: p.delay ? formatFadeTime(p.delay) : "0",
    channels: formatChannels(p.channels),
  }));
}

/** A new row: the next free part number, the cue's time, no channels yet. */
export function blankPartDraft(existing: readonly PartDraft[], cueTime: string): PartDraft {
  const used = new Set(existing.map((d) => Number(d.part)));
  let n = 1;
  while (used.has(n) && n < MAX_PARTS) n++;
  return { key: newKey(), part: String(n), label: "", time: cueTime || "5", delay: "0", channels: "" };
}

/** Parts from the rows; errors keyed `part-<key>-<field>` (and `parts` for problems across rows). */
export function readPartDrafts(drafts: readonly PartDraft[]): { parts: CuePart[]; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const parts: CuePart[] = [];
  for (const d of drafts) {
    const at = (field: string) => `part-${d.key}-${field}`;
    const partNo = Number(d.part.trim());
    if (!/^\d+$/.test(d.part.trim()) || partNo < 1 || partNo > MAX_PARTS)
      errors[at("part")] = `A part number from 1 to ${MAX_PARTS}`;
    let time = { up: 0, down: null as number | null };
    try {
      time = parseSplitTime(d.time);
    } catch (e) {
      errors[at("time")] = (e as Error).message;
    }
    let delay = 0;
    try {
      delay = parseFadeTime(d.delay.trim() || "0", "Wait");
    } catch (e) {
      errors[at("delay")] = (e as Error).message;
    }
    let channels: number[] = [];
    try {
      channels = d.channels.trim() ? parseChannels(d.channels) : [];
    } catch (e) {
      errors[at("channels")] = (e as Error).message;
    }
    if (d.label.trim().length > 60) errors[at("label")] = "At most 60 characters";
    parts.push({ part: partNo, label: d.label.trim(), upTime: time.up, downTime: time.down, delay, channels });
  }
  const across = checkParts(parts.filter((p) => Number.isInteger(p.part)));
  if (across.length) errors.parts = across.join("; ");
  return { parts: normaliseParts(parts), errors };
}

/** True when two lists of parts say the same thing (order of parts and channels aside). */
export function sameParts(a: readonly CuePart[], b: readonly CuePart[]): boolean {
  return JSON.stringify(normaliseParts(a)) === JSON.stringify(normaliseParts(b));
}

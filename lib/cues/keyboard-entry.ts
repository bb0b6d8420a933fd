// Throwline's own typing syntax for the level grid (deliberately not any console's):
//   12 75        channel 12 to 75 %
//   1-6 full     channels 1 to 6 at 100 %     (also "1-6 = 100")
//   3,5,9-11 out channels 3, 5, 9, 10, 11 to 0 %
//   4 track      remove channel 4's move so it keeps the level of the cue before
//   cue 12.5     go to cue 12.5, creating it when it does not exist
import { parseCueNumber } from "./cue-number";

export type Entry = { kind: "levels"; channels: number[]; level: number | null } | { kind: "cue"; number: number };

export const MAX_CHANNELS_PER_ENTRY = 2000;

/** "1-4, 9, 12-14" → [1, 2, 3, 4, 9, 12, 13, 14]; throws a RangeError naming the piece it cannot read. */
export function parseChannels(text: string): number[] {
  const out = new Set<number>();
  for (const piece of text.split(",").map((p) => p.trim())) {
    const m = /^(\d{1,5})(?:\s*-\s*(\d{1,5}))?$/.exec(piece);
    if (!m) throw new RangeError(`"${piece || text}" is not a channel or a range like 1-6`);
    const a = Number(m[1]);
    const b = m[2] ? Number(m[2]) : a;
    if (a < 1 || b < 1) throw new RangeError("Channels start at 1");
    if (Math.abs(b - a) >= MAX_CHANNELS_PER_ENTRY)
      throw new RangeError(`At most ${MAX_CHANNELS_PER_ENTRY} channels at once`);
    for (let ch = Math.min(a, b); ch <= Math.max(a, b); ch++) out.add(ch);
  }
  return [...out].sort((x, y) => x - y);
}

function parseLevel(text: string): number | null {
  const t = text.trim().toLowerCase();
  if (t === "full" || t === "fl") return 100;
  if (t === "out") return 0;
  if (t === "track") return null;
  if (!/^-?\d+(\.\d+)?%?$/.test(t))
    throw new RangeError(`"${text.trim()}" is not a level: type 0–100, full, out or track`);
  const n = Number(t.replace("%", ""));
  if (n < 0 || n > 100) throw new RangeError(`Level ${n} is outside 0–100`);
  return Math.round(n);
}

/** Reads one typed line; throws a RangeError whose message can be shown as it is. */
export function parseEntry(line: string): Entry {
  const t = line.trim();
  if (!t) throw new RangeError("Type a channel and a level, e.g. 12 75");
  const cue = /^cue\s+(\S+)$/i.exec(t);
  if (cue) return { kind: "cue", number: parseCueNumber(cue[1]) };
  const m = /^([\d\s,-]+?)\s*(?:=\s*|\s)\s*(\S+)$/.exec(t);
  if (!m) throw new RangeError(`"${t}" is not understood: type a channel and a level, e.g. 12 75 or 1-6 full`);
  return { kind: "levels", channels: parseChannels(m[1]), level: parseLevel(m[2]) };
}

/** [1, 2, 3, 4, 9] → "1-4, 9": the short form people type and read. */
export function formatChannels(channels: readonly number[]): string {
  const sorted = [...new Set(channels)].sort((a, b) => a - b);
  const out: string[] = [];
  for (let i = 0; i < sorted.length; ) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j++;
    out.push(j > i ? `${sorted[i]}-${sorted[j]}` : String(sorted[i]));
    i = j + 1;
  }
  return out.join(", ");
}

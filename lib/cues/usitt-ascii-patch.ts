// The patch (channel → DMX universe and address) in the USITT ASCII file and as CSV, so a console gets the
// hookup without anyone retyping it. The PATCH record's layout is from memory, not checked against the
// standard's text: `PATCH page channel<dimmer@level …`, one or more entries a line, the "dimmer" being the
// output number. Throwline writes patch page 1, the absolute address (U − 1)·512 + address as the output
// (common practice; DMX512-A numbers addresses 1–512 within a universe) and FL as the level.

export type PatchEntry = { channel: number; universe: number; address: number };

/** Universes run 1–63999 (sACN, ANSI E1.31), so absolute addresses run up to 63999·512. */
export const MAX_ABSOLUTE_ADDRESS = 63_999 * 512;
const SLOTS = 512;

export function absoluteAddress(e: Pick<PatchEntry, "universe" | "address">): number {
  return (e.universe - 1) * SLOTS + e.address;
}

export function fromAbsolute(absolute: number): { universe: number; address: number } {
  return { universe: Math.floor((absolute - 1) / SLOTS) + 1, address: ((absolute - 1) % SLOTS) + 1 };
}

/** Entries sorted by channel, then address; each `channel<absolute@FL`. */
export function patchItems(patch: readonly PatchEntry[]): string[] {
  return [...patch]
    .sort((a, b) => a.channel - b.channel || absoluteAddress(a) - absoluteAddress(b))
    .map((e) => `${e.channel}<${absoluteAddress(e)}@FL`);
}

/**
 * Reads the arguments of one PATCH line (after the keyword): the page, then channel, output and level
 * triples. Returns the entries or a message naming what is wrong.
 */
export function readPatchArgs(args: readonly string[]): { entries: PatchEntry[] } | { error: string } {
  const triples = args.slice(1);
  if (triples.length === 0 || triples.length % 3 !== 0) {
    return { error: "PATCH: after the page number come channel, address and level in threes (e.g. PATCH 1 5<513@FL)" };
  }
  const entries: PatchEntry[] = [];
  for (let k = 0; k < triples.length; k += 3) {
    const channel = Number(triples[k]);
    const absolute = Number(triples[k + 1]);
    if (!Number.isInteger(channel) || channel < 1 || channel > 99_999)
      return { error: `PATCH: "${triples[k]}" is not a channel number (1–99999)` };
    if (!Number.isInteger(absolute) || absolute < 1 || absolute > MAX_ABSOLUTE_ADDRESS) {
      return {
        error: `PATCH: address ${triples[k + 1]} for channel ${channel} is not a DMX address (1 to ${MAX_ABSOLUTE_ADDRESS.toLocaleString("en-GB")} counted across universes)`,
      };
    }
    entries.push({ channel, ...fromAbsolute(absolute) });
  }
  return { entries };
}

const csvCell = (v: string | number) => {
  const s = String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};

/** The patch as CSV with a header row, CR LF line ends, sorted by channel. */
export function patchToCsv(patch: readonly PatchEntry[]): string {
  const rows = [...patch].sort((a, b) => a.channel - b.channel || absoluteAddress(a) - absoluteAddress(b));
  const lines = [
    ["Channel", "Universe", "Address", "Absolute address"],
    ...rows.map((e) => [e.channel, e.universe, e.address, absoluteAddress(e)]),
  ];
  return lines.map((l) => l.map(csvCell).join(",")).join("\r\n") + "\r\n";
}

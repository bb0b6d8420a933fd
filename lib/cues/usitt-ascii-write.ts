// Writes a cue list in the USITT ASCII Text Representation for Lighting Console Data (USITT,
// version 3.0, 1992). Confirmed facts (shared REFERENCE.md): one instruction a line, at most 80
// characters; `!` starts a comment; IDENT 3:0 comes first; keywords that begin with `$` are
// manufacturer-specific and other readers ignore them.
// From memory, not checked against the text: the keyword set CUE, PART, UP, DOWN, FOLLOWON (the follow
// time; some tools write FOLLOW, which the reader also takes), LINK, TEXT, CHAN, PATCH, MANUFACTURER,
// CONSOLE, ENDDATA; `UP time [delay]` and `DOWN time [delay]` (delays ride inside UP and DOWN: WAIT and
// DELAY are dialect keywords, never written); times as seconds or m:ss; levels 0–100; CR LF line ends;
// that `PART n` inside a cue opens a part whose UP, DOWN and CHAN lines follow it until the next PART or
// the next record, after the cue's own lines. The PATCH layout is in usitt-ascii-patch.ts.
//
// Tracking: whether a cue in the file is a full state or only its changes is not settled (see
// REFERENCE.md). Throwline writes each cue's FULL tracked state (every channel above 0) and also
// writes `channel@0` for each channel that goes out in that cue. Read as full states or as changes,
// such a file gives the same looks, so a console of either kind gets the show right.
import { computeTracking, levelAt } from "./tracking";
import { formatCueNumber } from "./cue-number";
import type { CuePart, CueWithMoves } from "./types";
import { patchItems, type PatchEntry } from "./usitt-ascii-patch";

export const ASCII_MAX_LINE = 80;
export const THROWLINE_KEYWORDS = {
  page: "$TL-PAGE",
  note: "$TL-NOTE",
  text: "$TL-TEXT",
  block: "$TL-BLOCK",
  partText: "$TL-PARTTEXT",
} as const;

/** Throwline's own `$` lines may carry any text: `\` and line breaks are escaped, non-ASCII as \u{hex}. */
export function escapeText(text: string): string {
  return [...text]
    .map((ch) => {
      if (ch === "\\") return "\\\\";
      if (ch === "\n") return "\\n";
      if (ch === "\r") return "";
      const code = ch.codePointAt(0)!;
      return code < 32 || code > 126 ? `\\u{${code.toString(16)}}` : ch;
    })
    .join("");
}

/** The plain-ASCII version of a label for the standard's TEXT line (accents dropped, others as ?). */
function asciiOnly(text: string): string {
  return text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[\u2012-\u2015]/g, "-")
    .replace(/[^\x20-\x7e]/g, "?");
}

/** Splits an escaped text into lines `KEYWORD chunk` that each fit in 80 characters, never inside an escape. */
function chunked(keyword: string, escaped: string): string[] {
  const room = ASCII_MAX_LINE - keyword.length - 1;
  const lines: string[] = [];
  let i = 0;
  while (i < escaped.length) {
    let end = Math.min(escaped.length, i + room);
    const slashes = escaped.slice(i, end).match(/\\(u\{[0-9a-f]*)?$|\\u\{[0-9a-f]*$/);
    if (end < escaped.length && slashes) end -= slashes[0].length;
    lines.push(`${keyword} ${escaped.slice(i, end)}`);
    i = end;
  }
  return lines;
}

/** `head item item …` lines of at most 80 characters. */
function packed(head: string, items: string[]): string[] {
  const lines: string[] = [];
  let line = head;
  for (const it of items) {
    const item = ` ${it}`;
    if (line.length + item.length > ASCII_MAX_LINE && line !== head) {
      lines.push(line);
      line = head;
    }
    line += item;
  }
  if (line !== head) lines.push(line);
  return lines;
}

function levelLines(pairs: Array<[number, number]>): string[] {
  return packed(
    "CHAN",
    pairs.map(([ch, level]) => `${ch}@${Math.round(level)}`),
  );
}

/** `UP time [delay]` and `DOWN time [delay]`: the standard's only place for waits (from memory). */
function timeLines(t: { upTime: number; downTime: number | null; delay: number; downDelay?: number | null }): string[] {
  const out = [`UP ${time(t.upTime)}${t.delay ? ` ${time(t.delay)}` : ""}`];
  const downDelay = t.downDelay ?? t.delay;
  // A down delay of its own needs a DOWN line even when the down fade takes the up time.
  const ownDown = t.downDelay != null && t.downDelay !== t.delay;
  if (t.downTime != null || ownDown) {
    out.push(`DOWN ${time(t.downTime ?? t.upTime)}${downDelay || ownDown ? ` ${time(downDelay)}` : ""}`);
  }
  return out;
}

const time = (s: number) => String(Math.round(s * 100) / 100);

/**
 * One part: its times, its label, and every channel of the part with its level in the cue (even at
 * 0, so that which channels belong to the part survives the round trip).
 */
function partLines(part: CuePart, level: (ch: number) => number): string[] {
  const out = [`PART ${part.part}`, ...timeLines(part)];
  if (part.label) out.push(...chunked(THROWLINE_KEYWORDS.partText, escapeText(part.label)));
  out.push(...levelLines(part.channels.map((ch) => [ch, level(ch)])));
  return out;
}

/** The cue list (and, when given, the patch) as one USITT ASCII file. */
export function writeUsittAscii(opts: {
  title: string;
  cues: ReadonlyArray<CueWithMoves & { id?: number }>;
  patch?: readonly PatchEntry[];
}): string {
  const withIds = opts.cues.map((c, i) => ({ ...c, id: i }));
  const show = computeTracking(withIds);
  const byId = new Map(withIds.map((c) => [c.id, c]));
  const out = [
    "IDENT 3:0",
    "MANUFACTURER Throwline",
    "CONSOLE Throwline",
    `! ${asciiOnly(opts.title)}`.slice(0, ASCII_MAX_LINE),
    `! cues: ${withIds.length}; each cue is written as its full state`,
  ];
  if (opts.patch?.length)
    out.push(
      "",
      "! patch: channel<absolute DMX address ((universe - 1) * 512 + address)",
      ...packed("PATCH 1", patchItems(opts.patch)),
    );
  show.cueIds.forEach((id, index) => {
    const cue = byId.get(id)!;
    out.push("", `CUE ${formatCueNumber(cue.number)}`);
    if (cue.label) {
      const plain = asciiOnly(cue.label);
      out.push(`TEXT ${plain}`.slice(0, ASCII_MAX_LINE));
      if (plain !== cue.label || plain.length > ASCII_MAX_LINE - 5)
        out.push(...chunked(THROWLINE_KEYWORDS.text, escapeText(cue.label)));
    }
    out.push(...timeLines(cue));
    if (cue.follow != null) out.push(`FOLLOWON ${time(cue.follow)}`);
    if (cue.link != null) out.push(`LINK ${formatCueNumber(cue.link)}`);
    if (cue.page) out.push(...chunked(THROWLINE_KEYWORDS.page, escapeText(cue.page)));
    if (cue.callNote) out.push(...chunked(THROWLINE_KEYWORDS.note, escapeText(cue.callNote)));
    if (cue.block) out.push(THROWLINE_KEYWORDS.block);
    const now = show.states[index];
    const before = index > 0 ? show.states[index - 1] : null;
    const inPart = new Set(cue.parts.flatMap((p) => p.channels));
    const pairs: Array<[number, number]> = [];
    show.channels.forEach((ch, col) => {
      if (!inPart.has(ch) && (now[col] > 0 || (before && before[col] > 0))) pairs.push([ch, now[col]]);
    });
    out.push(...levelLines(pairs));
    for (const part of cue.parts) out.push(...partLines(part, (ch) => levelAt(show, index, ch)));
  });
  out.push("", "ENDDATA", "");
  return out.join("\r\n");
}

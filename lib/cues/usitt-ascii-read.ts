// Reads the USITT ASCII Text Representation for Lighting Console Data (USITT, version 3.0, 1992).
// Confirmed (shared REFERENCE.md): one instruction a line, at most 80 characters; keywords in any
// case; space , / < > = @ are interchangeable delimiters and a run of them counts as one; `!` starts
// a comment; IDENT 3:0 first; `$` keywords are manufacturer-specific and ignored when unknown.
// From memory, not checked against the text: which keywords open a record (CUE, GROUP, SUB, PATCH,
// SET, CLEAR …) and which belong to it (PART, UP, DOWN, FOLLOWON, LINK, TEXT, CHAN); the follow time's
// keyword is FOLLOWON (FOLLOW, from tools that use the shorter word, is read as the same);
// `UP time [delay]` and `DOWN time [delay]`, a delay on DOWN only being the down fade's own wait;
// levels 0–100, FL for full, Hxx as hexadecimal 0–255 of full; TEXT takes the rest of its line;
// `PART n` opens part n of the open cue, and the UP, DOWN, TEXT and CHAN lines after it belong to the
// part until the next PART or record (FOLLOWON and LINK always belong to the cue). PATCH: see
// usitt-ascii-patch.ts.
// Throwline keeps whole percentages, so a level such as 33.5 or H80 (50.2 %) is rounded, with a notice.
// A reader must ignore keywords it does not know: unknown ones become notices, never errors.
import { parseCueNumber, cueKey, formatCueNumber } from "./cue-number";
import { parseFadeTime } from "./fade-time";
import { THROWLINE_KEYWORDS, ASCII_MAX_LINE } from "./usitt-ascii-write";
import { CUE_DEFAULTS, MAX_PARTS, type CuePart, type CueWithMoves } from "./types";
import { checkParts } from "./parts";
import { readPatchArgs, type PatchEntry } from "./usitt-ascii-patch";

export type AsciiProblem = { line: number; message: string };
export type AsciiReadResult = {
  cues: Array<CueWithMoves & { line: number }>;
  errors: AsciiProblem[];
  notices: AsciiProblem[];
  manufacturer: string | null;
  console: string | null;
  /** Channel → universe/address entries from PATCH records, in file order. */
  patch: PatchEntry[];
};

const DELIMITERS = /[\s,/<>=@]+/;
const RECORD_KEYWORDS = new Set(["CUE", "GROUP", "SUB", "PATCH", "SET", "CLEAR", "EFFECT", "MACRO"]); // from memory
/** The follow time's keyword as remembered (FOLLOWON), and the shorter spelling some tools write. */
const FOLLOW_KEYWORDS = new Set(["FOLLOWON", "FOLLOW"]);
const MAX_CHANNEL = 99_999;
const MAX_ERRORS = 25;

export function unescapeText(text: string): string {
  return text.replace(/\\(\\|n|u\{([0-9a-fA-F]{1,6})\})/g, (_m, what: string, hex?: string) =>
    what === "\\" ? "\\" : what === "n" ? "\n" : String.fromCodePoint(parseInt(hex!, 16)),
  );
}

/** A level as written in the file, exactly: 0–100, FL (full) or Hxx (hexadecimal of 255, so H80 = 50.196). */
export function parseAsciiLevel(token: string): number | null {
  const t = token.toUpperCase();
  if (t === "FL") return 100;
  if (/^H[0-9A-F]{1,2}$/.test(t)) return (parseInt(t.slice(1), 16) / 255) * 100;
  if (!/^\d+(\.\d+)?$/.test(t)) return null;
  return Number(t);
}

type OpenPart = {
  part: CuePart;
  text: string;
  fullText: string[];
  downDelay: { value: number; line: number } | null;
  upDelaySet: boolean;
};
/** Levels rounded to whole percentages while reading: how many, and the first. */
type Rounding = { count: number; first: { line: number; token: string; stored: number } | null };
type Open =
  | {
      kind: "cue";
      cue: CueWithMoves & { line: number };
      text: string;
      fullText: string[];
      note: string[];
      page: string[];
      part: OpenPart | null;
      parts: OpenPart[];
    }
  | { kind: "other" }
  | null;

export function readUsittAscii(source: string): AsciiReadResult {
  const errors: AsciiProblem[] = [];
  const notices: AsciiProblem[] = [];
  const result: AsciiReadResult = { cues: [], errors, notices, manufacturer: null, console: null, patch: [] };
  const rounding: Rounding = { count: 0, first: null };
  const bareCr = source.search(/\r(?!\n)/);
  if (bareCr >= 0) {
    const line = source.slice(0, bareCr).split("\n").length;
    errors.push({
      line,
      message:
        "the file has a carriage return without a line feed, so its line ends are wrong (old Mac style?). Save it with CR LF or LF line ends.",
    });
    return result;
  }
  const lines = source.split(/\r?\n/);
  const seen = new Map<number, number>();
  let open: Open = null;
  let ended = false;
  let firstInstruction = true;
  let ignoredManufacturer = 0;
  const fail = (line: number, message: string) => errors.length < MAX_ERRORS && errors.push({ line, message });

  const close = () => {
    if (open?.kind !== "cue") return;
    // Throwline's own $TL-TEXT keeps what the plain-ASCII TEXT line could not (accents, length).
    open.cue.label = (open.fullText.length ? unescapeText(open.fullText.join("")) : open.text).slice(0, 160);
    if (open.note.length) open.cue.callNote = unescapeText(open.note.join(""));
    if (open.page.length) open.cue.page = unescapeText(open.page.join("")).slice(0, 20);
    for (const p of open.parts)
      p.part.label = (p.fullText.length ? unescapeText(p.fullText.join("")) : p.text).slice(0, 60);
    // The same wait on both lines is the one delay of the cue; only a different down wait is its own.
    if (open.cue.downDelay === open.cue.delay) open.cue.downDelay = null;
    const cueName = formatCueNumber(open.cue.number);
    for (const p of open.parts) {
      if (p.downDelay && p.downDelay.value !== p.part.delay) {
        notices.push({
          line: p.downDelay.line,
          message: `part ${p.part.part} of cue ${cueName}: its down delay (${p.downDelay.value} s) differs from its up delay (${p.part.delay} s); a part keeps one wait, so it waits ${p.part.delay} s`,
        });
      }
    }
    open.cue.parts = open.parts
      .map((p) => ({ ...p.part, channels: [...new Set(p.part.channels)].sort((a, b) => a - b) }))
      .sort((a, b) => a.part - b.part);
    for (const problem of checkParts(open.cue.parts))
      fail(open.cue.line, `cue ${formatCueNumber(open.cue.number)}: ${problem}`);
  };

  for (let i = 0; i < lines.length && !ended; i++) {
    const n = i + 1;
    const raw = lines[i];
    if (raw.length > ASCII_MAX_LINE)
      notices.push({ line: n, message: `longer than the standard's ${ASCII_MAX_LINE} characters; read anyway` });
    const trimmed = raw.trim();
    if (!trimmed || trimmed.startsWith("!")) continue;
    // Delimiters before the keyword are a run like any other: skipped (a line of only delimiters is blank).
    const keywordMatch = /^[\s,/<>=@]*([^\s,/<>=@]+)\s*(.*)$/.exec(trimmed);
    if (!keywordMatch) continue;
    const keyword = keywordMatch[1].toUpperCase();
    const restRaw = keywordMatch[2];
    const rest = restRaw.replace(/!.*$/, "").trim();
    const args = rest ? rest.split(DELIMITERS).filter(Boolean) : [];
    if (firstInstruction && keyword !== "IDENT")
      notices.push({ line: n, message: "no IDENT line at the start; read as version 3.0" });
    firstInstruction = false;

    if (keyword.startsWith("$")) {
      if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.note) open.note.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.partText && open.part)
        open.part.fullText.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.text) open.fullText.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.page) open.page.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.block) open.cue.block = true;
      else ignoredManufacturer++;
      continue;
    }
    switch (keyword) {
      case "IDENT":
        if (n > 1 && result.cues.length) notices.push({ line: n, message: "IDENT should come first" });
        if (args[0] && !/^3(:0|\.0)?$/.test(args.join(":").replace(/:0:0$/, ":0")))
          notices.push({
            line: n,
            message: `IDENT ${args.join(":")}: written for another version of the standard; read as 3.0`,
          });
        break;
      case "MANUFACTURER":
        result.manufacturer = rest;
        break;
      case "CONSOLE":
        result.console = rest;
        break;
      case "ENDDATA":
        ended = true;
        break;
      case "CUE": {
        close();
        let number: number;
        try {
          number = parseCueNumber(args[0] ?? "");
        } catch (e) {
          fail(n, `CUE: ${(e as Error).message}`);
          open = { kind: "other" };
          break;
        }
        const first = seen.get(cueKey(number));
        if (first !== undefined) fail(n, `cue ${formatCueNumber(number)} appears twice (first on line ${first})`);
        seen.set(cueKey(number), n);
        const cue = { ...CUE_DEFAULTS, number, levels: {}, parts: [], line: n };
        result.cues.push(cue);
        open = { kind: "cue", cue, text: "", fullText: [], note: [], page: [], part: null, parts: [] };
        break;
      }
      case "TEXT":
        if (open?.kind === "cue") (open.part ?? open).text = restRaw.trim();
        break;
      case "UP":
      case "DOWN":
        if (open?.kind === "cue" && open.part) readPartTimes(open.part, keyword, args, n, fail);
        else if (open?.kind === "cue") readTimes(open.cue, keyword, args, n, fail);
        break;
      case "FOLLOWON":
      case "FOLLOW":
        if (open?.kind === "cue") {
          try {
            open.cue.follow = parseFadeTime(args[0] ?? "", `${keyword} time`);
          } catch (e) {
            fail(n, (e as Error).message);
          }
        }
        break;
      case "LINK":
        if (open?.kind === "cue") {
          try {
            open.cue.link = parseCueNumber(args[0] ?? "");
          } catch (e) {
            fail(n, `LINK: ${(e as Error).message}`);
          }
        }
        break;
      case "PART":
        if (open?.kind === "cue") {
          const number = Number(args[0]);
          if (!Number.isInteger(number) || number < 1 || number > MAX_PARTS) {
            fail(n, `PART "${args[0] ?? ""}": a part number is a whole number from 1 to ${MAX_PARTS}`);
            break;
          }
          // Until the part's own UP and DOWN: the cue's up time, no split, no delay (Throwline's reading).
          open.part = {
            part: { part: number, label: "", upTime: open.cue.upTime, downTime: null, delay: 0, channels: [] },
            text: "",
            fullText: [],
            downDelay: null,
            upDelaySet: false,
          };
          open.parts.push(open.part);
        } else if (!open) notices.push({ line: n, message: "PART outside any cue ignored" });
        break;
      case "CHAN":
        if (open?.kind === "cue") {
          const listed = readLevels(open.cue.levels, args, n, fail, rounding);
          open.part?.part.channels.push(...listed);
        } else if (!open) notices.push({ line: n, message: "CHAN outside any cue ignored" });
        break;
      case "PATCH": {
        close();
        open = { kind: "other" };
        const read = readPatchArgs(args);
        if ("error" in read) fail(n, read.error);
        else result.patch.push(...read.entries);
        break;
      }
      default:
        if (RECORD_KEYWORDS.has(keyword)) {
          close();
          open = { kind: "other" };
          notices.push({ line: n, message: `${keyword} ignored: Throwline reads cues only` });
        } else {
          notices.push({ line: n, message: `unknown keyword ${keyword} ignored` });
        }
    }
  }
  close();
  if (ignoredManufacturer)
    notices.push({ line: 0, message: `${ignoredManufacturer} manufacturer-specific ($) lines ignored` });
  if (rounding.first) {
    const { line, token, stored } = rounding.first;
    const what = rounding.count === 1 ? "1 level was" : `${rounding.count} levels were`;
    notices.push({
      line,
      message: `${what} rounded to whole percentages (Throwline keeps whole percentages), the first on line ${line}: ${token} → ${stored}`,
    });
  }
  if (!ended && !errors.length) {
    const last = lines.length - (lines.at(-1) === "" ? 1 : 0);
    fail(last, `the file ends at line ${last} without ENDDATA, so it may have been cut short; nothing was imported`);
  }
  return result;
}

function readTimes(
  cue: { upTime: number; downTime: number | null; delay: number; downDelay?: number | null },
  keyword: "UP" | "DOWN",
  args: string[],
  line: number,
  fail: (l: number, m: string) => void,
) {
  try {
    const t = parseFadeTime(args[0] ?? "", `${keyword} time`);
    const delay = args[1] !== undefined ? parseFadeTime(args[1], `${keyword} delay`) : null;
    if (keyword === "UP") {
      cue.upTime = t;
      if (delay !== null) cue.delay = delay;
    } else {
      cue.downTime = t;
      // The down fade's own wait; close() folds it into the one delay when both lines agree.
      if (delay !== null) cue.downDelay = delay;
    }
  } catch (e) {
    fail(line, (e as Error).message);
  }
}

/**
 * A part has one wait: UP's delay, else DOWN's. A DOWN delay is remembered so that close() can report one
 * that differs from the part's wait rather than drop it silently.
 */
function readPartTimes(
  p: OpenPart,
  keyword: "UP" | "DOWN",
  args: string[],
  line: number,
  fail: (l: number, m: string) => void,
) {
  const times: { upTime: number; downTime: number | null; delay: number; downDelay?: number | null } = {
    ...p.part,
    delay: Number.NaN,
    downDelay: null,
  };
  readTimes(times, keyword, args, line, fail);
  p.part.upTime = times.upTime;
  p.part.downTime = times.downTime;
  if (!Number.isNaN(times.delay)) {
    p.part.delay = times.delay;
    p.upDelaySet = true;
  }
  if (times.downDelay != null) {
    p.downDelay = { value: times.downDelay, line };
    if (!p.upDelaySet) p.part.delay = times.downDelay;
  }
}

/** Reads `ch level` pairs into `levels`; returns the channels it read. */
function readLevels(
  levels: Record<number, number>,
  args: string[],
  line: number,
  fail: (l: number, m: string) => void,
  rounding: Rounding,
): number[] {
  const listed: number[] = [];
  if (args.length % 2 === 1) fail(line, `CHAN needs channel and level pairs; channel ${args.at(-1)} has no level`);
  for (let k = 0; k + 1 < args.length; k += 2) {
    const ch = Number(args[k]);
    if (!Number.isInteger(ch) || ch < 1 || ch > MAX_CHANNEL) {
      fail(line, `"${args[k]}" is not a channel number (1–${MAX_CHANNEL})`);
      continue;
    }
    const level = parseAsciiLevel(args[k + 1]);
    if (/^-\d/.test(args[k + 1])) fail(line, `level ${args[k + 1]} for channel ${ch} is below 0`);
    else if (level === null)
      fail(line, `level "${args[k + 1]}" for channel ${ch} is not a level (0–100, FL or H00–HFF)`);
    else if (level > 100) fail(line, `level ${args[k + 1]} for channel ${ch} is above 100`);
    else {
      const stored = Math.round(level);
      if (stored !== level) {
        rounding.count++;
        rounding.first ??= { line, token: args[k + 1], stored };
      }
      levels[ch] = stored;
      listed.push(ch);
    }
  }
  return listed;
}

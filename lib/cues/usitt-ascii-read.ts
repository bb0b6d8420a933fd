// Reads the USITT ASCII Text Representation for Lighting Console Data (USITT, version 3.0, 1992).
// Confirmed (shared REFERENCE.md): one instruction a line, at most 80 characters; keywords in any
// case; space , / < > = @ are interchangeable delimiters and a run of them counts as one; `!` starts
// a comment; IDENT 3:0 first; `$` keywords are manufacturer-specific and ignored when unknown.
// From memory, not checked against the text: which keywords open a record (CUE, GROUP, SUB, PATCH,
// SET, CLEAR …) and which belong to it (PART, UP, DOWN, FOLLOW, LINK, TEXT, CHAN); `UP time [delay]`;
// levels 0–100, FL for full, Hxx as hexadecimal 0–255 of full; TEXT takes the rest of its line;
// `PART n` opens part n of the open cue, and the UP, DOWN, TEXT and CHAN lines after it belong to the
// part until the next PART or record (FOLLOW and LINK always belong to the cue).
// A reader must ignore keywords it does not know: unknown ones become notices, never errors.
import { parseCueNumber, cueKey, formatCueNumber } from "./cue-number";
import { parseFadeTime } from "./fade-time";
import { THROWLINE_KEYWORDS, ASCII_MAX_LINE } from "./usitt-ascii-write";
import { CUE_DEFAULTS, MAX_PARTS, type CuePart, type CueWithMoves } from "./types";
import { checkParts } from "./parts";

export type AsciiProblem = { line: number; message: string };
export type AsciiReadResult = {
  cues: Array<CueWithMoves & { line: number }>;
  errors: AsciiProblem[];
  notices: AsciiProblem[];
  manufacturer: string | null;
  console: string | null;
};

const DELIMITERS = /[\s,/<>=@]+/;
const RECORD_KEYWORDS = new Set(["CUE", "GROUP", "SUB", "PATCH", "SET", "CLEAR", "EFFECT", "MACRO"]); // from memory
const MAX_CHANNEL = 99_999;
const MAX_ERRORS = 25;

export function unescapeText(text: string): string {
  return text.replace(/\\(\\|n|u\{([0-9a-fA-F]{1,6})\})/g, (_m, what: string, hex?: string) =>
    what === "\\" ? "\\" : what === "n" ? "\n" : String.fromCodePoint(parseInt(hex!, 16)),
  );
}

/** A level as written in the file: 0–100, FL (full) or Hxx (hexadecimal of 255). */
export function parseAsciiLevel(token: string): number | null {
  const t = token.toUpperCase();
  if (t === "FL") return 100;
  if (/^H[0-9A-F]{1,2}$/.test(t)) return Math.round((parseInt(t.slice(1), 16) / 255) * 100);
  if (!/^\d+(\.\d+)?$/.test(t)) return null;
  return Number(t);
}

type OpenPart = { part: CuePart; text: string; fullText: string[] };
type Open =
  | { kind: "cue"; cue: CueWithMoves & { line: number }; text: string; fullText: string[]; note: string[]; page: string[]; part: OpenPart | null; parts: OpenPart[] }
  | { kind: "other" }
  | null;

export function readUsittAscii(source: string): AsciiReadResult {
  const errors: AsciiProblem[] = [];
  const notices: AsciiProblem[] = [];
  const result: AsciiReadResult = { cues: [], errors, notices, manufacturer: null, console: null };
  const bareCr = source.search(/\r(?!\n)/);
  if (bareCr >= 0) {
    const line = source.slice(0, bareCr).split("\n").length;
    errors.push({ line, message: "the file has a carriage return without a line feed, so its line ends are wrong (old Mac style?). Save it with CR LF or LF line ends." });
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
    for (const p of open.parts) p.part.label = (p.fullText.length ? unescapeText(p.fullText.join("")) : p.text).slice(0, 60);
    open.cue.parts = open.parts.map((p) => ({ ...p.part, channels: [...new Set(p.part.channels)].sort((a, b) => a - b) })).sort((a, b) => a.part - b.part);
    for (const problem of checkParts(open.cue.parts)) fail(open.cue.line, `cue ${formatCueNumber(open.cue.number)}: ${problem}`);
  };

  for (let i = 0; i < lines.length && !ended; i++) {
    const n = i + 1;
    const raw = lines[i];
    if (raw.length > ASCII_MAX_LINE) notices.push({ line: n, message: `longer than the standard's ${ASCII_MAX_LINE} characters; read anyway` });
    const trimmed = raw.trim();
    if (!trimmed || trimmed.startsWith("!")) continue;
    const keywordMatch = /^([^\s,/<>=@]+)\s*(.*)$/.exec(trimmed)!;
    const keyword = keywordMatch[1].toUpperCase();
    const restRaw = keywordMatch[2];
    const rest = restRaw.replace(/!.*$/, "").trim();
    const args = rest ? rest.split(DELIMITERS).filter(Boolean) : [];
    if (firstInstruction && keyword !== "IDENT") notices.push({ line: n, message: "no IDENT line at the start; read as version 3.0" });
    firstInstruction = false;

    if (keyword.startsWith("$")) {
      if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.note) open.note.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.partText && open.part) open.part.fullText.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.text) open.fullText.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.page) open.page.push(restRaw);
      else if (open?.kind === "cue" && keyword === THROWLINE_KEYWORDS.block) open.cue.block = true;
      else ignoredManufacturer++;
      continue;
    }
    switch (keyword) {
      case "IDENT":
        if (n > 1 && result.cues.length) notices.push({ line: n, message: "IDENT should come first" });
        if (args[0] && !/^3(:0|\.0)?$/.test(args.join(":").replace(/:0:0$/, ":0"))) notices.push({ line: n, message: `IDENT ${args.join(":")}: written for another version of the standard; read as 3.0` });
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
        if (open?.kind === "cue") readTimes(open.part?.part ?? open.cue, keyword, args, n, fail);
        break;
      case "FOLLOW":
        if (open?.kind === "cue") {
          try {
            open.cue.follow = parseFadeTime(args[0] ?? "", "FOLLOW time");
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
          open.part = { part: { part: number, label: "", upTime: open.cue.upTime, downTime: null, delay: 0, channels: [] }, text: "", fullText: [] };
          open.parts.push(open.part);
        } else if (!open) notices.push({ line: n, message: "PART outside any cue ignored" });
        break;
      case "CHAN":
        if (open?.kind === "cue") {
          const listed = readLevels(open.cue.levels, args, n, fail);
          open.part?.part.channels.push(...listed);
        }
        else if (!open) notices.push({ line: n, message: "CHAN outside any cue ignored" });
        break;
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
  if (ignoredManufacturer) notices.push({ line: 0, message: `${ignoredManufacturer} manufacturer-specific ($) lines ignored` });
  if (!ended && !errors.length) {
    const last = lines.length - (lines.at(-1) === "" ? 1 : 0);
    fail(last, `the file ends at line ${last} without ENDDATA, so it may have been cut short; nothing was imported`);
  }
  return result;
}

function readTimes(cue: { upTime: number; downTime: number | null; delay: number }, keyword: "UP" | "DOWN", args: string[], line: number, fail: (l: number, m: string) => void) {
  try {
    const t = parseFadeTime(args[0] ?? "", `${keyword} time`);
    const delay = args[1] !== undefined ? parseFadeTime(args[1], `${keyword} delay`) : null;
    if (keyword === "UP") cue.upTime = t;
    else cue.downTime = t;
    if (delay !== null && (keyword === "UP" || cue.delay === 0)) cue.delay = delay;
  } catch (e) {
    fail(line, (e as Error).message);
  }
}

/** Reads `ch level` pairs into `levels`; returns the channels it read. */
function readLevels(levels: Record<number, number>, args: string[], line: number, fail: (l: number, m: string) => void): number[] {
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
    else if (level === null) fail(line, `level "${args[k + 1]}" for channel ${ch} is not a level (0–100, FL or H00–HFF)`);
    else if (level > 100) fail(line, `level ${args[k + 1]} for channel ${ch} is above 100`);
    else {
      levels[ch] = Math.round(level);
      listed.push(ch);
    }
  }
  return listed;
}

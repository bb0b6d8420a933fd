// The cue list as a table, for CSV and Excel: one row a cue with its times, notes and summary.
// Text cells are neutralised against spreadsheet formula injection (OWASP "CSV Injection").
import Papa from "papaparse";
import { formatCueNumber } from "./cue-number";
import { formatFadeTime, formatSplitTime } from "./fade-time";
import { formatChannels } from "./keyboard-entry";
import type { CueFields, CuePart } from "./types";

export type CueTableRow = CueFields & { runningTime: number; summary: string };

export const CUE_TABLE_COLUMNS = [
  "Cue",
  "Label",
  "Page",
  "Up (s)",
  "Down (s)",
  "Delay (s)",
  "Follow (s)",
  "Link",
  "Block",
  "Running time",
  "What changes",
  "Parts",
  "Call note",
] as const;

/** "part 2 (specials) 3/5 wait 1: ch 1-4, 9" for each part, separated by "; ". */
export function describeParts(parts: readonly CuePart[]): string {
  return parts
    .map(
      (p) =>
        `part ${p.part}${p.label ? ` (${p.label})` : ""} ${formatSplitTime(p.upTime, p.downTime)}${p.delay ? ` wait ${formatFadeTime(p.delay)}` : ""}: ch ${formatChannels(p.channels) || "none"}`,
    )
    .join("; ");
}

/** OWASP CSV injection: a cell starting with = + - @ tab or CR is prefixed with ' so no formula runs. */
export function neutralise(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

export function cueTableRows(rows: ReadonlyArray<CueTableRow>): Array<Array<string | number>> {
  return rows.map((r) => [
    formatCueNumber(r.number),
    neutralise(r.label),
    neutralise(r.page ?? ""),
    r.upTime,
    r.downTime ?? "",
    r.delay,
    r.follow ?? "",
    r.link == null ? "" : formatCueNumber(r.link),
    r.block ? "yes" : "",
    formatFadeTime(r.runningTime),
    r.summary,
    neutralise(describeParts(r.parts)),
    neutralise(r.callNote ?? ""),
  ]);
}

export function cuesToCsv(rows: ReadonlyArray<CueTableRow>): string {
  return Papa.unparse({ fields: [...CUE_TABLE_COLUMNS], data: cueTableRows(rows) }, { newline: "\r\n" });
}

// A change-log entry (one write: the row before and after) turned into the lines a person reads: one per
// field that changed, "who, when, field, before → after". Pure, so the panel and the tests share it.
import { sameValue } from "./diff";
import { cueFieldLabel, fixtureFieldLabel } from "./fields";
import type { SnapValue } from "./types";

export type LogEntry = {
  id: number;
  action: "create" | "update" | "delete";
  who: string | null;
  at: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
};
export type HistoryLine = {
  entryId: number;
  action: LogEntry["action"];
  who: string | null;
  at: string;
  field: string;
  label: string;
  before: SnapValue;
  after: SnapValue;
  /** The revision a restore took its values from. */
  restoredFrom: string | null;
};
export type HistoryEntity = "fixture" | "position" | "cue" | "fixtureType";

/** Bookkeeping every row carries; a change to it alone is not a change a person made. */
const BOOKKEEPING = new Set(["id", "productionId", "version", "updatedAt", "createdAt", "unitSort", "restoredFrom"]);

function labelFor(entity: HistoryEntity, field: string): string {
  if (entity === "fixture") return fixtureFieldLabel(field);
  if (entity === "cue") return cueFieldLabel(field);
  return field.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`).replace(/^./, (c) => c.toUpperCase());
}

/** Names for ids (a fixture's position, type, focus point), so a line reads "LX1 → LX2", not "3 → 5". */
export type IdNames = Partial<Record<string, Map<number, string>>>;

function shown(field: string, value: unknown, names: IdNames): SnapValue {
  const map = names[field];
  if (map && typeof value === "number") return map.get(value) ?? `#${value} (deleted)`;
  return (value ?? null) as SnapValue;
}

/** The lines of one entry: a field each; levels a channel each. Newest entries first is the caller's order. */
export function historyLines(entity: HistoryEntity, entry: LogEntry, names: IdNames = {}): HistoryLine[] {
  const before = entry.before ?? {};
  const after = entry.after ?? {};
  const restoredFrom = typeof after.restoredFrom === "string" ? after.restoredFrom : null;
  const base = { entryId: entry.id, action: entry.action, who: entry.who, at: entry.at, restoredFrom };
  if (entry.action !== "update") {
    // A create or delete is one line: the thing as it came or went is the rest of the history.
    const word = entry.action === "create" ? "created" : "deleted";
    return [{ ...base, field: "(row)", label: word, before: null, after: null }];
  }
  const lines: HistoryLine[] = [];
  for (const field of new Set([...Object.keys(before), ...Object.keys(after)])) {
    if (BOOKKEEPING.has(field)) continue;
    if (field === "levels" && entity === "cue") {
      const a = (before.levels ?? {}) as Record<string, number | null>;
      const b = (after.levels ?? {}) as Record<string, number | null>;
      for (const ch of new Set([...Object.keys(a), ...Object.keys(b)])) {
        if (sameValue(a[ch] ?? null, b[ch] ?? null)) continue;
        lines.push({
          ...base,
          field: `levels.${ch}`,
          label: `Channel ${ch} level`,
          before: a[ch] ?? null,
          after: b[ch] ?? null,
        });
      }
      continue;
    }
    if (sameValue(before[field] as SnapValue, after[field] as SnapValue)) continue;
    lines.push({
      ...base,
      field,
      label: labelFor(entity, field),
      before: shown(field, before[field], names),
      after: shown(field, after[field], names),
    });
  }
  return lines;
}

/** A value as a person reads it in the history and the change list. */
export function showValue(v: SnapValue | undefined): string {
  if (v === null || v === undefined || v === "") return "—";
  if (typeof v === "boolean") return v ? "yes" : "no";
  if (typeof v === "number") return String(Math.round(v * 1000) / 1000);
  if (typeof v === "string") return v;
  return JSON.stringify(v);
}

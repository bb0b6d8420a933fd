// The focus call's outbox: edits made on deck wait here (one entry per unit) until they can be sent.
// Pure rules only (merging, what the screen shows, the words for a conflict); storage and sending live in
// store.ts and outbox-context.tsx.
import type { FixtureDto, FixtureRecord } from "@/lib/dto/fixture";
import type { FocusPatch } from "@/hooks/use-focus";

export type { FocusPatch };

export type FocusField = keyof FocusPatch;

export type OutboxState = "waiting" | "sending" | "conflict" | "refused";

export type OutboxEntry = {
  productionId: number;
  fixtureId: number;
  /** Said to the user: "unit 3 on 1st Electric". */
  unitLabel: string;
  /** The row version the edits were made against: the server refuses them (409) if the row moved on. */
  baseVersion: number;
  patch: FocusPatch;
  queuedAt: string;
  state: OutboxState;
  /** The server's current row (the stored record) when it answered 409. */
  theirs?: FixtureRecord;
  /** The server's words when it refused the edit outright (403, 400, 404). */
  message?: string;
};

export const entryKey = (productionId: number, fixtureId: number) => `${productionId}:${fixtureId}`;

/**
 * Adds an edit to the unit's entry. Later edits of a field replace earlier ones, and the entry keeps the
 * version the first edit was made against: every edit made while waiting was made on that same row.
 */
export function mergeEdit(
  existing: OutboxEntry | undefined,
  edit: { productionId: number; fixtureId: number; unitLabel: string; version: number; patch: FocusPatch },
  now: Date,
): OutboxEntry {
  if (existing) return { ...existing, patch: { ...existing.patch, ...edit.patch } };
  return {
    productionId: edit.productionId,
    fixtureId: edit.fixtureId,
    unitLabel: edit.unitLabel,
    baseVersion: edit.version,
    patch: { ...edit.patch },
    queuedAt: now.toISOString(),
    state: "waiting",
  };
}

/**
 * The row as the screen should show it: the server's row with the waiting edits on top. A unit marked
 * focused on deck shows the time it was marked (the server stamps its own time when the edit arrives).
 */
export function withPending(f: FixtureDto, entry: OutboxEntry | undefined): FixtureDto {
  if (!entry || entry.state === "refused") return f;
  const shown: FixtureDto = { ...f, ...entry.patch } as FixtureDto;
  if (entry.patch.focused === true && !f.focused) {
    shown.focusedAt = entry.queuedAt;
    shown.focusedBy = null;
  }
  if (entry.patch.focused === false) {
    shown.focusedAt = null;
    shown.focusedBy = null;
  }
  return shown;
}

/** "Mine again": the same edits, now made against the row the other person left. */
export function resendAgainst(entry: OutboxEntry, theirs: Pick<FixtureRecord, "version">): OutboxEntry {
  return { ...entry, baseVersion: theirs.version, state: "waiting", theirs: undefined, message: undefined };
}

const FIELD_WORDS: Record<FocusField, string> = {
  focused: "Focused",
  focusNotes: "As-focused notes",
  notes: "Designer notes",
  goboRotationDeg: "Gobo rotation",
  barnDoorTop: "Barn door top",
  barnDoorBottom: "Barn door bottom",
  barnDoorLeft: "Barn door left",
  barnDoorRight: "Barn door right",
};

export function fieldWords(field: FocusField): string {
  return FIELD_WORDS[field];
}

export function valueWords(field: FocusField, value: unknown): string {
  if (value == null || value === "") return "(none)";
  if (field === "focused") return value ? "yes" : "no";
  if (field === "goboRotationDeg") return `${value}°`;
  return String(value);
}

/** One line per edited field: its name, what I sent and what the other person left ("theirs"). */
export function conflictRows(
  entry: OutboxEntry,
): Array<{ field: FocusField; label: string; mine: string; theirs: string }> {
  return (Object.keys(entry.patch) as FocusField[]).map((field) => ({
    field,
    label: fieldWords(field),
    mine: valueWords(field, entry.patch[field]),
    theirs: entry.theirs ? valueWords(field, entry.theirs[field]) : "(unknown)",
  }));
}

/** Short words for a waiting entry: "Focused, as-focused notes". */
export function patchSummary(patch: FocusPatch): string {
  const fields = Object.keys(patch) as FocusField[];
  const words = fields.map((f) =>
    f === "focused" ? (patch.focused ? "marked focused" : "focused undone") : fieldWords(f).toLowerCase(),
  );
  const text = words.join(", ");
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/**
 * How a failed send is handled: a network failure (or a server that is down or restarting) waits and tries
 * again; a 409 is a conflict for the person to settle; any other refusal is shown and never retried.
 */
export function classifyFailure(err: unknown): "retry" | "conflict" | "refused" {
  const status = (err as { status?: unknown })?.status;
  if (typeof status !== "number") return "retry";
  if (status === 409) return "conflict";
  if (status >= 500 || status === 408 || status === 429) return "retry";
  return "refused";
}

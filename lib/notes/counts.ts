// Open-note counts per thing a note can be about: the badges on the plot, the rig, the focus charts and the
// cue list all read one answer of this shape, keyed so a row finds its count without a search.
import type { NoteSubject } from "@/models/note-vocabulary";

/** Notes not yet finished with (open or in progress) on one thing; `high` of them are high priority. */
export type NoteCount = { open: number; high: number };
/** Keyed by `noteTargetKey` ("fixture:7", "production:"). */
export type NoteCounts = Record<string, NoteCount>;

export function noteTargetKey(subject: NoteSubject, subjectId: number | null): string {
  return `${subject}:${subject === "production" ? "" : (subjectId ?? "")}`;
}

const NONE: NoteCount = Object.freeze({ open: 0, high: 0 });

export function countFor(counts: NoteCounts | undefined, subject: NoteSubject, subjectId: number | null): NoteCount {
  return counts?.[noteTargetKey(subject, subjectId)] ?? NONE;
}

/** "3 open notes on unit 7, 1st Electric" / "No open notes on cue 12" — the badge's accessible name. */
export function noteCountLabel(count: NoteCount, target: string): string {
  if (count.open === 0) return `No open notes on ${target}`;
  const high = count.high ? ` (${count.high} high priority)` : "";
  return `${count.open} open note${count.open === 1 ? "" : "s"}${high} on ${target}`;
}

// Throwline's own short lists for notes; the notes table's enums are built from them.

/** What a note is about. */
export const NOTE_SUBJECTS = ["production", "position", "fixture", "cue", "focus_point"] as const;
export type NoteSubject = (typeof NOTE_SUBJECTS)[number];

/** What kind of job it is: who may close it follows from this (lib/auth/policy.ts). */
export const NOTE_KINDS = ["work", "focus", "cue", "paperwork", "general"] as const;
export type NoteKind = (typeof NOTE_KINDS)[number];

export const NOTE_PRIORITIES = ["low", "normal", "high"] as const;
export type NotePriority = (typeof NOTE_PRIORITIES)[number];

export const NOTE_STATUSES = ["open", "in_progress", "done", "cannot_do"] as const;
export type NoteStatus = (typeof NOTE_STATUSES)[number];
/** A note in one of these is finished with; reaching or leaving them is "closing" and "reopening". */
export const CLOSED_STATUSES: readonly NoteStatus[] = ["done", "cannot_do"];

/** What the job needs before it can be done. */
export const NOTE_NEEDS = ["access", "dark", "designer", "isolated"] as const;
export type NoteNeed = (typeof NOTE_NEEDS)[number];

/** Where a note came from. */
export const NOTE_ORIGINS = ["written", "channel_check", "show_report", "spot"] as const;
export type NoteOrigin = (typeof NOTE_ORIGINS)[number];

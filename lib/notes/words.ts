// The words the screens use for the notes vocabulary (models/note-vocabulary.ts holds the values).
import type { NoteKind, NoteNeed, NotePriority, NoteStatus, NoteSubject } from "@/models/note-vocabulary";

export const KIND_LABELS: Record<NoteKind, string> = {
  work: "Work",
  focus: "Focus",
  cue: "Cue",
  paperwork: "Paperwork",
  general: "General",
};

export const STATUS_LABELS: Record<NoteStatus, string> = {
  open: "Open",
  in_progress: "In progress",
  done: "Done",
  cannot_do: "Cannot do",
};

export const PRIORITY_LABELS: Record<NotePriority, string> = { low: "Low", normal: "Normal", high: "High" };

export const NEED_LABELS: Record<NoteNeed, string> = {
  access: "Lift or ladder",
  dark: "Dark stage",
  designer: "Designer present",
  isolated: "Power isolated",
};

export const SUBJECT_LABELS: Record<NoteSubject, string> = {
  production: "Production",
  position: "Position",
  fixture: "Fixture",
  cue: "Cue",
  focus_point: "Focus point",
};

// Names for what a note is about, from the few lists the notes screens load once.
import type { NoteSubject } from "@/models/note-vocabulary";
import { SUBJECT_LABELS } from "./words";

export type SubjectOption = { id: number; label: string };
export type NoteSubjects = {
  people: Array<{ userId: number; name: string }>;
  position: SubjectOption[];
  fixture: SubjectOption[];
  cue: SubjectOption[];
  focus_point: SubjectOption[];
};

/** "Fixture: FOH 1 unit 3 (ch 12)", "Production", or the kind and id when the thing has gone. */
export function subjectLabel(subject: NoteSubject, subjectId: number | null, lists: NoteSubjects): string {
  if (subject === "production" || subjectId == null) return SUBJECT_LABELS.production;
  const found = lists[subject].find((o) => o.id === subjectId);
  return `${SUBJECT_LABELS[subject]}: ${found ? found.label : `#${subjectId} (removed)`}`;
}

export function personName(userId: number | null, lists: Pick<NoteSubjects, "people">): string {
  if (userId == null) return "";
  return lists.people.find((p) => p.userId === userId)?.name ?? `member #${userId}`;
}

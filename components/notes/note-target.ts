import type { NoteSubject } from "@/models/note-vocabulary";

/** The thing a notes button and its dialog are about. */
export type NoteTarget = {
  subject: Exclude<NoteSubject, "production">;
  subjectId: number;
  /** How a person names it: "unit 7, 1st Electric", "cue 12", "position 1st Electric". */
  label: string;
};

// What a note looks like outside the server: the same shape for the notes page, the work call and the API.
import type { NoteKind, NoteNeed, NoteOrigin, NotePriority, NoteStatus, NoteSubject } from "@/models/note-vocabulary";

export type NoteDto = {
  id: number;
  productionId: number;
  subject: NoteSubject;
  subjectId: number | null;
  body: string;
  kind: NoteKind;
  priority: NotePriority;
  ownerId: number | null;
  status: NoteStatus;
  needs: NoteNeed[];
  dueDate: string | null;
  dueSession: string | null;
  authorId: number;
  runningCueId: number | null;
  runningCueNumber: string | null;
  origin: NoteOrigin;
  showReportId: number | null;
  closedBy: number | null;
  closedAt: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
};

/** The production's current cue, which new notes pick up. */
export type CurrentCueDto = { cueId: number | null; number: string | null; label: string | null };

export type ShowReportFaultDto = {
  id: number;
  fixtureId: number | null;
  kind: "lamp_out" | "fault";
  description: string;
};
/** A lighting item of a report: kept while the report is a draft, a note once it is sent. */
export type ShowReportItemDto = {
  id: number;
  body: string;
  kind: NoteKind;
  subject: NoteSubject;
  subjectId: number | null;
  priority: NotePriority | null;
  ownerId: number | null;
};
/**
 * A show report with its fault log and items. A draft (sentAt null) is the stage manager's to edit; once sent
 * its items and logged faults are notes (noteIds) and the report is read-only.
 */
export type ShowReportDto = {
  id: number;
  performance: string;
  performedOn: string;
  summary: string;
  authorId: number;
  status: "draft" | "sent";
  sentAt: string | null;
  sentBy: number | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  faults: ShowReportFaultDto[];
  items: ShowReportItemDto[];
  noteIds: number[];
};

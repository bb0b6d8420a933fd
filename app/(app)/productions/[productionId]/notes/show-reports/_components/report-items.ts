// A show report's lighting items between the form and the API: the form picks a unit or none; an item loaded
// from a draft keeps its subject, priority and owner unless the unit is changed.
import type { ShowReportItemDto } from "@/lib/notes/dto";
import type { NoteKind, NotePriority, NoteSubject } from "@/models/note-vocabulary";

export type Item = {
  body: string;
  kind: NoteKind;
  fixtureId: string;
  subject?: NoteSubject;
  subjectId?: number | null;
  priority?: NotePriority | null;
  ownerId?: number | null;
};

export function itemForServer(i: Item) {
  const subject: NoteSubject = i.fixtureId ? "fixture" : (i.subject ?? "production");
  const subjectId = i.fixtureId
    ? Number(i.fixtureId)
    : subject === "production"
      ? undefined
      : (i.subjectId ?? undefined);
  return {
    body: i.body,
    kind: i.kind,
    subject,
    ...(subjectId !== undefined ? { subjectId } : {}),
    ...(i.priority ? { priority: i.priority } : {}),
    ...(i.ownerId != null ? { ownerId: i.ownerId } : {}),
  };
}

export function itemFromServer(i: ShowReportItemDto): Item {
  return {
    body: i.body,
    kind: i.kind,
    fixtureId: i.subject === "fixture" && i.subjectId != null ? String(i.subjectId) : "",
    subject: i.subject,
    subjectId: i.subjectId,
    priority: i.priority,
    ownerId: i.ownerId,
  };
}

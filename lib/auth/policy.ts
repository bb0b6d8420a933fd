// The role table of the design, in one place. Every route handler, server action and screen asks
// here; nothing else decides who may do what.
import type { Role } from "./roles";
import type { Permission } from "./permissions";
import { FIXTURE_FIELDS } from "@/lib/rig/fixture-fields";
import type { NoteKind } from "@/models/note-vocabulary";

export type Member = { role: Role; isOwner: boolean };

export { PERMISSIONS, type Permission } from "./permissions";

const TABLE: Record<Role, ReadonlySet<Permission>> = {
  designer: new Set<Permission>([
    "production.view",
    "settings.edit",
    "plot.edit",
    "rig.editElectrics",
    "rig.import",
    "rig.export",
    "cues.edit",
    "cues.editCallNotes",
    "studies.view",
    "studies.run",
    "revisions.issue",
    "notes.write",
    "notes.setCurrentCue",
    "notes.closeWork",
    "notes.closeFocus",
    "notes.closeCue",
    "notes.closePaperwork",
    "notes.closeGeneral",
  ]),
  // The crew does the work and focus jobs and keeps the paperwork; the board operator is crew.
  electrician: new Set<Permission>([
    "production.view",
    "rig.editElectrics",
    "rig.import",
    "rig.export",
    "studies.view",
    "studies.run",
    "revisions.issue",
    "notes.write",
    "notes.setCurrentCue",
    "notes.closeWork",
    "notes.closeFocus",
    "notes.closePaperwork",
    "notes.closeGeneral",
  ]),
  // The stage manager writes the show report and keeps the current cue; a cue, focus or work note is
  // closed by the people who change the show, not by the one who noticed it.
  stage_manager: new Set<Permission>([
    "production.view",
    "rig.export",
    "cues.editCallNotes",
    "studies.view",
    "notes.write",
    "notes.setCurrentCue",
    "notes.closeGeneral",
    "notes.fileShowReport",
  ]),
  viewer: new Set<Permission>(["production.view", "rig.export", "studies.view", "notes.write"]),
};

/** The production's owner holds these whatever their role: the team, and archiving or deleting the production. */
const OWNER_ONLY: ReadonlySet<Permission> = new Set(["team.manage", "production.archive", "production.delete"]);

export function can(member: Member | null | undefined, permission: Permission): boolean {
  if (!member) return false;
  if (OWNER_ONLY.has(permission)) return member.isOwner;
  return TABLE[member.role].has(permission);
}

/** The right that closes (or reopens) a note of each kind. */
const NOTE_CLOSE_RIGHT: Record<NoteKind, Permission> = {
  work: "notes.closeWork",
  focus: "notes.closeFocus",
  cue: "notes.closeCue",
  paperwork: "notes.closePaperwork",
  general: "notes.closeGeneral",
};

/** Whether this member may mark a note of this kind done or cannot-do, or reopen it. */
export function canCloseNote(member: Member | null | undefined, kind: NoteKind): boolean {
  return can(member, NOTE_CLOSE_RIGHT[kind]);
}

/** The kinds of note this member may close (for the screens' buttons). */
export function closableNoteKinds(member: Member | null | undefined): NoteKind[] {
  return (Object.keys(NOTE_CLOSE_RIGHT) as NoteKind[]).filter((k) => canCloseNote(member, k));
}

// Field-level rules. A field not listed here cannot be written through the API at all. A fixture's
// fields and the right each needs come from the field registry (lib/rig/fixture-fields.ts).
const FIXTURE_FIELD_RIGHTS: ReadonlyMap<string, Permission> = new Map(FIXTURE_FIELDS.map((f) => [f.attribute, f.edit]));

const FIXTURE_TYPE_FIELDS: Record<string, Permission> = {
  wattage: "rig.editElectrics",
  weightKg: "rig.editElectrics",
  dmxModes: "rig.editElectrics",
  loadKind: "rig.editElectrics",
};

const CUE_FIELDS: Record<string, Permission> = {
  page: "cues.editCallNotes",
  callNote: "cues.editCallNotes",
};

export type Entity = "fixture" | "fixtureType" | "cue";

/** The permission a field of an entity needs. Fields not named fall back to the entity's main edit right. */
export function permissionForField(entity: Entity, field: string): Permission | null {
  switch (entity) {
    case "fixture":
      return FIXTURE_FIELD_RIGHTS.get(field) ?? null;
    case "fixtureType":
      return FIXTURE_TYPE_FIELDS[field] ?? "plot.edit";
    case "cue":
      return CUE_FIELDS[field] ?? "cues.edit";
  }
}

/** The fields of `fields` that this member may not write (empty when all are allowed). */
export function forbiddenFields(member: Member | null | undefined, entity: Entity, fields: string[]): string[] {
  return fields.filter((f) => {
    const p = permissionForField(entity, f);
    return p === null || !can(member, p);
  });
}

/** Whether this member may write at least one field of the entity (a member who may write none is refused before the body is read). */
export function canEditAnyField(member: Member | null | undefined, entity: Entity): boolean {
  const rights: Record<Entity, Permission[]> = {
    fixture: [...FIXTURE_FIELD_RIGHTS.values()],
    fixtureType: ["plot.edit", ...Object.values(FIXTURE_TYPE_FIELDS)],
    cue: ["cues.edit", ...Object.values(CUE_FIELDS)],
  };
  return rights[entity].some((p) => can(member, p));
}

export function canEditField(member: Member | null | undefined, entity: Entity, field: string): boolean {
  return forbiddenFields(member, entity, [field]).length === 0;
}

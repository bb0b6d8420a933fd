// The role table of the design, in one place. Every route handler, server action and screen asks
// here; nothing else decides who may do what.
import type { Role } from "./roles";

export type Member = { role: Role; isOwner: boolean };

export const PERMISSIONS = [
  "production.view",
  "settings.edit",
  "plot.edit", // positions, focus points, acting areas, the designer's fixture fields
  "rig.editElectrics", // circuit, dimmer, DMX, accessories, type swaps, hung/focused, as-focused notes
  "rig.import",
  "rig.export",
  "cues.edit", // numbers, levels, times, follows, labels
  "cues.editCallNotes", // page and call note
  "studies.view",
  "studies.run", // studies and checks
  "revisions.issue", // issue a revision, e-mail the team
  "team.manage",
] as const;
export type Permission = (typeof PERMISSIONS)[number];

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
  ]),
  electrician: new Set<Permission>([
    "production.view",
    "rig.editElectrics",
    "rig.import",
    "rig.export",
    "studies.view",
    "studies.run",
    "revisions.issue",
  ]),
  stage_manager: new Set<Permission>(["production.view", "rig.export", "cues.editCallNotes", "studies.view"]),
  viewer: new Set<Permission>(["production.view", "rig.export", "studies.view"]),
};

/** Team management belongs to the production's owner, whatever their role. */
export function can(member: Member | null | undefined, permission: Permission): boolean {
  if (!member) return false;
  if (permission === "team.manage") return member.isOwner;
  return TABLE[member.role].has(permission);
}

// Field-level rules. A field not listed here cannot be written through the API at all.
const FIXTURE_FIELDS: Record<string, Permission> = {
  positionId: "plot.edit",
  unitNumber: "plot.edit",
  channel: "plot.edit",
  colour: "plot.edit",
  gobo: "plot.edit",
  purpose: "plot.edit",
  x: "plot.edit",
  y: "plot.edit",
  lensHeight: "plot.edit",
  focusX: "plot.edit",
  focusY: "plot.edit",
  focusPointId: "plot.edit",
  aim: "plot.edit",
  coneDeg: "plot.edit",
  softnessDeg: "plot.edit",
  shutterCuts: "plot.edit",
  irisPercent: "plot.edit",
  notes: "plot.edit",
  bodyKey: "plot.edit",
  cell: "plot.edit",
  circuit: "rig.editElectrics",
  dimmer: "rig.editElectrics",
  universe: "rig.editElectrics",
  address: "rig.editElectrics",
  dmxMode: "rig.editElectrics",
  footprint: "rig.editElectrics",
  fixtureTypeId: "rig.editElectrics", // a swap of type; recorded in the change log
  hung: "rig.editElectrics",
  focused: "rig.editElectrics",
  focusNotes: "rig.editElectrics",
  // Issue 6: the designer chooses the gobo's orientation; the crew records the barn doors as focused and
  // takes the focus photo on the deck (the designer holds the electrics right too).
  goboRotationDeg: "plot.edit",
  barnDoorTop: "rig.editElectrics",
  barnDoorBottom: "rig.editElectrics",
  barnDoorLeft: "rig.editElectrics",
  barnDoorRight: "rig.editElectrics",
  focusPhotoUploadId: "rig.editElectrics",
};

const FIXTURE_TYPE_FIELDS: Record<string, Permission> = {
  wattage: "rig.editElectrics",
  weightKg: "rig.editElectrics",
  dmxModes: "rig.editElectrics",
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
      return FIXTURE_FIELDS[field] ?? null;
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

export function canEditField(member: Member | null | undefined, entity: Entity, field: string): boolean {
  return forbiddenFields(member, entity, [field]).length === 0;
}

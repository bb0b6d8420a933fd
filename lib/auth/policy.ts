// The role table of the design, in one place. Every route handler, server action and screen asks
// here; nothing else decides who may do what.
import type { Role } from "./roles";
import type { Permission } from "./permissions";
import { FIXTURE_FIELDS } from "@/lib/rig/fixture-fields";

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

// Field-level rules. A field not listed here cannot be written through the API at all. A fixture's
// fields and the right each needs come from the field registry (lib/rig/fixture-fields.ts).
const FIXTURE_FIELD_RIGHTS: ReadonlyMap<string, Permission> = new Map(FIXTURE_FIELDS.map((f) => [f.attribute, f.edit]));

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

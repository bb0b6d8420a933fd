import { describe, expect, it } from "vitest";
import {
  can,
  canCloseNote,
  canEditField,
  closableNoteKinds,
  forbiddenFields,
  PERMISSIONS,
  type Member,
  type Permission,
} from "@/lib/auth/policy";
import { NOTE_KINDS, type NoteKind } from "@/models/note-vocabulary";
import { ROLES, type Role } from "@/lib/auth/roles";

// The role table of shared/DESIGN.md ("Roles"), written out here independently of lib/auth/policy.ts
// so that a change to either one is caught. Y = allowed.
const EXPECTED: Record<Permission, Record<Role, boolean>> = {
  "production.view": { designer: true, electrician: true, stage_manager: true, viewer: true },
  "settings.edit": { designer: true, electrician: false, stage_manager: false, viewer: false },
  "plot.edit": { designer: true, electrician: false, stage_manager: false, viewer: false },
  "rig.editElectrics": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "rig.import": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "rig.export": { designer: true, electrician: true, stage_manager: true, viewer: true },
  "cues.edit": { designer: true, electrician: false, stage_manager: false, viewer: false },
  "cues.editCallNotes": { designer: true, electrician: false, stage_manager: true, viewer: false },
  "studies.view": { designer: true, electrician: true, stage_manager: true, viewer: true },
  "studies.run": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "revisions.issue": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "team.manage": { designer: false, electrician: false, stage_manager: false, viewer: false },
  // Archiving and deleting a production: its owner's alone (issue "starting out": the owner archives and deletes).
  "production.archive": { designer: false, electrician: false, stage_manager: false, viewer: false },
  "production.delete": { designer: false, electrician: false, stage_manager: false, viewer: false },
  // Notes: any member writes; closing follows who changes that part of the show (DESIGN.md's table:
  // the rig and focus are the designer's and the crew's, cues the designer's, the stage manager calls).
  "notes.write": { designer: true, electrician: true, stage_manager: true, viewer: true },
  "notes.setCurrentCue": { designer: true, electrician: true, stage_manager: true, viewer: false },
  "notes.closeWork": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "notes.closeFocus": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "notes.closeCue": { designer: true, electrician: false, stage_manager: false, viewer: false },
  "notes.closePaperwork": { designer: true, electrician: true, stage_manager: false, viewer: false },
  "notes.closeGeneral": { designer: true, electrician: true, stage_manager: true, viewer: false },
  "notes.fileShowReport": { designer: false, electrician: false, stage_manager: true, viewer: false },
};

describe("role table (DESIGN.md, Roles)", () => {
  for (const permission of PERMISSIONS) {
    for (const role of ROLES) {
      it(`${role} ${EXPECTED[permission][role] ? "may" : "may not"} ${permission}`, () => {
        expect(can({ role, isOwner: false }, permission)).toBe(EXPECTED[permission][role]);
      });
    }
  }

  it("team management belongs to the owner whatever the role", () => {
    for (const role of ROLES) expect(can({ role, isOwner: true }, "team.manage")).toBe(true);
  });

  it("archiving and deleting a production belong to the owner whatever the role", () => {
    for (const role of ROLES)
      for (const p of ["production.archive", "production.delete"] as const) {
        expect(can({ role, isOwner: true }, p)).toBe(true);
        expect(can({ role, isOwner: false }, p)).toBe(false);
      }
  });

  it("a non-member can do nothing", () => {
    for (const permission of PERMISSIONS) expect(can(null, permission)).toBe(false);
  });
});

describe("field-level rules for fixtures", () => {
  const designer: Member = { role: "designer", isOwner: false };
  const electrician: Member = { role: "electrician", isOwner: false };
  const stageManager: Member = { role: "stage_manager", isOwner: false };
  const designerFields = [
    "channel",
    "colour",
    "purpose",
    "focusX",
    "focusY",
    "focusPointId",
    "coneDeg",
    "softnessDeg",
    "shutterCuts",
    "x",
    "y",
    "positionId",
  ];
  const electricsFields = [
    "circuit",
    "dimmer",
    "universe",
    "address",
    "dmxMode",
    "fixtureTypeId",
    "hung",
    "focused",
    "focusNotes",
  ];

  it("the designer edits both groups", () => {
    expect(forbiddenFields(designer, "fixture", [...designerFields, ...electricsFields])).toEqual([]);
  });
  it("the electrician edits electrics, hang and focus status but not the design", () => {
    expect(forbiddenFields(electrician, "fixture", electricsFields)).toEqual([]);
    expect(forbiddenFields(electrician, "fixture", designerFields)).toEqual(designerFields);
  });
  it("the stage manager and viewer edit no fixture field", () => {
    for (const m of [stageManager, { role: "viewer", isOwner: true } as Member]) {
      expect(forbiddenFields(m, "fixture", [...designerFields, ...electricsFields])).toHaveLength(
        designerFields.length + electricsFields.length,
      );
    }
  });
  // The gobo's orientation is part of the design (like the gobo); barn doors as focused and the
  // focus photo are the crew's record of the focus call (like the as-focused notes).
  it("gobo rotation is the designer's; barn doors and the focus photo are the crew's and the designer's", () => {
    const crew = ["barnDoorTop", "barnDoorBottom", "barnDoorLeft", "barnDoorRight", "focusPhotoUploadId"];
    expect(forbiddenFields(designer, "fixture", ["goboRotationDeg", ...crew])).toEqual([]);
    expect(forbiddenFields(electrician, "fixture", ["goboRotationDeg", ...crew])).toEqual(["goboRotationDeg"]);
    for (const m of [stageManager, { role: "viewer", isOwner: true } as Member]) {
      expect(forbiddenFields(m, "fixture", ["goboRotationDeg", ...crew])).toEqual(["goboRotationDeg", ...crew]);
    }
  });
  it("an unknown field is refused for everyone", () => {
    expect(canEditField(designer, "fixture", "productionId")).toBe(false);
    expect(canEditField(designer, "fixture", "version")).toBe(false);
  });
});

describe("field-level rules for cues and types", () => {
  it("the stage manager edits page and call note only", () => {
    const sm: Member = { role: "stage_manager", isOwner: false };
    expect(forbiddenFields(sm, "cue", ["page", "callNote"])).toEqual([]);
    expect(forbiddenFields(sm, "cue", ["number", "upTime", "label", "follow"])).toEqual([
      "number",
      "upTime",
      "label",
      "follow",
    ]);
  });
  it("the electrician edits a type's wattage and weight but not its optics", () => {
    const el: Member = { role: "electrician", isOwner: false };
    expect(forbiddenFields(el, "fixtureType", ["wattage", "weightKg"])).toEqual([]);
    expect(forbiddenFields(el, "fixtureType", ["coneMaxDeg", "peakCandela"])).toEqual(["coneMaxDeg", "peakCandela"]);
  });
});

// Who closes which kind of note, walked over every role and kind (written out by hand, not read from the policy).
describe("closing notes by kind", () => {
  const CLOSERS: Record<NoteKind, Role[]> = {
    work: ["designer", "electrician"],
    focus: ["designer", "electrician"],
    cue: ["designer"],
    paperwork: ["designer", "electrician"],
    general: ["designer", "electrician", "stage_manager"],
  };
  for (const kind of NOTE_KINDS) {
    for (const role of ROLES) {
      const allowed = CLOSERS[kind].includes(role);
      it(`${role} ${allowed ? "may" : "may not"} close a ${kind} note`, () => {
        expect(canCloseNote({ role, isOwner: false }, kind)).toBe(allowed);
        expect(closableNoteKinds({ role, isOwner: true }).includes(kind)).toBe(allowed);
      });
    }
  }
  it("a non-member closes nothing", () => {
    expect(closableNoteKinds(null)).toEqual([]);
  });
});

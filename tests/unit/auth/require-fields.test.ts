// Field-level 403s (lib/auth/guards.ts requireFields) against the role table of shared/DESIGN.md,
// "Roles", written out here rather than read from lib/auth/policy.ts.
import { describe, expect, it } from "vitest";
import { requireFields, requireSomeField } from "@/lib/auth/guards";
import { AppError } from "@/lib/errors";
import type { Member } from "@/lib/auth/policy";

const designer: Member = { role: "designer", isOwner: false };
const electrician: Member = { role: "electrician", isOwner: false };
const stageManager: Member = { role: "stage_manager", isOwner: false };
const viewer: Member = { role: "viewer", isOwner: false };

function refusal(fn: () => void): AppError | null {
  try {
    fn();
    return null;
  } catch (err) {
    if (err instanceof AppError) return err;
    throw err;
  }
}

describe("requireFields", () => {
  it("lets a write through when every field is the member's to write", () => {
    // DESIGN.md Roles: colour and channel are the designer's; circuit and address the electrician's too.
    expect(
      refusal(() =>
        requireFields(designer, "fixture", { version: 3, colour: "pale lavender", channel: 12, circuit: "A7" }),
      ),
    ).toBeNull();
    expect(
      refusal(() => requireFields(electrician, "fixture", { version: 3, circuit: "A7", address: 101 })),
    ).toBeNull();
    // DESIGN.md Roles: the stage manager edits page and call note.
    expect(
      refusal(() => requireFields(stageManager, "cue", { version: 1, page: "12", callNote: "after the door slam" })),
    ).toBeNull();
  });

  it("refuses with 403 and a fieldErrors entry for each refused field only", () => {
    // DESIGN.md Roles: colour and channel are "view" for the electrician; address is "edit".
    const err = refusal(() =>
      requireFields(electrician, "fixture", { version: 3, colour: "full CTB", channel: 4, address: 12 }),
    );
    expect(err?.status).toBe(403);
    expect(err?.details.fieldErrors).toEqual({
      colour: ["not editable by your role"],
      channel: ["not editable by your role"],
    });
    expect(err?.message).toBe("Your role cannot change: colour, channel.");
  });

  it("never treats the version as a field", () => {
    expect(refusal(() => requireFields(viewer, "fixture", { version: 9 }))).toBeNull();
  });

  it("takes a list of field names as well as a patch", () => {
    // DESIGN.md Roles: cue levels and times are "view" for the stage manager.
    const err = refusal(() => requireFields(stageManager, "cue", ["levels", "page"]));
    expect(Object.keys(err?.details.fieldErrors ?? {})).toEqual(["levels"]);
  });

  it("fixture types: the electrician writes wattage and weight but not the name; the viewer writes neither", () => {
    // DESIGN.md Roles: "types' wattage/weight" edit for designer and electrician.
    expect(
      refusal(() => requireFields(electrician, "fixtureType", { version: 1, wattage: 750, weightKg: 8 })),
    ).toBeNull();
    const err = refusal(() =>
      requireFields(electrician, "fixtureType", { version: 1, name: "Profile 19", wattage: 750 }),
    );
    expect(err?.details.fieldErrors).toEqual({ name: ["not editable by your role"] });
    expect(refusal(() => requireFields(viewer, "fixtureType", { version: 1, weightKg: 8 }))?.status).toBe(403);
  });

  it("refuses a field the role table does not know, for everyone", () => {
    const err = refusal(() => requireFields(designer, "fixture", { version: 1, productionId: 2 }));
    expect(err?.details.fieldErrors).toEqual({ productionId: ["not editable by your role"] });
  });

  it("keeps the fieldErrors when a plainer message is given", () => {
    const err = refusal(() =>
      requireFields(viewer, "fixture", ["focusPhotoUploadId"], "Your role cannot change a focus photo."),
    );
    expect(err?.message).toBe("Your role cannot change a focus photo.");
    expect(err?.details.fieldErrors).toEqual({ focusPhotoUploadId: ["not editable by your role"] });
  });
});

describe("requireSomeField", () => {
  // DESIGN.md Roles, by entity: who has at least one "edit" cell.
  const cases: Array<[Member, "fixture" | "fixtureType" | "cue", boolean]> = [
    [designer, "fixture", true],
    [designer, "fixtureType", true],
    [designer, "cue", true],
    [electrician, "fixture", true], // circuit, dimmer, address …
    [electrician, "fixtureType", true], // wattage and weight
    [electrician, "cue", false],
    [stageManager, "fixture", false],
    [stageManager, "fixtureType", false],
    [stageManager, "cue", true], // page and call note
    [viewer, "fixture", false],
    [viewer, "fixtureType", false],
    [viewer, "cue", false],
  ];
  it.each(cases)("%o on %s: %s", (member, entity, allowed) => {
    const err = refusal(() => requireSomeField(member, entity));
    expect(err === null).toBe(allowed);
    if (err) expect(err.status).toBe(403);
  });

  it("names what the body tried to write, before the body is checked", () => {
    // DESIGN.md Roles: the viewer edits nothing.
    const err = refusal(() => requireSomeField(viewer, "cue", { version: "x", page: 4, levels: "loud" }));
    expect(err?.details.fieldErrors).toEqual({
      page: ["not editable by your role"],
      levels: ["not editable by your role"],
    });
    expect(refusal(() => requireSomeField(viewer, "cue", { version: 3 }))?.details.fieldErrors).toBeUndefined();
    expect(refusal(() => requireSomeField(viewer, "cue", "not an object"))?.status).toBe(403);
  });
});

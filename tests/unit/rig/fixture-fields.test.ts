// The fixture field registry against the model it describes, and every list derived from it.
import { describe, expect, it } from "vitest";
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import { Fixture, initFixture } from "@/models/fixture";
import {
  emptyFixture,
  FIXTURE_FIELDS,
  FIXTURE_SYSTEM_ATTRIBUTES,
  attributeOf,
  copyOfFixture,
  keyOfAttribute,
} from "@/lib/rig/fixture-fields";
import { IMPORT_FIELDS, suggestMapping } from "@/lib/io/fields";
import { RIG_COLUMNS, headerWithUnit } from "@/lib/rig/columns";
import { permissionForField } from "@/lib/auth/policy";
import { fixtureCreateSchema, fixtureFieldsSchema } from "@/lib/validation/fixture";

// No connection is made: the model is only initialised so its attribute list can be read.
const sequelize = new Sequelize({ dialect: "mariadb", dialectModule: mariadb, logging: false });
initFixture(sequelize);
type Attribute = { allowNull?: boolean; defaultValue?: unknown; type: { key?: string; options?: { length?: number } } };
const MODEL = Fixture.getAttributes() as unknown as Record<string, Attribute>;
const registry = new Map(FIXTURE_FIELDS.map((f) => [f.attribute as string, f]));
const system = new Set(Object.keys(FIXTURE_SYSTEM_ATTRIBUTES));

describe("fixture field registry and the Fixture model", () => {
  it("every model attribute has a registry entry (or is a named system attribute)", () => {
    const missing = Object.keys(MODEL).filter((a) => !registry.has(a) && !system.has(a));
    expect(missing, `add these to lib/rig/fixture-fields.ts: ${missing.join(", ")}`).toEqual([]);
  });

  it("every registry field and system attribute is stored by the model", () => {
    const notStored = [...registry.keys(), ...system].filter((a) => !(a in MODEL));
    expect(notStored, `the model (and a migration) lacks: ${notStored.join(", ")}`).toEqual([]);
  });

  it("attributes and keys are unique", () => {
    expect(new Set(FIXTURE_FIELDS.map((f) => f.attribute)).size).toBe(FIXTURE_FIELDS.length);
    expect(new Set(FIXTURE_FIELDS.map((f) => f.key)).size).toBe(FIXTURE_FIELDS.length);
  });

  it("a field with no default is NOT NULL in the model; a null default is nullable; other defaults match the column's", () => {
    for (const f of FIXTURE_FIELDS) {
      const column = MODEL[f.attribute];
      if (!("default" in f)) expect(column.allowNull, `${f.attribute} must be given, so NOT NULL`).toBe(false);
      else if (f.default === null) expect(column.allowNull, `${f.attribute} defaults to empty`).not.toBe(false);
      else expect(column.defaultValue, `${f.attribute}'s default`).toBe(f.default);
    }
  });

  it("text the API accepts fits its column", () => {
    const shape = fixtureFieldsSchema.shape as unknown as Record<
      string,
      { maxLength?: number | null; unwrap?: () => { maxLength?: number | null } }
    >;
    for (const [attribute, schema] of Object.entries(shape)) {
      const length = MODEL[attribute].type.options?.length;
      if (MODEL[attribute].type.key !== "STRING" || !length) continue;
      const max = schema.maxLength ?? schema.unwrap?.().maxLength ?? null;
      if (max != null)
        expect(max, `${attribute} accepts ${max} characters into STRING(${length})`).toBeLessThanOrEqual(length);
      // Brute force as well: one character over the column's length is refused.
      expect(fixtureFieldsSchema.partial().safeParse({ [attribute]: "1".repeat(length + 1) }).success, attribute).toBe(
        false,
      );
    }
  });
});

describe("lists derived from the registry", () => {
  it("import fields are the registry's fields that have a column, in its order", () => {
    expect(IMPORT_FIELDS.map((f) => f.key)).toEqual(FIXTURE_FIELDS.filter((f) => f.width !== null).map((f) => f.key));
  });

  it("the rig's stored columns come first, in registry order; computed columns follow and are never read back", () => {
    const stored = RIG_COLUMNS.filter((c) => c.importKey);
    expect(stored.map((c) => c.id)).toEqual(IMPORT_FIELDS.map((f) => f.key));
    expect(RIG_COLUMNS.slice(0, stored.length)).toEqual(stored);
    for (const c of stored) expect(c.attribute).toBe(attributeOf(c.id));
  });

  it("an exported file's headers (with units) map back to the same fields, computed ones to ignore", () => {
    for (const units of ["metric", "imperial"] as const) {
      const headers = RIG_COLUMNS.map((c) => headerWithUnit(c, units));
      expect(suggestMapping(headers)).toEqual(RIG_COLUMNS.map((c) => c.importKey ?? "ignore"));
    }
  });

  it("the API schema holds exactly the fields with a check; the focus photo is written only through its own route", () => {
    const withCheck = FIXTURE_FIELDS.filter((f) => "schema" in f).map((f) => f.attribute);
    expect(Object.keys(fixtureFieldsSchema.shape).sort()).toEqual([...withCheck].sort());
    expect(withCheck).not.toContain("focusPhotoUploadId");
  });

  it("keys and attributes translate both ways", () => {
    expect(attributeOf("position")).toBe("positionId");
    expect(attributeOf("type")).toBe("fixtureTypeId");
    expect(attributeOf("focusPoint")).toBe("focusPointId");
    expect(attributeOf("colour")).toBe("colour");
    for (const f of FIXTURE_FIELDS) expect(keyOfAttribute(f.attribute)).toBe(f.key);
  });
});

// shared/DESIGN.md, "Roles": the electrics row (circuit, dimmer, universe, address, mode, a swap of type,
// hung/focused status, as-focused notes) plus the crew's records of the focus call (barn doors as focused,
// the focus photo); every other fixture field is the designer's plot row. Written out independently.
const ELECTRICS = new Set([
  "circuit",
  "dimmer",
  "universe",
  "address",
  "dmxMode",
  "footprint",
  "fixtureTypeId",
  "hung",
  "focused",
  "focusNotes",
  "barnDoorTop",
  "barnDoorBottom",
  "barnDoorLeft",
  "barnDoorRight",
  "focusPhotoUploadId",
]);

describe("the policy's fixture field rights come from the registry", () => {
  it("each registry field needs the right the design gives it", () => {
    for (const f of FIXTURE_FIELDS)
      expect(permissionForField("fixture", f.attribute), f.attribute).toBe(
        ELECTRICS.has(f.attribute) ? "rig.editElectrics" : "plot.edit",
      );
  });

  it("bookkeeping attributes and unknown names cannot be written", () => {
    for (const a of [...system, "constructor", "__proto__", "nonsense"])
      expect(permissionForField("fixture", a), a).toBeNull();
  });
});

describe("a new fixture's empty values", () => {
  const empty = emptyFixture() as Record<string, unknown>;

  it("cover every field with a default, including gobo rotation and the barn doors", () => {
    for (const f of FIXTURE_FIELDS)
      if ("default" in f) expect(empty, f.attribute).toHaveProperty(f.attribute, f.default);
    for (const a of [
      "goboRotationDeg",
      "barnDoorTop",
      "barnDoorBottom",
      "barnDoorLeft",
      "barnDoorRight",
      "focusPhotoUploadId",
    ])
      expect(empty[a], a).toBeNull();
    expect(empty).toMatchObject({ aim: "deck", hung: false, focused: false, focusedAt: null, focusedBy: null });
  });

  it("pass the API's own checks, with only the required fields added", () => {
    const writable = Object.fromEntries(Object.entries(empty).filter(([a]) => a in fixtureFieldsSchema.shape));
    const parsed = fixtureCreateSchema.safeParse({
      ...writable,
      positionId: 1,
      fixtureTypeId: 2,
      unitNumber: "7A",
      x: -1.5,
      y: 3,
    });
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    expect(fixtureCreateSchema.safeParse(writable).success).toBe(false);
  });
});

describe("a copy of a unit", () => {
  const unit = {
    ...emptyFixture(),
    id: 9,
    version: 4,
    positionId: 1,
    fixtureTypeId: 2,
    unitNumber: "7",
    x: 1,
    y: 2,
    colour: "pale lavender",
    goboRotationDeg: 45,
    barnDoorTop: "in halfway",
    hung: true,
    focused: true,
  };

  it("carries the designer's intent and leaves the crew's records of this one unit behind", () => {
    const copy = copyOfFixture(unit);
    expect(copy).toEqual({
      positionId: 1,
      unitNumber: "7",
      fixtureTypeId: 2,
      colour: "pale lavender",
      x: 1,
      y: 2,
      aim: "deck",
      goboRotationDeg: 45,
    });
    expect(fixtureCreateSchema.safeParse(copy).success).toBe(true);
  });
});

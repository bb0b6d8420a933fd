// Every field of a fixture, once: its name in files and columns, the model attribute it is stored in,
// its header and the other header words recognised on import, how its value is read and shown, its
// column width, the right that may change it, what a new fixture holds, and the check of its value.
// The import fields (lib/io/fields.ts), the rig's stored columns (lib/rig/columns.ts), the policy's field
// rules (lib/auth/policy.ts), the API's schemas (lib/validation/fixture.ts), new fixtures' empty values
// and the fixture DTO all read this list. Adding a field is one line here, a migration and the model's
// attribute (tests/unit/rig/fixture-fields.test.ts fails until the model and this list agree).
//
// Order matters: it is the order of the rig table's columns and of an exported file's columns.
import type { z } from "zod";
import type { Permission } from "@/lib/auth/permissions";
import * as check from "@/lib/validation/fixture-values";

/**
 * How a value is read from a file cell and shown. name/optionalName: a row named by its name (a
 * position, a type, a focus point); unit: a unit number; length: metres (any unit on the way in);
 * angle: degrees; aim: deck or head; cuts and upload are never in files.
 */
export type FieldKind =
  | "name"
  | "optionalName"
  | "unit"
  | "text"
  | "int"
  | "number"
  | "length"
  | "angle"
  | "bool"
  | "aim"
  | "cuts"
  | "upload";

type Spec = {
  /** The field's name in files, the rig's columns and saved views. */
  key: string;
  /** The model attribute (and API field) it is stored in; the key when absent. */
  attribute?: string;
  header: string;
  aliases?: readonly string[];
  kind: FieldKind;
  /** The SI unit it is stored in: lengths are shown in the production's units, the others as they are. */
  unit?: "m" | "°" | "%";
  /** Characters of its column in the rig table and the exports; null: no column and not in files. */
  width: number | null;
  /** The right that may change it (the role table in lib/auth/policy.ts says who holds it). */
  edit: Permission;
  /** What a new fixture holds when nothing is given; absent: a new fixture must give it. */
  default?: string | number | boolean | null;
  /** The value's check; absent: not written through the fixture routes (it has a route of its own). */
  schema?: z.ZodType;
  /** For a row named by its name: the DTO's field holding that name. */
  shows?: "positionName" | "typeName" | "focusPointName";
  /** A copy of the unit (duplicate, undo of a delete) carries it: the designer's intent, not a record of one unit. */
  copy?: boolean;
};

type Normal<S extends Spec> = Omit<S, "attribute" | "aliases" | "unit" | "copy"> & {
  attribute: S extends { attribute: string } ? S["attribute"] : S["key"];
  aliases: readonly string[];
  unit: Spec["unit"] | null;
  copy: boolean;
};

function field<const S extends Spec>(s: S): Normal<S> {
  return {
    ...s,
    attribute: s.attribute ?? s.key,
    aliases: s.aliases ?? [],
    unit: s.unit ?? null,
    copy: s.copy ?? false,
  } as unknown as Normal<S>;
}

const plot = "plot.edit";
const electrics = "rig.editElectrics";

export const FIXTURE_FIELDS = [
  field({
    key: "position",
    attribute: "positionId",
    header: "Position",
    kind: "name",
    aliases: ["hanging position", "pipe", "location", "pos"],
    width: 18,
    edit: plot,
    schema: check.rowId(),
    shows: "positionName",
    copy: true,
  }),
  field({
    key: "unitNumber",
    header: "Unit",
    kind: "unit",
    aliases: ["unit number", "unit no", "unit #", "unit no."],
    width: 7,
    edit: plot,
    schema: check.unitNumber(),
    copy: true,
  }),
  // A swap of type; recorded in the change log like any other write.
  field({
    key: "type",
    attribute: "fixtureTypeId",
    header: "Type",
    kind: "name",
    aliases: ["fixture type", "instrument type", "fixture", "instrument"],
    width: 22,
    edit: electrics,
    schema: check.rowId(),
    shows: "typeName",
    copy: true,
  }),
  field({
    key: "channel",
    header: "Channel",
    kind: "int",
    aliases: ["chan", "ch"],
    width: 9,
    edit: plot,
    default: null,
    schema: check.channel(),
    copy: true,
  }),
  field({
    key: "universe",
    header: "Universe",
    kind: "int",
    aliases: ["univ", "dmx universe"],
    width: 9,
    edit: electrics,
    default: null,
    schema: check.universe(),
    copy: true,
  }),
  field({
    key: "address",
    header: "Address",
    kind: "int",
    aliases: ["dmx address", "addr", "start address", "dmx"],
    width: 9,
    edit: electrics,
    default: null,
    schema: check.dmxAddress(),
    copy: true,
  }),
  field({
    key: "dmxMode",
    header: "Mode",
    kind: "text",
    aliases: ["dmx mode", "personality"],
    width: 10,
    edit: electrics,
    default: null,
    schema: check.optionalText(40),
    copy: true,
  }),
  field({
    key: "footprint",
    header: "Footprint",
    kind: "int",
    aliases: ["slots", "channels used", "dmx footprint"],
    width: 10,
    edit: electrics,
    default: null,
    schema: check.footprint(),
    copy: true,
  }),
  field({
    key: "circuit",
    header: "Circuit",
    kind: "text",
    aliases: ["circ", "circuit number"],
    width: 9,
    edit: electrics,
    default: null,
    schema: check.optionalText(20),
    copy: true,
  }),
  field({
    key: "dimmer",
    header: "Dimmer",
    kind: "text",
    aliases: ["dim", "dimmer number"],
    width: 9,
    edit: electrics,
    default: null,
    schema: check.optionalText(20),
    copy: true,
  }),
  field({
    key: "colour",
    header: "Colour",
    kind: "text",
    aliases: ["color", "gel", "colour and diffusion", "color and diffusion"],
    width: 14,
    edit: plot,
    default: null,
    schema: check.optionalText(60),
    copy: true,
  }),
  field({
    key: "gobo",
    header: "Gobo",
    kind: "text",
    aliases: ["pattern", "template"],
    width: 12,
    edit: plot,
    default: null,
    schema: check.optionalText(60),
    copy: true,
  }),
  field({
    key: "purpose",
    header: "Purpose",
    kind: "text",
    aliases: ["use", "function", "focus purpose"],
    width: 18,
    edit: plot,
    default: null,
    schema: check.optionalText(120),
    copy: true,
  }),
  field({
    key: "x",
    header: "X",
    kind: "length",
    unit: "m",
    aliases: ["x position", "across"],
    width: 9,
    edit: plot,
    schema: check.planCoord("x"),
    copy: true,
  }),
  field({
    key: "y",
    header: "Y",
    kind: "length",
    unit: "m",
    aliases: ["y position", "depth"],
    width: 9,
    edit: plot,
    schema: check.planCoord("y"),
    copy: true,
  }),
  field({
    key: "lensHeight",
    header: "Lens height",
    kind: "length",
    unit: "m",
    aliases: ["height", "z"],
    width: 12,
    edit: plot,
    default: null,
    schema: check.lensHeight(),
    copy: true,
  }),
  field({
    key: "focusPoint",
    attribute: "focusPointId",
    header: "Focus point",
    kind: "optionalName",
    aliases: ["focus mark", "area"],
    width: 12,
    edit: plot,
    default: null,
    schema: check.rowId().nullable(),
    shows: "focusPointName",
    copy: true,
  }),
  field({
    key: "focusX",
    header: "Focus X",
    kind: "length",
    unit: "m",
    width: 10,
    edit: plot,
    default: null,
    schema: check.planCoord("Focus x").nullable(),
    copy: true,
  }),
  field({
    key: "focusY",
    header: "Focus Y",
    kind: "length",
    unit: "m",
    width: 10,
    edit: plot,
    default: null,
    schema: check.planCoord("Focus y").nullable(),
    copy: true,
  }),
  field({
    key: "aim",
    header: "Aim at",
    kind: "aim",
    aliases: ["aim", "aim height", "focus height"],
    width: 8,
    edit: plot,
    default: "deck",
    schema: check.aim(),
    copy: true,
  }),
  field({
    key: "coneDeg",
    header: "Cone",
    kind: "angle",
    unit: "°",
    aliases: ["cone angle", "beam", "field angle", "zoom"],
    width: 8,
    edit: plot,
    default: null,
    schema: check.cone(),
    copy: true,
  }),
  field({
    key: "softnessDeg",
    header: "Softness",
    kind: "angle",
    unit: "°",
    aliases: ["edge", "edge softness"],
    width: 9,
    edit: plot,
    default: null,
    schema: check.softness(),
    copy: true,
  }),
  field({
    key: "irisPercent",
    header: "Iris",
    kind: "number",
    unit: "%",
    aliases: ["iris %"],
    width: 7,
    edit: plot,
    default: null,
    schema: check.percent(),
    copy: true,
  }),
  // The designer chooses the gobo's orientation; the crew records the barn doors as focused.
  field({
    key: "goboRotationDeg",
    header: "Gobo rotation",
    kind: "angle",
    unit: "°",
    aliases: ["gobo angle", "gobo orientation", "gobo rot"],
    width: 10,
    edit: plot,
    default: null,
    schema: check.goboRotation(),
    copy: true,
  }),
  field({
    key: "barnDoorTop",
    header: "Barn door top",
    kind: "text",
    aliases: ["barn doors top", "top barn door", "top door"],
    width: 14,
    edit: electrics,
    default: null,
    schema: check.barnDoorLeaf("top"),
  }),
  field({
    key: "barnDoorBottom",
    header: "Barn door bottom",
    kind: "text",
    aliases: ["barn doors bottom", "bottom barn door", "bottom door"],
    width: 14,
    edit: electrics,
    default: null,
    schema: check.barnDoorLeaf("bottom"),
  }),
  field({
    key: "barnDoorLeft",
    header: "Barn door left",
    kind: "text",
    aliases: ["barn doors left", "left barn door", "left door"],
    width: 14,
    edit: electrics,
    default: null,
    schema: check.barnDoorLeaf("left"),
  }),
  field({
    key: "barnDoorRight",
    header: "Barn door right",
    kind: "text",
    aliases: ["barn doors right", "right barn door", "right door"],
    width: 14,
    edit: electrics,
    default: null,
    schema: check.barnDoorLeaf("right"),
  }),
  field({ key: "hung", header: "Hung", kind: "bool", width: 7, edit: electrics, default: false, schema: check.flag() }),
  field({
    key: "focused",
    header: "Focused",
    kind: "bool",
    width: 8,
    edit: electrics,
    default: false,
    schema: check.flag(),
  }),
  field({
    key: "notes",
    header: "Notes",
    kind: "text",
    aliases: ["note", "comments"],
    width: 24,
    edit: plot,
    default: null,
    schema: check.optionalText(4000),
    copy: true,
  }),
  field({
    key: "focusNotes",
    header: "As-focused notes",
    kind: "text",
    aliases: ["focus notes", "as focused"],
    width: 24,
    edit: electrics,
    default: null,
    schema: check.optionalText(4000),
  }),
  field({
    key: "bodyKey",
    header: "Body",
    kind: "text",
    aliases: ["body key", "multicell body"],
    width: 8,
    edit: plot,
    default: null,
    schema: check.optionalText(40),
  }),
  field({
    key: "cell",
    header: "Cell",
    kind: "int",
    aliases: ["cell number"],
    width: 6,
    edit: plot,
    default: null,
    schema: check.cell(),
  }),
  field({
    key: "shutterCuts",
    header: "Shutter cuts",
    kind: "cuts",
    width: null,
    edit: plot,
    default: null,
    schema: check.shutterCuts(),
    copy: true,
  }),
  // Set and cleared through the focus photo route, under the fixture's version; taken on the deck by the crew.
  field({
    key: "focusPhotoUploadId",
    header: "Focus photo",
    kind: "upload",
    width: null,
    edit: electrics,
    default: null,
  }),
] as const;

/**
 * Model attributes that are not fields a person sets: identity, bookkeeping the data layer writes, and
 * who marked the unit focused and when (written with `focused`). `default` is a new row's value where the
 * data layer must give one.
 */
export const FIXTURE_SYSTEM_ATTRIBUTES = {
  id: {},
  productionId: {},
  unitSort: {}, // from unitNumber, so 2 sorts before 10 and 12A after 12
  focusedAt: { default: null },
  focusedBy: { default: null },
  version: {},
  createdAt: {},
  updatedAt: {},
} as const;

export type FixtureField = (typeof FIXTURE_FIELDS)[number];
export type FixtureAttribute = FixtureField["attribute"];
/** Fields in files and in the rig's columns. */
export type FileField = Extract<FixtureField, { width: number }>;
export type FileFieldKey = FileField["key"];
type Writable = Extract<FixtureField, { schema: z.ZodType }>;
/** The shape of lib/validation/fixture.ts's schema: each writable attribute with its check. */
export type FixtureFieldsShape = { [F in Writable as F["attribute"]]: F["schema"] };
type ValueOf<F> = F extends { schema: z.ZodType }
  ? z.output<F["schema"]>
  : F extends { kind: "upload" }
    ? number | null
    : never;
/** Each field's value as stored and sent (the fixture DTO is these plus the system attributes). */
export type FixtureFieldValues = { [F in FixtureField as F["attribute"]]: ValueOf<F> };
type WithDefault = Extract<FixtureField, { default: unknown }>;
/** Attributes without a default: a new fixture must give them. */
export type RequiredAttribute = Exclude<FixtureField, { default: unknown }>["attribute"];
export type FixtureDefaults = { [F in WithDefault as F["attribute"]]: F["default"] } & {
  focusedAt: null;
  focusedBy: null;
};

export const FIELD_BY_ATTRIBUTE: ReadonlyMap<string, FixtureField> = new Map(
  FIXTURE_FIELDS.map((f) => [f.attribute, f]),
);
export const FIELD_BY_KEY: ReadonlyMap<string, FixtureField> = new Map(FIXTURE_FIELDS.map((f) => [f.key, f]));

/** The model attribute a file or column key writes ("position" → "positionId"); other keys are their attribute. */
export const attributeOf = (key: string): string => FIELD_BY_KEY.get(key)?.attribute ?? key;
/** The file or column key of a model attribute ("positionId" → "position"). */
export const keyOfAttribute = (attribute: string): string => FIELD_BY_ATTRIBUTE.get(attribute)?.key ?? attribute;

/** A new fixture's values for everything it need not give: empty, aimed at the deck, not hung, not focused. */
export function emptyFixture(): FixtureDefaults {
  const out: Record<string, unknown> = {};
  for (const f of FIXTURE_FIELDS) if ("default" in f) out[f.attribute] = f.default;
  for (const [a, spec] of Object.entries(FIXTURE_SYSTEM_ATTRIBUTES)) if ("default" in spec) out[a] = spec.default;
  return out as FixtureDefaults;
}

/** Attributes a new fixture must give (no default): where it hangs, what it is, its unit number and place. */
export const REQUIRED_ON_CREATE = FIXTURE_FIELDS.filter((f) => !("default" in f)).map(
  (f) => f.attribute as RequiredAttribute,
);

/** The attributes a copy of a unit carries (what the plot sends to hang a duplicate or undo a delete). */
export const COPIED_ATTRIBUTES = FIXTURE_FIELDS.filter((f) => f.copy).map((f) => f.attribute);

/** The fields of a fixture needed to hang a copy of it; empty values are left to the new row's defaults. */
export function copyOfFixture(f: Partial<Record<string, unknown>>): Record<string, unknown> {
  return Object.fromEntries(COPIED_ATTRIBUTES.map((a) => [a, f[a]]).filter(([, v]) => v !== null && v !== undefined));
}

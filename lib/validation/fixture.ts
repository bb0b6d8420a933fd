import { z } from "zod";
import { versionSchema } from "./common";

const optionalText = (max: number) => z.string().trim().max(max, { error: `at most ${max} characters` }).nullable();
const planCoord = (what: string) =>
  z.number({ error: `${what} must be a number of metres` }).min(-200, { error: `${what} is far outside any venue (more than 200 m from the datum)` }).max(200, { error: `${what} is far outside any venue (more than 200 m from the datum)` });
const barnDoorLeaf = (leaf: string) =>
  z.string({ error: `Barn door (${leaf}) must be text, e.g. "in halfway"` }).trim().max(60, { error: `Barn door (${leaf}) is at most 60 characters` }).nullable();
const point = z.object({ x: planCoord("x"), y: planCoord("y") });

export const shutterCutSchema = z.object({
  label: z.enum(["top", "bottom", "left", "right"]),
  a: point,
  b: point,
});

/** Every field a client may set on a fixture; who may change which is decided by lib/auth/policy. */
export const fixtureFieldsSchema = z.object({
    positionId: z.number().int().positive(),
    unitNumber: z.string().trim().regex(/^[0-9]{1,4}[A-Za-z]{0,2}$/, { error: "Unit number is digits with up to two letters, e.g. 7 or 12A" }),
    fixtureTypeId: z.number().int().positive(),
    focusPointId: z.number().int().positive().nullable(),
    channel: z.number({ error: "Channel must be a whole number" }).int({ error: "Channel must be a whole number" }).min(1).max(99999).nullable(),
    universe: z.number({ error: "Universe must be a whole number" }).int().min(1, { error: "Universe must be 1 or more" }).max(63999).nullable(),
    address: z.number({ error: "Address must be a whole number" }).int().min(1, { error: "DMX address must be 1–512" }).max(512, { error: "DMX address must be 1–512" }).nullable(),
    dmxMode: optionalText(40),
    footprint: z.number().int().min(1).max(512).nullable(),
    circuit: optionalText(20),
    dimmer: optionalText(20),
    colour: optionalText(60),
    gobo: optionalText(60),
    purpose: optionalText(120),
    x: planCoord("x"),
    y: planCoord("y"),
    lensHeight: z.number({ error: "Lens height must be a number of metres" }).min(0, { error: "Lens height cannot be below the deck" }).max(60).nullable(),
    focusX: planCoord("Focus x").nullable(),
    focusY: planCoord("Focus y").nullable(),
    aim: z.enum(["deck", "head"]),
    coneDeg: z.number({ error: "Cone must be a number of degrees" }).gt(0, { error: "Cone must be more than 0°" }).lt(180, { error: "Cone must be less than 180°" }).nullable(),
    softnessDeg: z.number({ error: "Softness must be a number of degrees" }).min(0, { error: "Softness cannot be negative" }).max(90).nullable(),
    shutterCuts: z.array(shutterCutSchema).max(4, { error: "At most four shutter cuts" }).nullable(),
    irisPercent: z.number().min(0).max(100).nullable(),
    notes: optionalText(4000),
    focusNotes: optionalText(4000),
    // Degrees turned clockwise, looking along the beam from behind the fixture; 0 = as the gobo is drawn.
    goboRotationDeg: z
      .number({ error: "Gobo rotation must be a number of degrees (0 to 359.9)" })
      .min(0, { error: "Gobo rotation must be 0° or more (use 0–359.9°, clockwise looking along the beam)" })
      .lt(360, { error: "Gobo rotation must be less than 360° (use 0–359.9°, clockwise looking along the beam)" })
      .nullable(),
    barnDoorTop: barnDoorLeaf("top"),
    barnDoorBottom: barnDoorLeaf("bottom"),
    barnDoorLeft: barnDoorLeaf("left"),
    barnDoorRight: barnDoorLeaf("right"),
    bodyKey: optionalText(40),
    cell: z.number().int().min(1).max(64).nullable(),
    hung: z.boolean(),
    focused: z.boolean(),
  });

export const fixturePatchSchema = fixtureFieldsSchema.partial().extend({ version: versionSchema }).strict();
export type FixturePatch = z.infer<typeof fixturePatchSchema>;

export const fixtureCreateSchema = fixtureFieldsSchema
  .partial()
  .required({ positionId: true, fixtureTypeId: true, unitNumber: true, x: true, y: true })
  .strict();
export type FixtureCreate = z.infer<typeof fixtureCreateSchema>;

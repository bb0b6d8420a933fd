// The zod checks of single fixture values, named for the fixture field registry (lib/rig/fixture-fields.ts),
// which gives each field its check; lib/validation/fixture.ts assembles them into the API's schemas.
// Messages name the field in the words on screen, since forms, the rig table and file rows all show them.
import { z } from "zod";

export const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { error: `at most ${max} characters` })
    .nullable();

export const planCoord = (what: string) =>
  z
    .number({ error: `${what} must be a number of metres` })
    .min(-200, { error: `${what} is far outside any venue (more than 200 m from the datum)` })
    .max(200, { error: `${what} is far outside any venue (more than 200 m from the datum)` });

export const rowId = () => z.number().int().positive();

export const unitNumber = () =>
  z
    .string()
    .trim()
    .regex(/^[0-9]{1,4}[A-Za-z]{0,2}$/, { error: "Unit number is digits with up to two letters, e.g. 7 or 12A" });

export const channel = () =>
  z
    .number({ error: "Channel must be a whole number" })
    .int({ error: "Channel must be a whole number" })
    .min(1)
    .max(99999)
    .nullable();

export const universe = () =>
  z
    .number({ error: "Universe must be a whole number" })
    .int()
    .min(1, { error: "Universe must be 1 or more" })
    .max(63999)
    .nullable();

// ANSI E1.11 (DMX512-A): slots 1–512 in a universe.
export const dmxAddress = () =>
  z
    .number({ error: "Address must be a whole number" })
    .int()
    .min(1, { error: "DMX address must be 1–512" })
    .max(512, { error: "DMX address must be 1–512" })
    .nullable();

// ANSI E1.11: a unit takes at least one slot and at most a whole universe.
export const footprint = () =>
  z
    .number({ error: "Footprint must be a whole number of DMX slots" })
    .int({ error: "Footprint must be a whole number of DMX slots" })
    .min(1, { error: "Footprint must be 1–512 slots" })
    .max(512, { error: "Footprint must be 1–512 slots" })
    .nullable();

export const lensHeight = () =>
  z
    .number({ error: "Lens height must be a number of metres" })
    .min(0, { error: "Lens height cannot be below the deck" })
    .max(60)
    .nullable();

export const aim = () => z.enum(["deck", "head"]);

export const cone = () =>
  z
    .number({ error: "Cone must be a number of degrees" })
    .gt(0, { error: "Cone must be more than 0°" })
    .lt(180, { error: "Cone must be less than 180°" })
    .nullable();

export const softness = () =>
  z
    .number({ error: "Softness must be a number of degrees" })
    .min(0, { error: "Softness cannot be negative" })
    .max(90)
    .nullable();

const point = z.object({ x: planCoord("x"), y: planCoord("y") });

export const shutterCutSchema = z.object({
  label: z.enum(["top", "bottom", "left", "right"]),
  a: point,
  b: point,
});

export const shutterCuts = () => z.array(shutterCutSchema).max(4, { error: "At most four shutter cuts" }).nullable();

export const percent = () => z.number().min(0).max(100).nullable();

// Degrees turned clockwise, looking along the beam from behind the fixture; 0 = as the gobo is drawn.
export const goboRotation = () =>
  z
    .number({ error: "Gobo rotation must be a number of degrees (0 to 359.9)" })
    .min(0, { error: "Gobo rotation must be 0° or more (use 0–359.9°, clockwise looking along the beam)" })
    .lt(360, { error: "Gobo rotation must be less than 360° (use 0–359.9°, clockwise looking along the beam)" })
    .nullable();

export const barnDoorLeaf = (leaf: string) =>
  z
    .string({ error: `Barn door (${leaf}) must be text, e.g. "in halfway"` })
    .trim()
    .max(60, { error: `Barn door (${leaf}) is at most 60 characters` })
    .nullable();

export const cell = () => z.number().int().min(1).max(64).nullable();

export const flag = () => z.boolean();

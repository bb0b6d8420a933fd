import { z } from "zod";
import { POSITION_KINDS } from "@/lib/rig/position-kinds";
import { versionSchema } from "./common";
import { FIXTURE_MOUNTINGS } from "@/models/fixture-mountings";

const coord = (what: string) =>
  z
    .number({ error: `${what} must be a number of metres` })
    .min(-200, { error: `${what} is more than 200 m from the datum` })
    .max(200, { error: `${what} is more than 200 m from the datum` });

export const positionFieldsSchema = z.object({
  name: z.string({ error: "Name is required" }).trim().min(1, { error: "Name is required" }).max(80),
  kind: z.enum(POSITION_KINDS, { error: `Kind must be one of: ${POSITION_KINDS.join(", ")}` }),
  x1: coord("x1"),
  y1: coord("y1"),
  x2: coord("x2").nullable(),
  y2: coord("y2").nullable(),
  trimHeight: z
    .number({ error: "Trim height must be a number of metres" })
    .min(0, { error: "Trim height cannot be negative" })
    .max(60, { error: "Trim height must be at most 60 m" }),
  ratedLoadKg: z
    .number({ error: "Rated load must be a number of kilograms" })
    .min(0, { error: "Rated load cannot be negative" })
    .max(100000)
    .nullable(),
  sortOrder: z.number().int().min(0).max(10000),
});
export const createPositionSchema = positionFieldsSchema
  .partial({ x2: true, y2: true, ratedLoadKg: true, sortOrder: true })
  .strict();
export const updatePositionSchema = positionFieldsSchema.partial().extend({ version: versionSchema }).strict();

export const focusPointFieldsSchema = z.object({
  name: z.string({ error: "Name is required" }).trim().min(1, { error: "Name is required" }).max(60),
  x: coord("x"),
  y: coord("y"),
});
export const createFocusPointSchema = focusPointFieldsSchema.strict();
export const updateFocusPointSchema = focusPointFieldsSchema.partial().extend({ version: versionSchema }).strict();

export const dmxModeSchema = z.object({
  name: z.string().trim().min(1).max(40),
  footprint: z
    .number()
    .int()
    .min(1, { error: "Footprint must be 1–512 slots" })
    .max(512, { error: "Footprint must be 1–512 slots" }),
});

export const fixtureTypeFieldsSchema = z.object({
  name: z.string({ error: "Name is required" }).trim().min(1, { error: "Name is required" }).max(80),
  family: z.enum(["profile", "fresnel", "wash", "par", "led-wash", "cyc", "followspot"]),
  coneMinDeg: z
    .number()
    .gt(0, { error: "Cone must be more than 0°" })
    .lt(180, { error: "Cone must be less than 180°" }),
  coneMaxDeg: z
    .number()
    .gt(0, { error: "Cone must be more than 0°" })
    .lt(180, { error: "Cone must be less than 180°" }),
  defaultSoftnessDeg: z.number().min(0).max(90),
  peakCandela: z.number().min(0).max(10_000_000),
  peakCandelaNarrow: z
    .number({ error: "Peak at the narrowest cone must be a number of candela" })
    .min(0, { error: "Peak at the narrowest cone cannot be negative" })
    .max(10_000_000, { error: "Peak at the narrowest cone: at most 10,000,000 cd" })
    .nullable(),
  wattage: z.number().min(0).max(100_000),
  weightKg: z.number().min(0).max(10_000),
  dmxModes: z.array(dmxModeSchema).min(1, { error: "At least one DMX mode" }).max(20),
  lensApertureM: z.number().min(0).max(2),
  frameSize: z.string().trim().max(40).nullable(),
  goboSize: z.string().trim().max(20).nullable(),
  lensDropM: z.number().min(0).max(5),
  mounting: z.enum(FIXTURE_MOUNTINGS, {
    error: `Mounting must be one of: ${FIXTURE_MOUNTINGS.join(", ")}`,
  }),
  lensRiseM: z
    .number({ error: "Lens rise must be a length" })
    .min(0, { error: "Lens rise cannot be negative" })
    .max(5, { error: "Lens rise: at most 5 m" }),
  bodyWidthM: z
    .number({ error: "Body width must be a length" })
    .min(0.05, { error: "Body width: at least 5 cm" })
    .max(5, { error: "Body width: at most 5 m" }),
  loadKind: z
    .enum(["lamp", "switch-mode"], { error: "Load must be lamp or switch-mode, or empty to go by the family" })
    .nullable(),
  cells: z.number().int().min(1).max(64),
});
const coneOrder = (t: { coneMinDeg?: number; coneMaxDeg?: number }) =>
  t.coneMinDeg === undefined || t.coneMaxDeg === undefined || t.coneMinDeg <= t.coneMaxDeg;
export const createFixtureTypeSchema = fixtureTypeFieldsSchema
  .partial({
    peakCandelaNarrow: true,
    defaultSoftnessDeg: true,
    wattage: true,
    weightKg: true,
    lensApertureM: true,
    frameSize: true,
    goboSize: true,
    lensDropM: true,
    mounting: true,
    lensRiseM: true,
    bodyWidthM: true,
    loadKind: true,
    cells: true,
  })
  .strict()
  .refine(coneOrder, { error: "The narrowest cone cannot be wider than the widest", path: ["coneMinDeg"] });
export const updateFixtureTypeSchema = fixtureTypeFieldsSchema
  .partial()
  .extend({ version: versionSchema })
  .strict()
  .refine(coneOrder, { error: "The narrowest cone cannot be wider than the widest", path: ["coneMinDeg"] });

import { z } from "zod";
import { metres, versionSchema } from "./common";

// Inputs of the coverage and shadow studies: performer marks, scenery panels, the colour list, and the
// two study requests. Messages name the field in the words the studies page uses.

const planCoord = (what: string) =>
  z
    .number({ error: `${what} must be a number of metres` })
    .min(-200, { error: `${what} is far outside any venue (more than 200 m from the datum)` })
    .max(200, { error: `${what} is far outside any venue (more than 200 m from the datum)` });
const name = (max: number, what = "Name") =>
  z
    .string({ error: `${what} is required` })
    .trim()
    .min(1, { error: `${what} is required` })
    .max(max, { error: `${what} must be at most ${max} characters` });

export const performerMarkFieldsSchema = z.object({
  name: name(60),
  x: planCoord("x"),
  y: planCoord("y"),
  height: metres(0.3, 3, "Performer height"),
  shoulderWidth: metres(0.1, 2, "Shoulder width"),
});
export const createPerformerMarkSchema = performerMarkFieldsSchema
  .extend({
    height: performerMarkFieldsSchema.shape.height.default(1.75),
    shoulderWidth: performerMarkFieldsSchema.shape.shoulderWidth.default(0.5),
  })
  .strict();
export const updatePerformerMarkSchema = performerMarkFieldsSchema
  .partial()
  .extend({ version: versionSchema })
  .strict();

const notPoint = (l: { x1?: number; y1?: number; x2?: number; y2?: number }) =>
  l.x1 === undefined ||
  l.x2 === undefined ||
  l.y1 === undefined ||
  l.y2 === undefined ||
  Math.hypot(l.x2 - l.x1, l.y2 - l.y1) > 1e-6;
export const scenicPanelFieldsSchema = z.object({
  name: name(60),
  x1: planCoord("x1"),
  y1: planCoord("y1"),
  x2: planCoord("x2"),
  y2: planCoord("y2"),
  height: metres(0.05, 30, "Panel height"),
});
export const createScenicPanelSchema = scenicPanelFieldsSchema
  .strict()
  .refine(notPoint, { error: "A panel needs two different ends", path: ["x2"] });
export const updateScenicPanelSchema = scenicPanelFieldsSchema
  .partial()
  .extend({ version: versionSchema })
  .strict()
  .refine(notPoint, { error: "A panel needs two different ends", path: ["x2"] });

const percent = z
  .number({ error: "Transmission must be a number of percent" })
  .min(0, { error: "Transmission must be between 0 and 100 %" })
  .max(100, { error: "Transmission must be between 0 and 100 %" });
/** `name` is the colour text exactly as typed in the rig; only the ends' spaces are trimmed. */
export const colourTransmissionFieldsSchema = z.object({ name: name(120, "Colour"), percent });
export const createColourTransmissionSchema = colourTransmissionFieldsSchema.strict();
export const updateColourTransmissionSchema = colourTransmissionFieldsSchema
  .partial()
  .extend({ version: versionSchema })
  .strict();

const level = z
  .number({ error: "A level must be a number from 0 to 100" })
  .min(0, { error: "A level must be from 0 to 100" })
  .max(100, { error: "A level must be from 0 to 100" });
const channelText = z.string().regex(/^[1-9]\d{0,4}$/, { error: "Channels are whole numbers from 1 to 99999" });

/** Which light: a cue's tracked state, every unit at full, or chosen channels at chosen levels (0–100). */
export const lightSourceSchema = z.discriminatedUnion(
  "kind",
  [
    z
      .object({
        kind: z.literal("cue"),
        cueId: z.number({ error: "Choose a cue" }).int().positive({ error: "Choose a cue" }),
      })
      .strict(),
    z.object({ kind: z.literal("full") }).strict(),
    z
      .object({
        kind: z.literal("channels"),
        levels: z.record(channelText, level, { error: "Levels must map channel numbers to levels" }),
      })
      .strict()
      .refine((s) => Object.keys(s.levels).length > 0, { error: "Pick at least one channel", path: ["levels"] }),
  ],
  { error: "Light source must be a cue, all at full, or chosen channels" },
);

export const measureSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("deck") }).strict(),
    z.object({ kind: z.literal("head") }).strict(),
    z
      .object({
        kind: z.literal("face"),
        facingDeg: z.number({ error: "Facing direction must be a number of degrees" }).min(-360).max(360).default(-90),
      })
      .strict(),
  ],
  { error: "Measure must be deck, head or face" },
);

export const coverageRequestSchema = z
  .object({
    source: lightSourceSchema,
    measure: measureSchema.default({ kind: "deck" }),
    resolution: z
      .number({ error: "Resolution must be a number of metres" })
      .min(0.05, { error: "Resolution must be at least 0.05 m" })
      .max(2, { error: "Resolution must be at most 2 m" })
      .default(0.1),
    minUniformity: z
      .number({ error: "Uniformity threshold must be a number" })
      .min(0)
      .max(1, { error: "Uniformity threshold must be from 0 to 1" })
      .default(0.5),
    meanRatio: z
      .number({ error: "Mean ratio must be a number" })
      .min(1, { error: "Mean ratio must be 1 or more" })
      .max(100)
      .default(2),
  })
  .strict();
export type CoverageRequest = z.infer<typeof coverageRequestSchema>;

export const shadowRequestSchema = z.object({ source: lightSourceSchema }).strict();
export type LightSource = z.infer<typeof lightSourceSchema>;

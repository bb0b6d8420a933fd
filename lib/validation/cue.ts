import { z } from "zod";
import { checkParts, MAX_PARTS, parseCueNumber, parseFadeTime } from "@/lib/cues/index";
import { versionSchema } from "./common";

/** A cue number typed as text ("12.5") or sent as a number. */
export const cueNumberSchema = (what = "Cue number") =>
  z.union([z.string(), z.number()], { error: `${what} is required` }).transform((v, ctx) => {
    try {
      return parseCueNumber(String(v));
    } catch (e) {
      ctx.addIssue({ code: "custom", message: `${what}: ${(e as Error).message}` });
      return z.NEVER;
    }
  });

/** Seconds as a number, or text such as "5.5" or "1:30". */
const timeSchema = (what: string) =>
  z.union([z.string(), z.number()], { error: `${what} must be a time such as 5, 5.5 or 1:30` }).transform((v, ctx) => {
    if (typeof v === "number") {
      if (Number.isFinite(v) && v >= 0 && v <= 86_400) return Math.round(v * 1000) / 1000;
      ctx.addIssue({ code: "custom", message: `${what} must be between 0 and 24 hours` });
      return z.NEVER;
    }
    try {
      return parseFadeTime(v, what);
    } catch (e) {
      ctx.addIssue({ code: "custom", message: (e as Error).message });
      return z.NEVER;
    }
  });

const text = (max: number, what: string) =>
  z
    .string({ error: `${what} must be text` })
    .trim()
    .max(max, { error: `${what}: at most ${max} characters` });

export const levelSchema = z
  .number({ error: "A level must be a number from 0 to 100" })
  .int({ error: "A level must be a whole percentage" })
  .min(0, { error: "A level cannot be below 0" })
  .max(100, { error: "A level cannot be above 100" });

/** channel → level (0–100), or null to remove the cue's move so the channel tracks. */
export const levelsSchema = z
  .record(
    z.string().regex(/^[1-9]\d{0,4}$/, { error: "Channels are whole numbers from 1 to 99999" }),
    levelSchema.nullable(),
  )
  .refine((r) => Object.keys(r).length <= 5000, { error: "At most 5000 channels in one change" });

const channelSchema = z
  .number({ error: "A channel is a whole number from 1 to 99999" })
  .int({ error: "A channel is a whole number from 1 to 99999" })
  .min(1, { error: "Channels start at 1" })
  .max(99_999, { error: "Channels run up to 99999" });

/** One part of a cue: its number, its own times and its channels. */
export const partSchema = z
  .object({
    part: z
      .number({ error: `A part number is a whole number from 1 to ${MAX_PARTS}` })
      .int({ error: `A part number is a whole number from 1 to ${MAX_PARTS}` })
      .min(1, { error: "Part numbers start at 1" })
      .max(MAX_PARTS, { error: `At most part ${MAX_PARTS}` }),
    label: text(60, "Part label").default(""),
    upTime: timeSchema("Part up time"),
    downTime: timeSchema("Part down time").nullable().default(null),
    delay: timeSchema("Part delay").default(0),
    channels: z
      .array(channelSchema, { error: "A part's channels must be a list of channel numbers" })
      .max(5000, { error: "At most 5000 channels in a part" }),
  })
  .strict();

/** All the parts of a cue (a PATCH replaces them all); problems name the part and the channel. */
export const partsSchema = z
  .array(partSchema, { error: "parts must be a list" })
  .max(MAX_PARTS, { error: `At most ${MAX_PARTS} parts in a cue` })
  .superRefine((parts, ctx) => {
    for (const problem of checkParts(parts)) ctx.addIssue({ code: "custom", message: problem });
  });

const cueFields = {
  number: cueNumberSchema(),
  label: text(160, "Label"),
  page: text(20, "Page").nullable(),
  upTime: timeSchema("Up time"),
  downTime: timeSchema("Down time").nullable(),
  delay: timeSchema("Delay"),
  downDelay: timeSchema("Down delay").nullable(),
  follow: timeSchema("Follow").nullable(),
  link: cueNumberSchema("Link").nullable(),
  block: z.boolean({ error: "Block must be true or false" }),
  callNote: text(2000, "Call note").nullable(),
  levels: levelsSchema,
  parts: partsSchema,
};

export const cueCreateSchema = z.object(cueFields).partial().required({ number: true }).strict();
export type CueCreate = z.infer<typeof cueCreateSchema>;

/** Every field a client may change; who may change which is decided by lib/auth/policy. */
export const cuePatchSchema = z
  .object({ ...cueFields, version: versionSchema })
  .partial()
  .required({ version: true })
  .strict();
export type CuePatch = z.infer<typeof cuePatchSchema>;

export const renumberSchema = z
  .object({
    from: cueNumberSchema("First cue"),
    to: cueNumberSchema("Last cue"),
    start: cueNumberSchema("New first number"),
    step: cueNumberSchema("Step"),
  })
  .strict();

export const cueImportSchema = z
  .object({
    text: z.string({ error: "The file's text is required" }).max(5_000_000, { error: "The file is larger than 5 MB" }),
    mode: z
      .enum(["state", "moves"], { error: 'mode must be "state" (each cue is a full look) or "moves" (only changes)' })
      .default("state"),
  })
  .strict();

export const cueExportQuerySchema = z.object({
  format: z.enum(["ascii", "csv", "xlsx", "patch"], {
    error: "format must be ascii, csv, xlsx or patch (the patch as CSV)",
  }),
});

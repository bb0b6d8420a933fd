import { z } from "zod";
import { versionSchema } from "./common";

export const bulkEditSchema = z
  .object({
    items: z
      .array(z.object({ id: z.number().int().positive(), version: versionSchema }).strict())
      .min(1, { error: "Select at least one fixture" })
      .max(5000),
    action: z.discriminatedUnion("kind", [
      z
        .object({
          kind: z.literal("colour"),
          colour: z.string().trim().max(60, { error: "Colour is at most 60 characters" }).nullable(),
        })
        .strict(),
      z
        .object({
          kind: z.literal("channels"),
          start: z
            .number({ error: "First channel must be a whole number" })
            .int()
            .min(1, { error: "First channel must be 1 or more" })
            .max(99999),
          step: z.number().int().min(1).max(100).default(1),
        })
        .strict(),
      z
        .object({
          kind: z.literal("addresses"),
          universe: z
            .number({ error: "Universe must be a whole number" })
            .int()
            .min(1, { error: "Universe must be 1 or more" })
            .max(63999),
          address: z
            .number({ error: "Address must be a whole number" })
            .int()
            .min(1, { error: "DMX address must be 1–512" })
            .max(512, { error: "DMX address must be 1–512" }),
        })
        .strict(),
    ]),
  })
  .strict();
export type BulkEdit = z.infer<typeof bulkEditSchema>;

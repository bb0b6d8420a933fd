import { z } from "zod";
import { versionSchema } from "./common";

export const ACCESSORY_KINDS = [
  "scroller",
  "gobo rotator",
  "iris",
  "barn doors",
  "top hat",
  "half hat",
  "donut",
  "colour frame",
  "safety cable",
  "other",
] as const;

const fields = z.object({
  fixtureId: z.number().int().positive(),
  kind: z.string({ error: "Kind is required" }).trim().min(1, { error: "Kind is required" }).max(40),
  universe: z
    .number({ error: "Universe must be a whole number" })
    .int()
    .min(1, { error: "Universe must be 1 or more" })
    .max(63999)
    .nullable(),
  address: z
    .number({ error: "Address must be a whole number" })
    .int()
    .min(1, { error: "DMX address must be 1–512" })
    .max(512, { error: "DMX address must be 1–512" })
    .nullable(),
  footprint: z
    .number()
    .int()
    .min(1, { error: "Footprint must be 1–512 slots" })
    .max(512, { error: "Footprint must be 1–512 slots" })
    .nullable(),
  wattage: z.number({ error: "Wattage must be a number" }).min(0, { error: "Wattage cannot be negative" }).max(100_000),
  weightKg: z
    .number({ error: "Weight must be a number of kilograms" })
    .min(0, { error: "Weight cannot be negative" })
    .max(1000),
  notes: z.string().trim().max(400).nullable(),
});

export const accessoryCreateSchema = fields
  .partial({ universe: true, address: true, footprint: true, wattage: true, weightKg: true, notes: true })
  .strict();
export const accessoryPatchSchema = fields
  .omit({ fixtureId: true })
  .partial()
  .extend({ version: versionSchema })
  .strict();
export type AccessoryCreate = z.infer<typeof accessoryCreateSchema>;
export type AccessoryPatch = z.infer<typeof accessoryPatchSchema>;

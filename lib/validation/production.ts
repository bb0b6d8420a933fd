import { z } from "zod";
import { metres, versionSchema } from "./common";

export const DISPLAY_UNITS = ["metric", "imperial"] as const;
export const NUMBERING_RULES = ["from-stage-left", "from-stage-right"] as const;

export const productionSettingsSchema = z.object({
  name: z.string().trim().min(1, { error: "Name is required" }).max(160),
  venue: z.string().trim().max(160),
  displayUnits: z.enum(DISPLAY_UNITS, { error: "Display units must be metric or imperial" }),
  datumName: z.string().trim().min(1, { error: "Name the datum line (e.g. setting line)" }).max(60),
  headHeight: metres(1, 2.5, "Head height"),
  faceHeight: metres(0.5, 2.5, "Face height"),
  showDeckHeight: metres(0, 10, "Show-deck height"),
  backWallY: metres(0.5, 100, "Back-wall depth"),
  prosceniumWidth: metres(1, 100, "Proscenium width"),
  prosceniumHeight: metres(1, 50, "Proscenium height"),
  stageWidth: metres(1, 200, "Stage width"),
  stageDepth: metres(1, 100, "Stage depth"),
  apronDepth: metres(0, 30, "Apron depth"),
  numberingRule: z.enum(NUMBERING_RULES),
});
export type ProductionSettings = z.infer<typeof productionSettingsSchema>;

export const updateProductionSchema = productionSettingsSchema.partial().extend({ version: versionSchema }).strict();

export const createProductionSchema = z
  .object({
    name: z.string({ error: "Name is required" }).trim().min(1, { error: "Name is required" }).max(160),
    venue: z.string().trim().max(160).optional().default(""),
    displayUnits: z.enum(DISPLAY_UNITS).optional().default("metric"),
  })
  .strict();

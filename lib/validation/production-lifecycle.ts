import { z } from "zod";

export const archiveProductionSchema = z
  .object({ archived: z.boolean({ error: "Say whether the production is archived (true) or restored (false)" }) })
  .strict();

export const deleteProductionSchema = z
  .object({
    confirmName: z
      .string({ error: "Type the production's name to delete it" })
      .trim()
      .min(1, { error: "Type the production's name to delete it" })
      .max(160, { error: "That is longer than any production's name" }),
  })
  .strict();

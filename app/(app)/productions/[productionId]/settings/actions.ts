"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { memberAction } from "@/lib/auth/member-action";
import { updateProductionSettings } from "@/lib/data/productions";
import { DISPLAY_UNITS, productionSettingsSchema } from "@/lib/validation/production";
import { plainCountText } from "@/lib/http/id";
import { parseLength } from "@/lib/optics";

const LENGTH_FIELDS = [
  "headHeight",
  "backWallY",
  "prosceniumWidth",
  "prosceniumHeight",
  "stageWidth",
  "stageDepth",
  "apronDepth",
  "faceHeight",
  "showDeckHeight",
] as const;
const text = z.string().optional();

/**
 * The settings form as typed: lengths in the chosen display units ("5' 6\"", "3.2 m"), numbers as
 * text. Every field is checked in one pass so the form marks all that need fixing at once; a length
 * that does not read as a length shows that message, not the range check's.
 */
const settingsFormSchema = z
  .object({
    name: text,
    venue: text,
    displayUnits: z.enum(DISPLAY_UNITS).catch("metric"),
    datumName: text,
    numberingRule: text,
    version: plainCountText("version is required (the version you last read)"),
    headHeight: text,
    faceHeight: text,
    showDeckHeight: text,
    backWallY: text,
    prosceniumWidth: text,
    prosceniumHeight: text,
    stageWidth: text,
    stageDepth: text,
    apronDepth: text,
  })
  .transform((form, ctx) => {
    const unread = new Set<string>();
    const lengths: Record<string, number> = {};
    for (const field of LENGTH_FIELDS) {
      try {
        lengths[field] = parseLength(form[field] ?? "", form.displayUnits === "imperial" ? "ft" : "m");
      } catch (err) {
        unread.add(field);
        ctx.addIssue({ code: "custom", path: [field], message: (err as Error).message });
      }
    }
    const checked = productionSettingsSchema.safeParse({
      name: form.name,
      venue: form.venue ?? "",
      displayUnits: form.displayUnits,
      datumName: form.datumName,
      ...lengths,
      numberingRule: form.numberingRule,
    });
    for (const issue of checked.error?.issues ?? []) {
      if (!unread.has(String(issue.path[0])))
        ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
    }
    if (!checked.success || unread.size) return z.NEVER;
    return { version: form.version, changes: checked.data };
  });

/** Saves the settings form; the role is checked again on every call (see memberAction). */
export const updateSettingsAction = memberAction(
  "settings.edit",
  settingsFormSchema,
  async ({ version, changes }, { productionId, user }) => {
    const production = await updateProductionSettings({ productionId, version, changes, userId: user.id });
    revalidatePath(`/productions/${productionId}`, "layout");
    return { production, message: "Settings saved." };
  },
);

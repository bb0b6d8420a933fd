"use server";

import { revalidatePath } from "next/cache";
import { requireMember } from "@/lib/auth/guards";
import { updateProductionSettings, type ProductionDto } from "@/lib/data/productions";
import { productionSettingsSchema } from "@/lib/validation/production";
import { parseLength } from "@/lib/optics";
import { toAppError } from "@/lib/errors";

export type SettingsFormState = {
  message?: string;
  ok?: boolean;
  fieldErrors?: Record<string, string[]>;
  production?: ProductionDto;
  /** What the user typed, echoed back on error so the form does not lose it. */
  values?: Record<string, string>;
};

const LENGTH_FIELDS = ["headHeight", "backWallY", "prosceniumWidth", "prosceniumHeight", "stageWidth", "stageDepth", "apronDepth"] as const;

/** Saves the settings form. Checks the role again: an action can be POSTed to directly. */
export async function updateSettingsAction(productionId: number, _prev: SettingsFormState, form: FormData): Promise<SettingsFormState> {
  try {
    const { user } = await requireMember(productionId, "settings.edit");
    const units = form.get("displayUnits") === "imperial" ? "imperial" : "metric";
    const fieldErrors: Record<string, string[]> = {};
    const lengths: Record<string, number> = {};
    for (const field of LENGTH_FIELDS) {
      try {
        lengths[field] = parseLength(String(form.get(field) ?? ""), units === "imperial" ? "ft" : "m");
      } catch (err) {
        fieldErrors[field] = [(err as Error).message];
      }
    }
    const parsed = productionSettingsSchema.safeParse({
      name: form.get("name"),
      venue: form.get("venue") ?? "",
      displayUnits: units,
      datumName: form.get("datumName"),
      ...lengths,
      voltage: Number(form.get("voltage")),
      derating: Number(form.get("derating")),
      numberingRule: form.get("numberingRule"),
    });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = String(issue.path[0]);
        if (!(field in fieldErrors) || !LENGTH_FIELDS.includes(field as never)) (fieldErrors[field] ??= []).push(issue.message);
      }
    }
    if (Object.keys(fieldErrors).length || !parsed.success) {
      const values = Object.fromEntries([...form.entries()].map(([k, v]) => [k, String(v)]));
      return { fieldErrors, values, message: "Some settings need fixing; see the marked fields." };
    }
    const production = await updateProductionSettings({ productionId, version: Number(form.get("version")), changes: parsed.data, userId: user.id });
    revalidatePath(`/productions/${productionId}`, "layout");
    return { ok: true, message: "Settings saved.", production };
  } catch (err) {
    const e = toAppError(err);
    return { message: e.message, fieldErrors: e.details.fieldErrors, production: e.details.current as ProductionDto | undefined };
  }
}

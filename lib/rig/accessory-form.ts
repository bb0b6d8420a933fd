// An accessory's form as text fields and back: empty means "none" for DMX and 0 for power and weight,
// and the result is checked by the API's own schema so the message names the field before anything is sent.
import { accessoryPatchSchema } from "@/lib/validation/accessory";

export const ACCESSORY_FIELDS = [
  { key: "kind", label: "Kind" },
  { key: "universe", label: "Universe" },
  { key: "address", label: "Address" },
  { key: "footprint", label: "Slots" },
  { key: "wattage", label: "Power (W)" },
  { key: "weightKg", label: "Weight (kg)" },
  { key: "notes", label: "Notes" },
] as const;
export type AccessoryKey = (typeof ACCESSORY_FIELDS)[number]["key"];
export type AccessoryText = Record<AccessoryKey, string>;

export const EMPTY_ACCESSORY: AccessoryText = {
  kind: "",
  universe: "",
  address: "",
  footprint: "",
  wattage: "",
  weightKg: "",
  notes: "",
};

export function accessoryText(a: {
  kind: string;
  universe: number | null;
  address: number | null;
  footprint: number | null;
  wattage: number;
  weightKg: number;
  notes: string | null;
}): AccessoryText {
  const s = (v: number | string | null) => (v === null ? "" : String(v));
  return {
    kind: a.kind,
    universe: s(a.universe),
    address: s(a.address),
    footprint: s(a.footprint),
    wattage: s(a.wattage),
    weightKg: s(a.weightKg),
    notes: s(a.notes),
  };
}

export type AccessoryRead =
  | { ok: true; values: Record<string, unknown> }
  | { ok: false; errors: Partial<Record<AccessoryKey, string>> };

export function readAccessory(text: AccessoryText): AccessoryRead {
  const errors: Partial<Record<AccessoryKey, string>> = {};
  const num = (key: AccessoryKey, empty: number | null) => {
    const t = text[key].trim();
    if (t === "") return empty;
    const n = Number(t.replace(",", "."));
    if (Number.isNaN(n)) errors[key] = `"${t}" is not a number`;
    return n;
  };
  const values = {
    kind: text.kind.trim(),
    universe: num("universe", null),
    address: num("address", null),
    footprint: num("footprint", null),
    wattage: num("wattage", 0),
    weightKg: num("weightKg", 0),
    notes: text.notes.trim() || null,
  };
  if (Object.keys(errors).length) return { ok: false, errors };
  const checked = accessoryPatchSchema.safeParse({ ...values, version: 1 });
  if (!checked.success) {
    for (const issue of checked.error.issues) errors[String(issue.path[0]) as AccessoryKey] ??= issue.message;
    return { ok: false, errors };
  }
  // ANSI E1.11: the accessory's slots must end by slot 512 of its universe
  if (values.address !== null && values.address + (values.footprint ?? 1) - 1 > 512)
    return {
      ok: false,
      errors: { address: `A ${values.footprint ?? 1}-slot accessory at ${values.address} runs past slot 512` },
    };
  return { ok: true, values };
}

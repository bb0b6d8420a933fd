// The words people see for a fixture type's mounting (the list itself lives with the models, which build
// the database's enum from it). Where each mounting puts the lens is lib/rig/fixture-geometry.ts's rule.
import { FIXTURE_MOUNTINGS, type FixtureMounting } from "@/models/fixture-mountings";

export { FIXTURE_MOUNTINGS, isFixtureMounting, type FixtureMounting } from "@/models/fixture-mountings";

export const MOUNTING_LABELS: Record<FixtureMounting, string> = {
  "under-hung": "Under-hung",
  "over-hung": "Over-hung (rail or truss top)",
  "side-arm": "Side arm",
  floor: "Floor",
};

/** Label → value and back, forgiving of case, spaces and the words after the first ("over hung", "Floor"). */
export function mountingFromText(text: string): FixtureMounting | null {
  const key = text
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, "-");
  if (!key) return null;
  for (const m of FIXTURE_MOUNTINGS) {
    const label = MOUNTING_LABELS[m].toLowerCase().replace(/\s+/g, "-");
    if (key === m || key === label || label.startsWith(`${key}-`) || key.replace(/-/g, "") === m.replace(/-/g, ""))
      return m;
  }
  return null;
}

/** How a unit's default lens height is worked out for each mounting, in words for hints beside the field. */
export const LENS_HEIGHT_RULE: Record<FixtureMounting, { short: string; hint: string }> = {
  "under-hung": { short: "trim − lens drop", hint: "Empty: trim less the type's lens drop (under-hung)" },
  "over-hung": { short: "trim + lens rise", hint: "Empty: trim plus the type's lens rise (over-hung)" },
  "side-arm": { short: "level with the pipe", hint: "Empty: level with the pipe (side arm)" },
  floor: { short: "floor + lens rise", hint: "Empty: the type's lens rise above the floor or platform" },
};

// What an import would change, field by field, in words a person checks before pressing Import: for
// each fixture the file updates, every changed field's old and new value as the rig table shows them
// (lengths in the production's units, types and focus points by name). Pure: it reads the plan and the
// snapshot the plan was made from, so the preview and the write can never disagree.
import { formatLength, METRES_PER_INCH, type Units } from "@/lib/optics";
import { FIELD_BY_ATTRIBUTE } from "@/lib/rig/fixture-fields";
import type { RowPlan, Snapshot } from "@/lib/rig/import-plan";

export type FieldChange = { field: string; header: string; from: string; to: string };
export type FixtureChange = { row: number; position: string; unitNumber: string; fields: FieldChange[] };
export type ImportDiff = {
  counts: { new: number; changed: number; unchanged: number };
  /** In file order, at most `limit` fixtures; `changedTotal` says how many there are in all. */
  changed: FixtureChange[];
  changedTotal: number;
};

/** What an empty cell reads as on both sides of an arrow. */
export const EMPTY = "—";

type Names = { positions: Map<number, string>; types: Map<number, string>; focusPoints: Map<number, string> };

function namesOf(snap: Snapshot): Names {
  return {
    positions: new Map(snap.positions.map((p) => [p.id, p.name])),
    types: new Map(snap.types.map((t) => [t.id, t.name])),
    focusPoints: new Map(snap.focusPoints.map((p) => [p.id, p.name])),
  };
}

function lengthPair(a: unknown, b: unknown, units: Units): [string, string] {
  const show = (v: unknown, fine: boolean) => {
    if (typeof v !== "number") return EMPTY;
    if (!fine) return formatLength(v, units);
    // Two values that round alike at the usual precision: show them finer so the change is visible.
    return units === "metric" ? `${v.toFixed(4)} m` : `${(v / METRES_PER_INCH).toFixed(2)}"`;
  };
  const coarse: [string, string] = [show(a, false), show(b, false)];
  return coarse[0] === coarse[1] ? [show(a, true), show(b, true)] : coarse;
}

function showValue(attribute: string, v: unknown, names: Names): string {
  if (v === null || v === undefined || v === "") return EMPTY;
  const kind = FIELD_BY_ATTRIBUTE.get(attribute)?.kind;
  if (attribute === "fixtureTypeId") return names.types.get(Number(v)) ?? `type ${v}`;
  if (attribute === "focusPointId") return names.focusPoints.get(Number(v)) ?? `focus point ${v}`;
  if (attribute === "positionId") return names.positions.get(Number(v)) ?? `position ${v}`;
  if (kind === "angle" && typeof v === "number") return `${Number(v.toFixed(2))}°`;
  if (kind === "bool") return v ? "yes" : "no";
  return String(v);
}

function fieldChanges(plan: Extract<RowPlan, { action: "update" }>, names: Names, units: Units): FieldChange[] {
  return Object.entries(plan.changes).map(([attribute, to]) => {
    const spec = FIELD_BY_ATTRIBUTE.get(attribute);
    const from = plan.before[attribute];
    const [a, b] =
      spec?.kind === "length"
        ? lengthPair(from, to, units)
        : [showValue(attribute, from, names), showValue(attribute, to, names)];
    return { field: spec?.key ?? attribute, header: spec?.header ?? attribute, from: a, to: b };
  });
}

/** The preview's counts and its old → new list of the fixtures an import would change. */
export function importDiff(plans: RowPlan[], snap: Snapshot, units: Units, limit = 500): ImportDiff {
  const names = namesOf(snap);
  const counts = { new: 0, changed: 0, unchanged: 0 };
  const changed: FixtureChange[] = [];
  for (const plan of plans) {
    if (plan.action === "create") counts.new++;
    else if (plan.action === "unchanged") counts.unchanged++;
    else {
      counts.changed++;
      if (changed.length < limit)
        changed.push({
          row: plan.rowNumber,
          position: names.positions.get(plan.before.positionId) ?? `position ${plan.before.positionId}`,
          unitNumber: plan.before.unitNumber,
          fields: fieldChanges(plan, names, units),
        });
    }
  }
  return { counts, changed, changedTotal: counts.changed };
}

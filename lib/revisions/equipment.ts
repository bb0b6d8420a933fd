// The equipment list a rental shop packs from (units by type, accessories by kind, with spares), and the
// add / return list between two revisions. Pure, over snapshot fixtures.
import type { SnapFixture } from "./types";

export type EquipmentKind = "type" | "accessory";
export type EquipmentLine = { kind: EquipmentKind; name: string; inUse: number; spares: number; total: number };
export type ShopLine = {
  kind: EquipmentKind;
  name: string;
  before: number;
  after: number;
  add: number;
  return: number;
};

/**
 * Spares for `inUse` items at `percent`, rounded up: a shop sends whole units, and any spare at all is
 * better than none for a kind that is in the rig (common practice, no source).
 */
export function sparesFor(inUse: number, percent: number): number {
  if (inUse <= 0 || percent <= 0) return 0;
  // The small allowance keeps 10 % of 30 at 3, where 30 × 10 / 100 lands a hair above 3 in binary.
  return Math.ceil((inUse * percent) / 100 - 1e-9);
}

/**
 * Physical units per type. The cells of one multi-cell body share a body key on their position and are
 * one unit to the shop; a row without a body key is a unit of its own.
 */
function unitsByType(fixtures: SnapFixture[]): Map<string, number> {
  const bodies = new Map<string, Set<string>>();
  for (const f of fixtures) {
    const body = typeof f.bodyKey === "string" && f.bodyKey.trim() ? `${f.positionId}|${f.bodyKey.trim()}` : `#${f.id}`;
    const set = bodies.get(f.typeName) ?? new Set<string>();
    set.add(body);
    bodies.set(f.typeName, set);
  }
  return new Map([...bodies].map(([type, set]) => [type, set.size]));
}

function accessoriesByKind(fixtures: SnapFixture[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const f of fixtures) for (const kind of f.accessories ?? []) out.set(kind, (out.get(kind) ?? 0) + 1);
  return out;
}

const byName = (a: { kind: string; name: string }, b: { kind: string; name: string }) =>
  a.kind.localeCompare(b.kind) || a.name.localeCompare(b.name, undefined, { numeric: true });

/** Counts by type and by accessory kind, each with its spares at `sparesPercent` (0–100). */
export function equipmentList(fixtures: SnapFixture[], sparesPercent: number): EquipmentLine[] {
  const line =
    (kind: EquipmentKind) =>
    ([name, inUse]: [string, number]): EquipmentLine => {
      const spares = sparesFor(inUse, sparesPercent);
      return { kind, name, inUse, spares, total: inUse + spares };
    };
  return [
    ...[...unitsByType(fixtures)].map(line("type")),
    ...[...accessoriesByKind(fixtures)].map(line("accessory")),
  ].sort(byName);
}

/** What the shop sends (add) or takes back (return) to go from one list to the other, totals with spares. */
export function addReturnList(before: EquipmentLine[], after: EquipmentLine[]): ShopLine[] {
  const key = (l: EquipmentLine) => `${l.kind}\u0000${l.name}`;
  const was = new Map(before.map((l) => [key(l), l]));
  const now = new Map(after.map((l) => [key(l), l]));
  const out: ShopLine[] = [];
  for (const k of new Set([...was.keys(), ...now.keys()])) {
    const a = was.get(k)?.total ?? 0;
    const b = now.get(k)?.total ?? 0;
    if (a === b) continue;
    const { kind, name } = (now.get(k) ?? was.get(k)) as EquipmentLine;
    out.push({ kind, name, before: a, after: b, add: Math.max(0, b - a), return: Math.max(0, a - b) });
  }
  return out.sort(byName);
}

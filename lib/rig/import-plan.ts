// Decides, row by row, what an import would do to the rig — create, update or leave alone — before
// anything is written. Pure: the data layer hands in a snapshot of the production and writes the plan.
//
// Matching: a row is the fixture with the same position name and unit number (case does not matter,
// as in the database's collation). Unchanged values are not written, so a re-imported export changes
// nothing. Lengths within 0.1 mm and angles within 0.001° count as unchanged (exports round to that).
//
// Roles: the electrician may import, but only electrics fields (circuit, dimmer, universe, address,
// mode, footprint, type swap, hung/focused, as-focused notes). A row that would change any other field,
// add a fixture, or need a new position or type is refused, naming what it would change.
import { forbiddenFields, can, type Member } from "@/lib/auth/policy";
import { FIELD_BY_KEY, type ImportKey } from "@/lib/io/fields";
import { attributeOf, keyOfAttribute } from "@/lib/rig/fixture-fields";
import type { ParsedRow, RowError } from "@/lib/io/rows";

export type SnapshotFixture = Record<string, unknown> & {
  id: number;
  version: number;
  positionId: number;
  fixtureTypeId: number;
  unitNumber: string;
  address: number | null;
  footprint: number | null;
};
export type Snapshot = {
  positions: Array<{ id: number; name: string; x1: number; y1: number; x2: number | null; y2: number | null }>;
  types: Array<{ id: number; name: string; dmxModes: Array<{ name: string; footprint: number }> }>;
  focusPoints: Array<{ id: number; name: string }>;
  fixtures: SnapshotFixture[];
};

export type RowPlan =
  | { rowNumber: number; action: "create"; values: Record<string, unknown>; positionName: string; typeName: string }
  | {
      rowNumber: number;
      action: "update";
      fixtureId: number;
      version: number;
      changes: Record<string, unknown>;
      before: SnapshotFixture;
    }
  | { rowNumber: number; action: "unchanged"; fixtureId: number };

export type ImportPlanResult = {
  plans: RowPlan[];
  errors: RowError[];
  newPositions: string[]; // names (as first written in the file)
  newTypes: string[];
  counts: { create: number; update: number; unchanged: number };
};

function same(kind: string, a: unknown, b: unknown): boolean {
  const na = a === "" || a === undefined ? null : a;
  const nb = b === "" || b === undefined ? null : b;
  if (na === null || nb === null) return na === nb;
  if (kind === "length") return Math.abs(Number(na) - Number(nb)) < 1e-4;
  if (kind === "angle" || kind === "number") return Math.abs(Number(na) - Number(nb)) < 1e-3;
  if (kind === "bool") return Boolean(na) === Boolean(nb);
  return na === nb;
}

const lower = (s: unknown) => String(s).trim().toLowerCase();

export function planImport(
  rows: ParsedRow[],
  snap: Snapshot,
  opts: { member: Member; createMissing: boolean; columnOf: (key: string) => string },
): ImportPlanResult {
  const positions = new Map(snap.positions.map((p) => [lower(p.name), p]));
  const types = new Map(snap.types.map((t) => [lower(t.name), t]));
  const points = new Map(snap.focusPoints.map((p) => [lower(p.name), p]));
  const fixtures = new Map(snap.fixtures.map((f) => [`${f.positionId}|${lower(f.unitNumber)}`, f]));
  const mayPlot = can(opts.member, "plot.edit");
  const newPositions = new Map<string, string>();
  const newTypes = new Map<string, string>();
  const plans: RowPlan[] = [];
  const errors: RowError[] = [];
  const err = (row: number, key: string, message: string) => errors.push({ row, column: opts.columnOf(key), message });

  for (const { rowNumber, values } of rows) {
    const before = errors.length;
    const positionName = String(values.position);
    const position = positions.get(lower(positionName));
    if (!position) {
      if (!mayPlot)
        err(
          rowNumber,
          "position",
          `There is no position called "${positionName}"; only the designer can add positions`,
        );
      else if (!opts.createMissing)
        err(
          rowNumber,
          "position",
          `There is no position called "${positionName}" (choose "create what is missing" to add it)`,
        );
      else newPositions.set(lower(positionName), newPositions.get(lower(positionName)) ?? positionName);
    }
    let typeId: number | null = null;
    if (values.type !== undefined) {
      const type = types.get(lower(values.type));
      if (type) typeId = type.id;
      else if (!mayPlot)
        err(rowNumber, "type", `There is no fixture type called "${values.type}"; only the designer can add types`);
      else if (!opts.createMissing)
        err(
          rowNumber,
          "type",
          `There is no fixture type called "${values.type}" (choose "create what is missing" to add it)`,
        );
      else newTypes.set(lower(values.type), newTypes.get(lower(values.type)) ?? String(values.type));
    }
    let focusPointId: number | null | undefined;
    if (values.focusPoint !== undefined) {
      const point = values.focusPoint === null ? null : points.get(lower(values.focusPoint));
      if (point === undefined) err(rowNumber, "focusPoint", `There is no focus point called "${values.focusPoint}"`);
      focusPointId = point?.id ?? null;
    }
    if (errors.length > before) continue;

    const existing = position ? fixtures.get(`${position.id}|${lower(values.unitNumber)}`) : undefined;
    const resolved: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(values) as Array<[ImportKey, unknown]>) {
      if (key === "position") resolved.positionId = position?.id ?? null;
      else if (key === "type") resolved.fixtureTypeId = typeId;
      else if (key === "focusPoint") resolved.focusPointId = focusPointId;
      else if (value !== undefined) resolved[attributeOf(key)] = value;
    }

    if (!existing) {
      if (!mayPlot) {
        err(
          rowNumber,
          "unitNumber",
          `Unit ${values.unitNumber} on ${positionName} is not in the rig; only the designer can add fixtures`,
        );
        continue;
      }
      if (values.type === undefined) {
        err(rowNumber, "unitNumber", `Unit ${values.unitNumber} on ${positionName} is new, so it needs a Type column`);
        continue;
      }
      if (!dmxFits(rowNumber, resolved, null, snap, typeId, err)) continue;
      plans.push({ rowNumber, action: "create", values: resolved, positionName, typeName: String(values.type) });
      continue;
    }

    const changes: Record<string, unknown> = {};
    for (const key of Object.keys(values) as ImportKey[]) {
      const attr = attributeOf(key);
      if (key === "unitNumber" || key === "position" || resolved[attr] === undefined) continue;
      if (!same(FIELD_BY_KEY.get(key)!.kind, resolved[attr], existing[attr])) changes[attr] = resolved[attr];
    }
    const denied = forbiddenFields(opts.member, "fixture", Object.keys(changes));
    if (denied.length) {
      const keyOf = (attr: string) => keyOfAttribute(attr) as ImportKey;
      for (const attr of denied)
        err(
          rowNumber,
          keyOf(attr),
          `Your role cannot change ${FIELD_BY_KEY.get(keyOf(attr))?.header ?? attr} (it would go from ${show(existing[attr])} to ${show(changes[attr])})`,
        );
      continue;
    }
    if (!Object.keys(changes).length) {
      plans.push({ rowNumber, action: "unchanged", fixtureId: existing.id });
      continue;
    }
    if (
      !dmxFits(
        rowNumber,
        { ...existing, ...changes },
        existing,
        snap,
        (changes.fixtureTypeId as number) ?? existing.fixtureTypeId,
        err,
      )
    )
      continue;
    plans.push({
      rowNumber,
      action: "update",
      fixtureId: existing.id,
      version: existing.version,
      changes,
      before: existing,
    });
  }
  const counts = { create: 0, update: 0, unchanged: 0 };
  for (const p of plans) counts[p.action]++;
  return { plans, errors, newPositions: [...newPositions.values()], newTypes: [...newTypes.values()], counts };
}

const show = (v: unknown) => (v === null || v === undefined || v === "" ? "empty" : `"${String(v)}"`);

/** ANSI E1.11 (DMX512-A): a fixture's slots run from its address to address + footprint − 1, within 1–512. */
function dmxFits(
  rowNumber: number,
  f: Record<string, unknown>,
  _existing: unknown,
  snap: Snapshot,
  typeId: number | null,
  err: (r: number, k: string, m: string) => void,
): boolean {
  const address = f.address as number | null | undefined;
  if (address == null) return true;
  const type = snap.types.find((t) => t.id === typeId);
  const footprint = (f.footprint as number | null | undefined) ?? type?.dmxModes?.[0]?.footprint ?? 1;
  if (address + footprint - 1 <= 512) return true;
  err(rowNumber, "address", `A ${footprint}-slot fixture at address ${address} runs past slot 512`);
  return false;
}

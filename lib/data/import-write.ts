import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { unitSortKey } from "@/lib/rig/unit-number";
import { emptyFixture } from "@/lib/rig/fixture-fields";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import { isPointHung, type PositionKind } from "@/lib/rig/position-kinds";
import type { ImportPlanResult } from "@/lib/rig/import-plan";
import { batchInsert } from "./batch-insert";
import type { Progress } from "./import-progress";
import { bulkCreateWithIds } from "./bulk-create";
import { inTransaction } from "./transaction";

const CHUNK = 500;
const lower = (s: string) => s.trim().toLowerCase();

// A position named in a file carries no geometry: it is drawn as a 10 m line (or a point for point-hung
// kinds such as booms) at the centre line and a 6 m trim, for the designer to move on the plot.
function guessKind(name: string): PositionKind {
  const n = name.toLowerCase();
  if (/box.?boom/.test(n)) return "box-boom";
  if (/boom/.test(n)) return "boom";
  if (/pipe.?end/.test(n)) return "pipe-end";
  if (/ladder/.test(n)) return "ladder";
  if (/truss/.test(n)) return "truss";
  if (/bridge|foh|front of house|catwalk/.test(n)) return "foh-bridge";
  if (/rail|balcony/.test(n)) return "foh-rail";
  if (/floor|deck/.test(n)) return "floor";
  return "overhead-pipe";
}

async function createPositions(productionId: number, names: string[], transaction: Transaction) {
  const { Position } = getDb();
  const top = ((await Position.max("sortOrder", { where: { productionId }, transaction })) as number | null) ?? -1;
  const rows = names.map((name, i) => {
    const kind = guessKind(name);
    const line = !isPointHung(kind);
    return {
      productionId,
      name,
      kind,
      x1: line ? -5 : 0,
      y1: 0,
      x2: line ? 5 : null,
      y2: line ? 0 : null,
      trimHeight: kind === "floor" ? 0 : 6,
      ratedLoadKg: null,
      sortOrder: top + 1 + i,
    };
  });
  const created = await bulkCreateWithIds(Position, rows, { transaction });
  return new Map(created.map((p) => [lower(p.name), p]));
}

// A type named in a file becomes the starter type of that name when there is one, else a placeholder
// profile with typical figures (from memory) for the designer to correct.
async function createTypes(productionId: number, names: string[], transaction: Transaction) {
  const { FixtureType } = getDb();
  const rows = names.map((name) => {
    const starter = STARTER_TYPES.find((t) => lower(t.name) === lower(name));
    return starter
      ? { ...starter, productionId, name }
      : {
          productionId,
          name,
          family: "profile",
          coneMinDeg: 26,
          coneMaxDeg: 26,
          defaultSoftnessDeg: 2,
          peakCandela: 30000,
          dmxModes: [{ name: "dimmer", footprint: 1 }],
          frameSize: null,
          goboSize: null,
        };
  });
  const created = await bulkCreateWithIds(FixtureType, rows as never[], { transaction });
  return new Map(created.map((t) => [lower(t.name), t.id]));
}

// Every column a new row may leave out, with the value the table gives it (the registry's defaults).
const EMPTY: Record<string, unknown> = emptyFixture();

type UpdatePlan = Extract<ImportPlanResult["plans"][number], { action: "update" }>;

// Updates of one chunk as a single statement: each changed column is a CASE over the ids, the version
// goes up by one, and the WHERE keeps optimistic locking (each id only at the version that was checked).
// Every matched row changes (its version), so affected rows = matched rows; fewer means someone else wrote.
async function updateChunk(productionId: number, chunk: UpdatePlan[], transaction: Transaction) {
  const { sequelize } = getDb();
  const attrs = [...new Set(chunk.flatMap((u) => Object.keys(withSort(u.changes))))];
  const q = (name: string) => sequelize.getQueryInterface().quoteIdentifier(name);
  const replacements: unknown[] = [];
  const sets = attrs.map((attr) => {
    const whens = chunk.flatMap((u) => {
      const changes = withSort(u.changes);
      if (!(attr in changes)) return [];
      replacements.push(u.fixtureId, changes[attr]);
      return ["WHEN ? THEN ?"];
    });
    return `${q(fieldOf(attr))} = CASE id ${whens.join(" ")} ELSE ${q(fieldOf(attr))} END`;
  });
  const versionWhens = chunk.map((u) => (replacements.push(u.fixtureId, u.version), "WHEN ? THEN ?")).join(" ");
  replacements.push(productionId, ...chunk.map((u) => u.fixtureId));
  const sql = `UPDATE fixtures SET ${[...sets, "version = version + 1", "updated_at = NOW()"].join(", ")} WHERE version = CASE id ${versionWhens} END AND production_id = ? AND id IN (${chunk.map(() => "?").join(",")})`;
  // BULKUPDATE makes Sequelize answer with the number of affected rows.
  const affected = (await sequelize.query(sql, {
    replacements: replacements.map(dbValue),
    transaction,
    type: QueryTypes.BULKUPDATE,
  })) as unknown as number;
  if (affected !== chunk.length) {
    throw new AppError(
      "conflict",
      `Nothing was imported: a fixture in rows ${chunk[0].rowNumber}–${chunk[chunk.length - 1].rowNumber} was changed by someone else while the file was being checked. Check the file again.`,
    );
  }
}

const fieldOf = (attr: string) =>
  (getDb().Fixture.getAttributes() as Record<string, { field?: string }>)[attr]?.field ?? attr;

async function idsByUnit(productionId: number, transaction: Transaction) {
  const found = (await getDb().sequelize.query(
    "SELECT id, position_id AS positionId, unit_number AS unitNumber FROM fixtures WHERE production_id = ?",
    { replacements: [productionId], type: QueryTypes.SELECT, transaction },
  )) as Array<{ id: number; positionId: number; unitNumber: string }>;
  return new Map(found.map((f) => [`${f.positionId}|${lower(f.unitNumber)}`, f.id]));
}

// Change records go through the driver's batch too: one per fixture, as recordChange would write them,
// but holding only what the import wrote (see `createdRecord` and the update records below).
async function insertChanges(changes: Array<Record<string, unknown>>, transaction: Transaction) {
  const columns = ["production_id", "user_id", "entity", "entity_id", "action", "before", "after"];
  const rows = changes.map((c) => [c.productionId, c.userId, c.entity, c.entityId, c.action, c.before, c.after]);
  await batchInsert(transaction, "change_entries", columns, rows, { created_at: "NOW()" });
}

// A created fixture's change record names the fields the file set (and its id, place and version);
// every field it leaves out holds the table's default (EMPTY: empty, or deck, not hung, not focused).
// That is the same fixture as a full record, in well under half the bytes.
function createdRecord(attrs: string[], row: unknown[], id: number) {
  const after: Record<string, unknown> = { id };
  for (let i = 0; i < attrs.length; i++) {
    const a = attrs[i];
    const v = row[i];
    if (a !== "productionId" && a !== "unitSort" && v != null && v !== EMPTY[a]) after[a] = v;
  }
  after.version = 1;
  return after;
}

const withSort = (changes: Record<string, unknown>) =>
  changes.unitNumber ? { ...changes, unitSort: unitSortKey(String(changes.unitNumber)) } : changes;
const dbValue = (v: unknown) => (typeof v === "boolean" ? Number(v) : v === undefined ? null : v);

/** Writes a checked plan in one transaction: every row lands, or (on any error) none does. */
export async function writeImport({
  productionId,
  userId,
  plan,
  progress,
}: {
  productionId: number;
  userId: number;
  plan: ImportPlanResult;
  progress?: Progress;
}) {
  const { Position } = getDb();
  const creates = plan.plans.filter((p) => p.action === "create");
  const updates = plan.plans.filter((p): p is UpdatePlan => p.action === "update");
  const total = creates.length + updates.length;
  let done = 0;
  progress?.("writing", 0, total);
  await inTransaction(async (transaction) => {
    const newPositions = plan.newPositions.length
      ? await createPositions(productionId, plan.newPositions, transaction)
      : new Map();
    const newTypes = plan.newTypes.length
      ? await createTypes(productionId, plan.newTypes, transaction)
      : new Map<string, number>();
    const positions = new Map(
      (await Position.findAll({ where: { productionId }, transaction, raw: true })).map((p) => [p.id, p]),
    );
    for (const p of newPositions.values()) positions.set(p.id, p);

    // Only the attributes some new row sets (names as in the model): every other column takes its table
    // default, which is EMPTY's value; a row that does not set an attribute another row sets gets EMPTY's.
    const attrs = [
      ...new Set([
        "productionId",
        "positionId",
        "fixtureTypeId",
        "unitNumber",
        "unitSort",
        "x",
        "y",
        ...creates.flatMap((c) => Object.keys(c.values)),
      ]),
    ];
    const at = new Map(attrs.map((a, i) => [a, i]));
    const rows = creates.map((c) => {
      const v = c.values as Record<string, unknown>;
      const positionId = (v.positionId as number | null) ?? newPositions.get(lower(c.positionName))!.id;
      const pos = positions.get(positionId)!;
      const row = attrs.map((a) => (a in v ? v[a] : (EMPTY[a] ?? null)));
      row[at.get("positionId")!] = positionId;
      row[at.get("fixtureTypeId")!] = (v.fixtureTypeId as number | null) ?? newTypes.get(lower(c.typeName))!;
      // Without X/Y a new unit sits at the middle of its position until someone places it on the plot.
      row[at.get("x")!] = (v.x as number | undefined) ?? (pos.x2 != null ? (pos.x1 + pos.x2) / 2 : pos.x1);
      row[at.get("y")!] = (v.y as number | undefined) ?? (pos.y2 != null ? (pos.y1 + pos.y2) / 2 : pos.y1);
      row[at.get("productionId")!] = productionId;
      row[at.get("unitNumber")!] = String(v.unitNumber);
      row[at.get("unitSort")!] = unitSortKey(String(v.unitNumber));
      return row;
    });
    const changes: Array<Record<string, unknown>> = [];
    const writeChanges = () => insertChanges(changes.splice(0), transaction);
    const fields = attrs.map(fieldOf);
    for (let i = 0; i < rows.length; i += CHUNK) {
      const chunk = rows.slice(i, i + CHUNK);
      await batchInsert(transaction, "fixtures", fields, chunk, {
        version: "1",
        created_at: "NOW()",
        updated_at: "NOW()",
      });
      done += chunk.length;
      progress?.("writing", done, total);
    }
    if (rows.length) {
      // Read back only the ids (position + unit number is unique), not whole fixtures, for the change records.
      const ids = await idsByUnit(productionId, transaction);
      const pi = at.get("positionId")!;
      const ui = at.get("unitNumber")!;
      for (const r of rows) {
        const id = ids.get(`${r[pi]}|${lower(r[ui] as string)}`)!;
        changes.push({
          productionId,
          userId,
          entity: "fixture",
          entityId: id,
          action: "create",
          before: null,
          after: createdRecord(attrs, r, id),
        });
        if (changes.length >= CHUNK) await writeChanges();
      }
      await writeChanges();
    }
    for (let i = 0; i < updates.length; i += CHUNK) {
      const chunk = updates.slice(i, i + CHUNK);
      await updateChunk(productionId, chunk, transaction);
      // An update's record holds the fields it changed, before and after, and the version.
      for (const u of chunk) {
        const before: Record<string, unknown> = { id: u.fixtureId };
        for (const attr of Object.keys(u.changes)) before[attr] = u.before[attr] ?? null;
        before.version = u.version;
        changes.push({
          productionId,
          userId,
          entity: "fixture",
          entityId: u.fixtureId,
          action: "update",
          before,
          after: { id: u.fixtureId, ...u.changes, version: u.version + 1 },
        });
      }
      await writeChanges();
      done += chunk.length;
      progress?.("writing", done, total);
    }
    // The last step before the commit: a listener that has gone away (the request was abandoned) throws
    // here, and the whole import rolls back rather than landing unseen.
    progress?.("writing", total, total);
  });
}

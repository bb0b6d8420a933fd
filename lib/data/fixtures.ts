import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import { getDb, type Fixture } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { FixtureCreate, FixturePatch } from "@/lib/validation/fixture";
import type { FixtureDto, FixtureRecord } from "@/lib/dto/fixture";
import { emptyFixture, FIXTURE_FIELDS } from "@/lib/rig/fixture-fields";
import { fixtureJoiner, joinFixtures } from "@/lib/rig/fixture-join";
import { unitSortKey } from "@/lib/rig/unit-number";
import { plain } from "./plain";
import { jsonColumn } from "./json-column";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { requireProduction } from "./productions";
import { inTransaction } from "./transaction";

// Every registry field, then identity and bookkeeping: the keys of FixtureRecord.
const RECORD_KEYS = [
  "id",
  "productionId",
  ...FIXTURE_FIELDS.map((f) => f.attribute),
  "focusedAt",
  "focusedBy",
  "version",
  "updatedAt",
] as const;

export function toFixtureRecord(f: Fixture): FixtureRecord {
  const record = plain(f as unknown as Record<string, unknown>, RECORD_KEYS) as unknown as FixtureRecord;
  // Booleans are TINYINT in MariaDB and a JSON column can arrive as text on a raw read.
  record.hung = Boolean(record.hung);
  record.focused = Boolean(record.focused);
  record.shutterCuts = jsonColumn(record.shutterCuts);
  return record;
}

// Reads that only feed the join and the JSON answer are raw rows (the same values, camelCase keys):
// building Sequelize instances for 1,500 fixtures was the largest cost of the rig list after the JSON itself.
async function joinerFor(productionId: number, headHeight: number) {
  const { Position, FixtureType, FocusPoint } = getDb();
  const [positions, types, points] = await Promise.all([
    Position.findAll({ where: { productionId }, raw: true }),
    FixtureType.findAll({ where: { productionId }, raw: true }),
    FocusPoint.findAll({ where: { productionId }, raw: true }),
  ]);
  return {
    join: fixtureJoiner({ positions, types, points }, headHeight),
    positions: new Map(positions.map((p) => [p.id, p])),
  };
}

/** Every fixture of a production in hanging order (position order, then unit number), with computed geometry. */
/** The change record of one fixture's update, before and after, in the update's own transaction. */
export function recordFixtureUpdate(
  change: { productionId: number; userId: number; fixtureId: number; before: Fixture; after: Fixture },
  transaction: Transaction,
) {
  const { productionId, userId, fixtureId, before, after } = change;
  return recordChange(
    {
      productionId,
      userId,
      entity: "fixture",
      entityId: fixtureId,
      action: "update",
      before: toFixtureRecord(before),
      after: toFixtureRecord(after),
    },
    transaction,
  );
}

/**
 * A fingerprint of everything the rig list is computed from: the production's fixtures, positions,
 * types and focus points (row count, highest id, sum of versions, latest change) and its head height.
 * Every write bumps a version (optimistic locking) and ids only grow, so any committed change moves it;
 * read before the list itself, a list is never filed under a newer fingerprint than its own data.
 * One indexed query, a small fraction of computing the list (see lib/http/stamped-json.ts).
 */
export async function fixtureListStamp(productionId: number): Promise<string> {
  const part = (table: string) =>
    `(SELECT CONCAT_WS('/', COUNT(*), MAX(id), SUM(version), MAX(updated_at)) FROM ${table} WHERE production_id = :id)`;
  const [row] = await getDb().sequelize.query<{ stamp: string | null }>(
    `SELECT CONCAT_WS('|', ${["fixtures", "positions", "fixture_types", "focus_points"].map(part).join(", ")},
       (SELECT CONCAT_WS('/', version, head_height) FROM productions WHERE id = :id)) AS stamp`,
    { replacements: { id: productionId }, type: QueryTypes.SELECT },
  );
  return row?.stamp ?? "";
}

export async function getFixturesByProduction({ productionId }: { productionId: number }): Promise<FixtureDto[]> {
  const production = await requireProduction(productionId);
  const [rows, { join, positions }] = await Promise.all([
    getDb().Fixture.findAll({
      where: { productionId },
      order: [
        ["positionId", "ASC"],
        ["unitSort", "ASC"],
        ["cell", "ASC"],
      ],
      raw: true,
    }),
    joinerFor(productionId, production.headHeight),
  ]);
  const order = (id: number) => positions.get(id)?.sortOrder ?? 0;
  return joinFixtures(rows.map(toFixtureRecord), join).sort(
    (a, b) => order(a.positionId) - order(b.positionId) || a.positionName.localeCompare(b.positionName) || 0,
  );
}

export async function getFixtureById({
  productionId,
  fixtureId,
}: {
  productionId: number;
  fixtureId: number;
}): Promise<FixtureDto | null> {
  return (await getFixturesByIds({ productionId, fixtureIds: [fixtureId] }))[0] ?? null;
}

type JoinedRow = Fixture & {
  position: Record<string, unknown>;
  fixtureType: Record<string, unknown>;
  focusPoint: Record<string, unknown>;
  production: { headHeight: number };
};

/**
 * A few fixtures with their own position, type, focus point and the production's head height, read in
 * one query (the list reads each related table whole instead; for one row that would be four queries).
 * Ids not in the production are left out; the order is by id.
 */
export async function getFixturesByIds({
  productionId,
  fixtureIds,
  transaction,
}: {
  productionId: number;
  fixtureIds: number[];
  transaction?: Transaction;
}): Promise<FixtureDto[]> {
  if (fixtureIds.length === 0) return [];
  const { Fixture, Position, FixtureType, FocusPoint, Production } = getDb();
  const rows = (await Fixture.findAll({
    where: { productionId, id: fixtureIds },
    include: [
      { model: Position, as: "position", where: { productionId } },
      { model: FixtureType, as: "fixtureType", where: { productionId } },
      { model: FocusPoint, as: "focusPoint", required: false },
      { model: Production, as: "production", attributes: ["headHeight"] },
    ],
    order: [["id", "ASC"]],
    raw: true,
    nest: true,
    transaction,
  })) as unknown as JoinedRow[];
  const out: FixtureDto[] = [];
  for (const row of rows) {
    // A fixture with no focus point comes back with a point whose every column is null.
    const point = row.focusPoint?.id != null ? [row.focusPoint] : [];
    const join = fixtureJoiner(
      { positions: [row.position], types: [row.fixtureType], points: point } as never,
      Number(row.production.headHeight),
    );
    const joined = join(toFixtureRecord(row));
    if (joined) out.push(joined);
  }
  return out;
}

/** The fields checkReferences looks at: a patch touching none of them cannot break a reference or the DMX range. */
const REFERENCE_FIELDS = ["positionId", "fixtureTypeId", "focusPointId", "address", "footprint"] as const;

/**
 * Checks that referenced rows belong to the same production and that the DMX range fits the universe.
 * Inside a transaction the reads run one after another on its connection (never a second one from the pool).
 */
async function checkReferences(productionId: number, merged: FixtureRecord, transaction?: Transaction) {
  const { Position, FixtureType, FocusPoint } = getDb();
  const position = await Position.findOne({ where: { productionId, id: merged.positionId }, transaction });
  const type = await FixtureType.findOne({ where: { productionId, id: merged.fixtureTypeId }, transaction });
  const point = merged.focusPointId
    ? await FocusPoint.findOne({ where: { productionId, id: merged.focusPointId }, transaction })
    : null;
  const fieldErrors: Record<string, string[]> = {};
  if (!position) fieldErrors.positionId = ["no such position in this production"];
  if (!type) fieldErrors.fixtureTypeId = ["no such fixture type in this production"];
  if (merged.focusPointId && !point) fieldErrors.focusPointId = ["no such focus point in this production"];
  const footprint = merged.footprint ?? type?.dmxModes?.[0]?.footprint ?? 1;
  // ANSI E1.11 (DMX512-A): slots 1–512; a fixture may not straddle two universes.
  if (merged.address != null && merged.address + footprint - 1 > 512) {
    fieldErrors.address = [`a ${footprint}-slot fixture at ${merged.address} runs past slot 512`];
  }
  if (Object.keys(fieldErrors).length) {
    throw new AppError(
      "bad_request",
      `Please check the input — ${Object.entries(fieldErrors)
        .map(([k, v]) => `${k}: ${v[0]}`)
        .join("; ")}`,
      { fieldErrors },
    );
  }
}

export async function updateFixture({
  productionId,
  fixtureId,
  patch,
  userId,
}: {
  productionId: number;
  fixtureId: number;
  patch: FixturePatch;
  userId: number;
}): Promise<FixtureDto> {
  const { Fixture } = getDb();
  const { version, ...changes } = patch;
  if (Object.keys(changes).length === 0)
    throw new AppError("bad_request", "Nothing to change: send at least one field.");
  // The row is read first only when the change needs it: references and DMX range to check against the
  // merged row, or the moment a unit is first marked focused. A note or a colour goes straight to the lock.
  const needsRow = REFERENCE_FIELDS.some((k) => changes[k] !== undefined) || changes.focused === true;
  const existing = needsRow ? await Fixture.findOne({ where: { productionId, id: fixtureId } }) : null;
  if (needsRow && !existing) throw notFound("Fixture");
  if (existing && REFERENCE_FIELDS.some((k) => changes[k] !== undefined))
    await checkReferences(productionId, { ...toFixtureRecord(existing), ...changes } as FixtureRecord);

  const write: Record<string, unknown> = { ...changes };
  if (changes.unitNumber !== undefined) write.unitSort = unitSortKey(changes.unitNumber);
  if (changes.focused === true && !existing?.focused)
    Object.assign(write, { focusedAt: new Date(), focusedBy: userId });
  if (changes.focused === false) Object.assign(write, { focusedAt: null, focusedBy: null });

  await inTransaction(async (transaction) => {
    const { before, after } = await versionedUpdate({
      model: Fixture,
      scope: { productionId },
      id: fixtureId,
      version,
      changes: write,
      toDto: toFixtureRecord,
      what: "Fixture",
      transaction,
    }).catch((err) => {
      if ((err as { name?: string }).name === "SequelizeUniqueConstraintError") {
        throw new AppError("bad_request", "Another fixture on that position already has this unit number.", {
          fieldErrors: { unitNumber: ["already used on this position"] },
        });
      }
      throw err;
    });
    await recordFixtureUpdate({ productionId, userId, fixtureId, before, after }, transaction);
  });
  return (await getFixtureById({ productionId, fixtureId }))!;
}

/** Creates fixtures in one transaction (all or none); returns them with computed geometry. */
export async function createFixtures({
  productionId,
  userId,
  inputs,
}: {
  productionId: number;
  userId: number;
  inputs: FixtureCreate[];
}): Promise<FixtureDto[]> {
  const { Fixture } = getDb();
  const ids = await inTransaction(async (transaction) => {
    const created: number[] = [];
    for (const [i, input] of inputs.entries()) {
      const merged = { ...emptyFixture(), ...input } as unknown as FixtureRecord;
      await checkReferences(productionId, merged, transaction).catch((err) => {
        if (err instanceof AppError && inputs.length > 1) err.message = `Fixture ${i + 1}: ${err.message}`;
        throw err;
      });
      const row = await Fixture.create(
        { ...emptyFixture(), ...input, productionId, unitSort: unitSortKey(input.unitNumber) },
        { transaction },
      ).catch((err) => {
        if ((err as { name?: string }).name === "SequelizeUniqueConstraintError") {
          throw new AppError("bad_request", `Unit ${input.unitNumber} already exists on that position.`, {
            fieldErrors: { unitNumber: ["already used on this position"] },
          });
        }
        throw err;
      });
      await recordChange(
        { productionId, userId, entity: "fixture", entityId: row.id, action: "create", after: toFixtureRecord(row) },
        transaction,
      );
      created.push(row.id);
    }
    return created;
  });
  return getFixturesByIds({ productionId, fixtureIds: ids });
}

/** Deletes fixtures of this production by id, recording each; unknown ids are a 404 and nothing is deleted. */
export async function deleteFixtures({
  productionId,
  userId,
  fixtureIds,
}: {
  productionId: number;
  userId: number;
  fixtureIds: number[];
}) {
  const { Fixture } = getDb();
  await inTransaction(async (transaction) => {
    // Locked in id order, as every multi-row edit does, so two overlapping edits queue instead of deadlocking.
    const rows = await Fixture.findAll({
      where: { productionId, id: fixtureIds },
      order: [["id", "ASC"]],
      lock: true,
      transaction,
    });
    if (rows.length !== new Set(fixtureIds).size) throw notFound("Fixture");
    for (const row of rows) {
      await recordChange(
        { productionId, userId, entity: "fixture", entityId: row.id, action: "delete", before: toFixtureRecord(row) },
        transaction,
      );
    }
    await Fixture.destroy({ where: { productionId, id: fixtureIds }, transaction });
  });
}

import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import { getDb, type Fixture } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { FixtureCreate, FixturePatch } from "@/lib/validation/fixture";
import type { FixtureDto, FixtureRecord } from "@/lib/dto/fixture";
import { emptyFixture, FIXTURE_FIELDS } from "@/lib/rig/fixture-fields";
import {
  fixtureJoiner,
  JOIN_POINT_KEYS,
  JOIN_POSITION_KEYS,
  JOIN_TYPE_KEYS,
  joinFixtures,
} from "@/lib/rig/fixture-join";
import { unitSortKey } from "@/lib/rig/unit-number";
import { plain } from "./plain";
import { jsonColumn } from "./json-column";
import { staleVersion } from "./versioned";
import { recordChange, recordChangeOn } from "./changes";
import { isDuplicateKey } from "./unique";
import {
  byAttribute,
  driverQuery,
  inDriverTransaction,
  selectList,
  setClause,
  settled,
  splitRow,
  storedNow,
} from "./driver";
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

/** A model instance or a row read by attribute name as the stored record (dates as ISO text). */
export function toFixtureRecord(f: Fixture | Record<string, unknown>): FixtureRecord {
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

/** The SELECT … FROM of the joined read, built once from the models (its text does not change). */
let joinedSelect: string | undefined;
function joinedFixtureSelect(): string {
  if (joinedSelect) return joinedSelect;
  const { Fixture, Position, FixtureType, FocusPoint } = getDb();
  joinedSelect = `SELECT ${selectList(Fixture, "f", "fixture")},
            ${selectList(Position, "p", "position", JOIN_POSITION_KEYS)},
            ${selectList(FixtureType, "t", "type", JOIN_TYPE_KEYS)},
            ${selectList(FocusPoint, "fp", "point", JOIN_POINT_KEYS)},
            pr.head_height AS \`production.headHeight\`
       FROM fixtures f
       JOIN positions p ON p.id = f.position_id AND p.production_id = f.production_id
       JOIN fixture_types t ON t.id = f.fixture_type_id AND t.production_id = f.production_id
       LEFT JOIN focus_points fp ON fp.id = f.focus_point_id AND fp.production_id = f.production_id
       JOIN productions pr ON pr.id = f.production_id`;
  return joinedSelect;
}

/**
 * A few fixtures with their own position, type, focus point and the production's head height, read in
 * one statement (the list reads each related table whole instead; for one row that would be four queries).
 * Ids not in the production are left out; the order is by id. A plain driver statement: this read answers
 * every single-fixture GET and every edit (lib/data/driver.ts says why).
 */
export async function getFixturesByIds({
  productionId,
  fixtureIds,
}: {
  productionId: number;
  fixtureIds: number[];
}): Promise<FixtureDto[]> {
  if (fixtureIds.length === 0) return [];
  const { sql, values } = fixturesByIdsStatement(productionId, fixtureIds);
  return joinedFixtures(await driverQuery(sql, values));
}

function fixturesByIdsStatement(productionId: number, fixtureIds: number[]) {
  return {
    sql: `${joinedFixtureSelect()}
      WHERE f.production_id = ? AND f.id IN (${fixtureIds.map(() => "?").join(", ")})
      ORDER BY f.id`,
    values: [productionId, ...fixtureIds],
  };
}

/** Rows of the joined read as fixtures with their names and pools. */
function joinedFixtures(rows: Array<Record<string, unknown>>): FixtureDto[] {
  const out: FixtureDto[] = [];
  for (const row of rows) {
    const { fixture, position, type, point, production } = splitRow(row);
    // A fixture with no focus point comes back with a point whose every column is null.
    const join = fixtureJoiner(
      { positions: [position], types: [type], points: point.id != null ? [point] : [] } as never,
      Number(production.headHeight),
    );
    const joined = join(toFixtureRecord(fixture));
    if (joined) out.push(joined);
  }
  return out;
}

/** The fields checkReferences looks at: a patch touching none of them cannot break a reference or the DMX range. */
const REFERENCE_FIELDS = ["positionId", "fixtureTypeId", "focusPointId", "address", "footprint"] as const;

/** Whether each referenced row is in the production (the type's DMX modes stand for the type), in one read. */
const REFERENCES_SQL = `SELECT
    (SELECT 1 FROM positions WHERE production_id = ? AND id = ?) AS position,
    (SELECT dmx_modes FROM fixture_types WHERE production_id = ? AND id = ?) AS dmxModes,
    (SELECT 1 FROM focus_points WHERE production_id = ? AND id = ?) AS point`;

/** Runs one SELECT with positional values: on a Sequelize transaction's connection or a driver connection. */
type Select = (sql: string, values: unknown[]) => Promise<Array<Record<string, unknown>>>;

/**
 * Checks that referenced rows belong to the same production and that the DMX range fits the universe,
 * reading through `select` so the reads run inside the caller's transaction (never on a second connection).
 */
async function checkReferences(select: Select, productionId: number, merged: FixtureRecord) {
  const [found] = await select(REFERENCES_SQL, [
    productionId,
    merged.positionId,
    productionId,
    merged.fixtureTypeId,
    productionId,
    merged.focusPointId ?? 0,
  ]);
  const dmxModes = found.dmxModes == null ? null : jsonColumn<Array<{ footprint?: number }>>(found.dmxModes);
  const fieldErrors: Record<string, string[]> = {};
  if (found.position == null) fieldErrors.positionId = ["no such position in this production"];
  if (dmxModes == null) fieldErrors.fixtureTypeId = ["no such fixture type in this production"];
  if (merged.focusPointId && found.point == null) fieldErrors.focusPointId = ["no such focus point in this production"];
  const footprint = merged.footprint ?? dmxModes?.[0]?.footprint ?? 1;
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

/** A duplicate (position, unit number) from the database as the 400 the user can act on. */
function duplicateUnit(message: string) {
  return (err: unknown): never => {
    if (isDuplicateKey(err)) {
      throw new AppError("bad_request", message, { fieldErrors: { unitNumber: ["already used on this position"] } });
    }
    throw err;
  };
}

/**
 * An optimistic-locked edit of one fixture, with its change record, in one transaction of plain statements
 * sent in four round trips: START with the locking read; the reference check, only when a reference or the
 * address changes; the update with its log entry; COMMIT with the read of the answer. The row after the
 * edit is worked out from the locked row and the change rather than read again.
 */
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
  // The locking read opens the transaction: it sees the latest committed row and holds it until commit,
  // so the 409's current row, the references checked against and the logged "before" are all true.
  const lockRow = {
    sql: "SELECT * FROM fixtures WHERE production_id = ? AND id = ? FOR UPDATE",
    values: [productionId, fixtureId],
  };
  const { closed } = await inDriverTransaction(
    async (conn, [row]) => {
      if (!row) throw notFound("Fixture");
      const stored = byAttribute(Fixture, row);
      const before = toFixtureRecord(stored);
      if (before.version !== version) throw staleVersion("Fixture", before);
      if (REFERENCE_FIELDS.some((k) => changes[k] !== undefined))
        await checkReferences((sql, values) => conn.query(sql, values), productionId, { ...before, ...changes });

      const write: Record<string, unknown> = { ...changes, version: before.version + 1, updatedAt: storedNow() };
      if (changes.unitNumber !== undefined) write.unitSort = unitSortKey(changes.unitNumber);
      if (changes.focused === true && !before.focused)
        Object.assign(write, { focusedAt: storedNow(), focusedBy: userId });
      if (changes.focused === false) Object.assign(write, { focusedAt: null, focusedBy: null });
      const set = setClause(Fixture, write);
      const after = toFixtureRecord({ ...stored, ...write });
      // The update and its log entry go out together; either failing rolls both back.
      await settled([
        conn
          .query(`UPDATE fixtures SET ${set.sql} WHERE production_id = ? AND id = ?`, [
            ...set.values,
            productionId,
            fixtureId,
          ])
          .catch(duplicateUnit("Another fixture on that position already has this unit number.")),
        recordChangeOn(conn, {
          productionId,
          userId,
          entity: "fixture",
          entityId: fixtureId,
          action: "update",
          before,
          after,
        }),
      ]);
    },
    { opening: lockRow, closing: fixturesByIdsStatement(productionId, [fixtureId]) },
  );
  // Read on the same connection right after the commit; gone only if deleted in that instant.
  const [fixture] = joinedFixtures(closed);
  if (!fixture) throw notFound("Fixture");
  return fixture;
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
      const select: Select = (sql, values) =>
        getDb().sequelize.query(sql, { replacements: values, type: QueryTypes.SELECT, transaction });
      await checkReferences(select, productionId, merged).catch((err) => {
        if (err instanceof AppError && inputs.length > 1) err.message = `Fixture ${i + 1}: ${err.message}`;
        throw err;
      });
      const row = await Fixture.create(
        { ...emptyFixture(), ...input, productionId, unitSort: unitSortKey(input.unitNumber) },
        { transaction },
      ).catch(duplicateUnit(`Unit ${input.unitNumber} already exists on that position.`));
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

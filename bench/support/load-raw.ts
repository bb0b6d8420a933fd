// bench:load's yardstick: the same rows read with the mariadb driver alone (no Sequelize, no Next, no
// session or membership check), put through the same join and optics and the same JSON.stringify as the
// API's answer. What the app adds on top of this is its own cost.
import { createRequire } from "node:module";
import path from "node:path";
import { fixtureJoiner, joinFixtures, type JoinRecord } from "@/lib/rig/fixture-join";

const require = createRequire(path.resolve("package.json"));
type Row = Record<string, unknown>;
type Pool = {
  query: (sql: string, values?: unknown[]) => Promise<Row[]>;
  getConnection: () => Promise<Conn>;
  end: () => Promise<void>;
};
type Conn = Pool & { beginTransaction(): Promise<void>; commit(): Promise<void>; release(): void };

const camel = (k: string) => k.replace(/_([a-z])/g, (_, c: string) => c.toUpperCase());

/** A driver row as the API's record: camelCase keys, dates as ISO text, booleans, JSON parsed. */
function record(row: Row): Row {
  const out: Row = {};
  for (const [k, v] of Object.entries(row)) out[camel(k)] = v instanceof Date ? v.toISOString() : v;
  if ("hung" in out) out.hung = Boolean(out.hung);
  if ("focused" in out) out.focused = Boolean(out.focused);
  if (typeof out.shutterCuts === "string") out.shutterCuts = JSON.parse(out.shutterCuts);
  return out;
}

export function rawReader(databaseUrl: string, connectionLimit = 10) {
  const mariadb = require("mariadb");
  const pool: Pool = mariadb.createPool(
    `${databaseUrl}${databaseUrl.includes("?") ? "&" : "?"}connectionLimit=${connectionLimit}`,
  );

  async function joiner(productionId: number) {
    const [[production], positions, types, points] = await Promise.all([
      pool.query("SELECT head_height FROM productions WHERE id = ?", [productionId]),
      pool.query("SELECT * FROM positions WHERE production_id = ?", [productionId]),
      pool.query("SELECT * FROM fixture_types WHERE production_id = ?", [productionId]),
      pool.query("SELECT * FROM focus_points WHERE production_id = ?", [productionId]),
    ]);
    const rel = { positions: positions.map(record), types: types.map(record), points: points.map(record) };
    return {
      join: fixtureJoiner(rel as never, Number(production.head_height)),
      order: new Map(rel.positions.map((p) => [p.id as number, p.sortOrder as number])),
    };
  }

  return {
    /** The rig list: every fixture with its pools, in hanging order, as JSON. */
    async list(productionId: number): Promise<string> {
      const [rows, { join, order }] = await Promise.all([
        pool.query("SELECT * FROM fixtures WHERE production_id = ? ORDER BY position_id, unit_sort, cell", [
          productionId,
        ]),
        joiner(productionId),
      ]);
      const joined = joinFixtures(rows.map(record) as unknown as JoinRecord[], join) as unknown as Row[];
      joined.sort(
        (a, b) =>
          (order.get(a.positionId as number) ?? 0) - (order.get(b.positionId as number) ?? 0) ||
          String(a.positionName).localeCompare(String(b.positionName)),
      );
      return JSON.stringify({ fixtures: joined });
    },

    /** One fixture with its pools, as JSON. */
    async one(productionId: number, fixtureId: number): Promise<string> {
      const [rows, { join }] = await Promise.all([
        pool.query("SELECT * FROM fixtures WHERE production_id = ? AND id = ?", [productionId, fixtureId]),
        joiner(productionId),
      ]);
      return JSON.stringify({ fixture: join(record(rows[0]) as unknown as JoinRecord) });
    },

    /** An optimistic-locked note change with its change record, in one transaction. */
    async write(productionId: number, fixtureId: number, version: number, notes: string): Promise<number> {
      const conn = await pool.getConnection();
      try {
        await conn.beginTransaction();
        const [before] = await conn.query("SELECT * FROM fixtures WHERE production_id = ? AND id = ? FOR UPDATE", [
          productionId,
          fixtureId,
        ]);
        if (Number(before.version) !== version) throw new Error("stale version in the raw write");
        await conn.query("UPDATE fixtures SET notes = ?, version = version + 1, updated_at = NOW(3) WHERE id = ?", [
          notes,
          fixtureId,
        ]);
        const after = { ...record(before), notes, version: version + 1 };
        await conn.query(
          "INSERT INTO change_entries (production_id, user_id, entity, entity_id, action, `before`, `after`, created_at) VALUES (?, NULL, 'fixture', ?, 'update', ?, ?, NOW(3))",
          [productionId, fixtureId, JSON.stringify(record(before)), JSON.stringify(after)],
        );
        await conn.commit();
        return version + 1;
      } finally {
        conn.release();
      }
    },

    end: () => pool.end(),
  };
}

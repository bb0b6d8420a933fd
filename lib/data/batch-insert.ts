import "server-only";
import type { Transaction } from "sequelize";
import { getDb } from "@/models";

type DriverConnection = { batch?: (sql: string, values: unknown[][]) => Promise<unknown> };

const cell = (v: unknown) =>
  v === undefined ? null : v !== null && typeof v === "object" && !(v instanceof Date) ? JSON.stringify(v) : v;

/**
 * Inserts many rows in the caller's transaction through the mariadb driver's batch (one prepared
 * statement, values sent in bulk) — the same path as the raw INSERT the import benchmark compares with.
 * `extra` adds SQL expressions for every row (e.g. version = 1, created_at = NOW()).
 * Falls back to one multi-row INSERT through Sequelize when the connection has no batch().
 */
export async function batchInsert(
  transaction: Transaction,
  table: string,
  columns: string[],
  rows: unknown[][],
  extra: Record<string, string> = {},
) {
  if (!rows.length) return;
  const { sequelize } = getDb();
  const q = (name: string) => sequelize.getQueryInterface().quoteIdentifier(name);
  const names = [...columns, ...Object.keys(extra)].map(q).join(", ");
  const values = rows.map((r) => r.map(cell));
  const connection = (transaction as unknown as { connection?: DriverConnection }).connection;
  if (connection?.batch) {
    const placeholders = [...columns.map(() => "?"), ...Object.values(extra)].join(", ");
    await connection.batch(`INSERT INTO ${q(table)} (${names}) VALUES (${placeholders})`, values);
    return;
  }
  const tuples = values.map(
    (r) => `(${[...r.map((v) => sequelize.escape(v as string)), ...Object.values(extra)].join(", ")})`,
  );
  await sequelize.query(`INSERT INTO ${q(table)} (${names}) VALUES ${tuples.join(", ")}`, { transaction });
}

import "server-only";
// Plain driver statements on a connection from Sequelize's own pool, for the few paths every user hits
// many times a minute (the session check, one fixture read, a fixture edit). A model query spends far more
// CPU in Sequelize's query machinery than MariaDB spends answering it (docs/benchmarks-history.md, "Load,
// fourth pass"). These paths keep the pool, its limits, the session settings and the fail-over of
// models/index.ts, and the same type conversions (the driver's typeCast is Sequelize's), and skip the rest.
import { DataTypes, type Model, type ModelStatic } from "sequelize";
import { getDb } from "@/models";
import { retryOnDeadlock } from "./transaction";

/** The part of a pooled mariadb connection these paths use. */
export type DriverConnection = {
  query<T = Array<Record<string, unknown>>>(sql: string, values?: unknown[]): Promise<T>;
  destroy(): void;
};

/** Runs `work` on one connection from the app's pool and gives the connection back. */
export async function withDriverConnection<T>(work: (conn: DriverConnection) => Promise<T>): Promise<T> {
  const { connectionManager } = getDb().sequelize;
  const conn = (await connectionManager.getConnection({ type: "write" })) as unknown as DriverConnection;
  try {
    return await work(conn);
  } finally {
    connectionManager.releaseConnection(conn as never);
  }
}

/** One statement on a pooled connection. */
export function driverQuery<T = Array<Record<string, unknown>>>(sql: string, values?: unknown[]): Promise<T> {
  return withDriverConnection((conn) => conn.query<T>(sql, values));
}

/**
 * Waits for statements sent back to back on one connection (the driver pipelines them: each goes out
 * without waiting for the answer before it, which saves a round trip and an event-loop turn apiece). The
 * first failure is thrown only once every one has answered, so nothing is still running on the connection.
 */
export async function settled<T extends readonly unknown[]>(queries: { [K in keyof T]: Promise<T[K]> }): Promise<T> {
  const results = await Promise.allSettled(queries);
  const failed = results.find((r) => r.status === "rejected");
  if (failed) throw (failed as PromiseRejectedResult).reason;
  return results.map((r) => (r as PromiseFulfilledResult<unknown>).value) as unknown as T;
}

type Rows = Array<Record<string, unknown>>;
type Statement = { sql: string; values: unknown[] };

/**
 * Runs `work` in one transaction on one connection: committed when it returns, rolled back when it throws,
 * and run again from the start when InnoDB picks it as a deadlock victim (as `inTransaction` does).
 * `opening`, the transaction's first statement (typically the locking read), goes out with START
 * TRANSACTION and its rows are handed to `work`; `closing`, a read of what was written, goes out with
 * COMMIT (on the same connection, so it sees the commit) and its rows come back as `closed`.
 */
export function inDriverTransaction<T>(
  work: (conn: DriverConnection, opened: Rows) => Promise<T>,
  { opening, closing }: { opening?: Statement; closing?: Statement } = {},
): Promise<{ result: T; closed: Rows }> {
  return retryOnDeadlock(() =>
    withDriverConnection(async (conn) => {
      let committed = false;
      try {
        const [, opened] = await settled<[unknown, Rows]>([
          conn.query("START TRANSACTION"),
          opening ? conn.query<Rows>(opening.sql, opening.values) : Promise.resolve([]),
        ]);
        const result = await work(conn, opened);
        const commit = conn.query("COMMIT").then(() => {
          committed = true;
        });
        const [, closed] = await settled<[unknown, Rows]>([
          commit,
          closing ? conn.query<Rows>(closing.sql, closing.values) : Promise.resolve([]),
        ]);
        return { result, closed };
      } catch (err) {
        // After a commit only the closing read can have failed: there is nothing to roll back, and the
        // error is the read's. A connection that cannot even roll back is not given back to the pool.
        if (!committed) await conn.query("ROLLBACK").catch(() => conn.destroy());
        throw err;
      }
    }),
  );
}

type Column = { attribute: string; column: string; json: boolean };
const columnCache = new WeakMap<object, Column[]>();

/** A model's attributes with their column names, in definition order. */
export function columnsOf(model: ModelStatic<Model>): Column[] {
  let columns = columnCache.get(model);
  if (!columns) {
    columns = Object.entries(model.getAttributes()).map(([attribute, def]) => ({
      attribute,
      column: def.field ?? attribute,
      json: def.type instanceof DataTypes.JSON,
    }));
    columnCache.set(model, columns);
  }
  return columns;
}

/** `alias.column AS \`prefix.attribute\`` for the given attributes of a model (all by default), for a joined read. */
export function selectList(
  model: ModelStatic<Model>,
  alias: string,
  prefix = alias,
  attributes?: readonly string[],
): string {
  const columns = columnsOf(model);
  const missing = attributes?.filter((a) => !columns.some((c) => c.attribute === a)) ?? [];
  if (missing.length) throw new Error(`${model.name} has no attribute ${missing.join(", ")}`);
  return columns
    .filter((c) => !attributes || attributes.includes(c.attribute))
    .map((c) => `${alias}.\`${c.column}\` AS \`${prefix}.${c.attribute}\``)
    .join(", ");
}

/** A row read with `selectList`, split back into one object of attributes per prefix. */
export function splitRow(row: Record<string, unknown>): Record<string, Record<string, unknown>> {
  const out: Record<string, Record<string, unknown>> = {};
  for (const key in row) {
    const dot = key.indexOf(".");
    const prefix = key.slice(0, dot);
    (out[prefix] ??= {})[key.slice(dot + 1)] = row[key];
  }
  return out;
}

/** A row read by column name, keyed by attribute name instead. */
export function byAttribute(model: ModelStatic<Model>, row: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const c of columnsOf(model)) out[c.attribute] = row[c.column];
  return out;
}

/**
 * `SET col = ?, …` and its values for a change given by attribute; a JSON column's value is sent as its
 * text (as Sequelize sends it). An attribute the model does not have is a programming error.
 */
export function setClause(
  model: ModelStatic<Model>,
  changes: Record<string, unknown>,
): { sql: string; values: unknown[] } {
  const byName = new Map(columnsOf(model).map((c) => [c.attribute, c]));
  const parts: string[] = [];
  const values: unknown[] = [];
  for (const [attribute, value] of Object.entries(changes)) {
    const column = byName.get(attribute);
    if (!column) throw new Error(`${model.name} has no attribute ${attribute}`);
    parts.push(`\`${column.column}\` = ?`);
    values.push(column.json && value != null ? JSON.stringify(value) : value);
  }
  return { sql: parts.join(", "), values };
}

/**
 * The moment as a DATETIME column keeps it, so a row worked out in JavaScript after a write says exactly
 * what the database now holds. The app's DATETIME columns have no fractional digits and MariaDB truncates
 * the fraction rather than rounding it (MariaDB Knowledge Base, "Microseconds in MariaDB", unless sql_mode
 * has TIME_ROUND_FRACTIONAL; cited from memory). tests/integration/fixture-edit.test.ts checks it against
 * a fresh read.
 */
export function storedNow(): Date {
  return new Date(Math.floor(Date.now() / 1000) * 1000);
}

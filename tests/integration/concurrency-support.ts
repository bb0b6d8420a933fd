// A direct connection to the test database, for checks the API does not expose (the change log).
import * as mariadb from "mariadb";

export async function openTestDb() {
  const u = new URL(process.env.DATABASE_URL!);
  return mariadb.createConnection({
    host: u.hostname,
    port: Number(u.port),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.slice(1),
  });
}

export type ChangeRow = { entity_id: number; action: string; after: Record<string, unknown> | null };

/** The change log of one entity of a production, oldest first, with `after` parsed. */
export async function changesOf(
  db: mariadb.Connection,
  productionId: number,
  entity: string,
  entityId?: number,
): Promise<ChangeRow[]> {
  const rows = await db.query(
    `SELECT entity_id, action, \`after\` FROM change_entries WHERE production_id = ? AND entity = ?${entityId ? " AND entity_id = ?" : ""} ORDER BY id`,
    entityId ? [productionId, entity, entityId] : [productionId, entity],
  );
  return (rows as Array<{ entity_id: number; action: string; after: unknown }>).map((r) => ({
    ...r,
    after: typeof r.after === "string" ? JSON.parse(r.after) : (r.after as Record<string, unknown> | null),
  }));
}

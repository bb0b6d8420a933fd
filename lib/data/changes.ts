import "server-only";
import type { Transaction } from "sequelize";
import { getDb } from "@/models";
import type { DriverConnection } from "./driver";

type ChangeInput = {
  productionId: number;
  userId: number | null;
  entity: string;
  entityId: number | null;
  action: "create" | "update" | "delete";
  before?: object | null;
  after?: object | null;
};

/** Appends one entry to the production's change log (the basis of revision change markers). */
export async function recordChange(entry: ChangeInput, transaction?: Transaction) {
  await getDb().ChangeEntry.create(
    {
      productionId: entry.productionId,
      userId: entry.userId,
      entity: entry.entity,
      entityId: entry.entityId,
      action: entry.action,
      before: (entry.before ?? null) as Record<string, unknown> | null,
      after: (entry.after ?? null) as Record<string, unknown> | null,
    },
    { transaction },
  );
}

/** The same entry written by a plain statement inside a driver transaction (lib/data/driver.ts). */
export async function recordChangeOn(conn: DriverConnection, entry: ChangeInput) {
  const json = (v: object | null | undefined) => (v == null ? null : JSON.stringify(v));
  await conn.query(
    "INSERT INTO change_entries (production_id, user_id, entity, entity_id, action, `before`, `after`, created_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?)",
    [
      entry.productionId,
      entry.userId,
      entry.entity,
      entry.entityId,
      entry.action,
      json(entry.before),
      json(entry.after),
      new Date(),
    ],
  );
}

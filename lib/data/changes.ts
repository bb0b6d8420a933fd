import "server-only";
import type { Transaction } from "sequelize";
import { getDb } from "@/models";

/** Appends one entry to the production's change log (the basis of revision change markers). */
export async function recordChange(
  entry: {
    productionId: number;
    userId: number | null;
    entity: string;
    entityId: number | null;
    action: "create" | "update" | "delete";
    before?: object | null;
    after?: object | null;
  },
  transaction?: Transaction,
) {
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

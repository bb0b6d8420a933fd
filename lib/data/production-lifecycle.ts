import "server-only";
// The end of a production's life: archiving it (off the members' list, restorable, nothing removed) and
// deleting it (everything of it, in one transaction, then its uploaded files).
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import { fileStore } from "@/lib/storage";
import { recordChange } from "./changes";
import { iso } from "./plain";
import { inTransaction } from "./transaction";

export async function setProductionArchived({
  productionId,
  userId,
  archived,
}: {
  productionId: number;
  userId: number;
  archived: boolean;
}): Promise<{ id: number; archivedAt: string | null }> {
  const { Production } = getDb();
  return inTransaction(async (transaction) => {
    const row = await Production.findByPk(productionId, { transaction, lock: true });
    if (!row) throw notFound("Production");
    const before = { archivedAt: iso(row.archivedAt) };
    // Archiving twice keeps the first date: the list says since when it has been put away.
    if (archived !== (row.archivedAt != null))
      await row.update({ archivedAt: archived ? new Date() : null, version: row.version + 1 }, { transaction });
    const after = { archivedAt: iso(row.archivedAt) };
    if (before.archivedAt !== after.archivedAt)
      await recordChange(
        { productionId, userId, entity: "production", entityId: productionId, action: "update", before, after },
        transaction,
      );
    return { id: productionId, ...after };
  });
}

/** Names match as a person would type them: surrounding spaces and letter case do not matter. */
export const sameName = (typed: string, name: string) => typed.trim().toLowerCase() === name.trim().toLowerCase();

/**
 * Deletes a production and everything of it. The database cascades from the production row to its
 * tables, except where a row is held by a RESTRICT key (a fixture holds its type), so fixtures go first;
 * the production's "current cue" is let go before its cues. Uploaded files are removed once the rows
 * are gone for good: a failed transaction leaves every file in place.
 */
export async function deleteProduction({
  productionId,
  confirmName,
}: {
  productionId: number;
  confirmName: string;
}): Promise<{ id: number; name: string; filesRemoved: number; filesLeft: number }> {
  const { Production, Fixture, Upload, sequelize } = getDb();
  const { name, keys } = await inTransaction(async (transaction) => {
    const row = await Production.findByPk(productionId, { transaction, lock: true });
    if (!row) throw notFound("Production");
    if (!sameName(confirmName, row.name))
      throw new AppError("bad_request", `Type the production's name, ${row.name}, to delete it.`, {
        fieldErrors: { confirmName: ["does not match the production's name"] },
      });
    const uploads = await Upload.findAll({ where: { productionId }, attributes: ["storageKey"], transaction });
    const columns = await sequelize.query<{ c: string }>(
      "SELECT COLUMN_NAME AS c FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'productions' AND COLUMN_NAME = 'current_cue_id'",
      { type: QueryTypes.SELECT, transaction },
    );
    if (columns.length)
      await sequelize.query("UPDATE productions SET current_cue_id = NULL WHERE id = ?", {
        replacements: [productionId],
        transaction,
      });
    await Fixture.destroy({ where: { productionId }, transaction });
    await row.destroy({ transaction });
    return { name: row.name, keys: uploads.map((u) => u.storageKey) };
  });
  let filesLeft = 0;
  for (const key of keys) {
    try {
      await fileStore().delete(key);
    } catch (err) {
      // The rows are gone; a file the store would not remove now is an orphan to sweep, not a failed delete.
      filesLeft++;
      console.error(`deleteProduction ${productionId}: could not remove the file ${key}:`, err);
    }
  }
  return { id: productionId, name, filesRemoved: keys.length - filesLeft, filesLeft };
}

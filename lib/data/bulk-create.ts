import "server-only";
import { type CreationAttributes, type Model, type ModelStatic, QueryTypes, type Transaction } from "sequelize";
import { getDb } from "@/models";

/**
 * `Model.bulkCreate` for callers that use the new rows' ids. Sequelize numbers the rows of a multi-row
 * INSERT from the first generated id in steps of 1, but a server may step auto-increment by more: a
 * Galera cluster sets auto_increment_increment to its size so that nodes never hand out the same id.
 * One multi-row INSERT still takes its ids in one go, first, first + step, first + 2·step … (MariaDB,
 * auto_increment_increment), so the rows are renumbered with the session's real step.
 */
export async function bulkCreateWithIds<M extends Model & { id: number }>(
  model: ModelStatic<M>,
  rows: ReadonlyArray<CreationAttributes<M>>,
  { transaction }: { transaction: Transaction },
): Promise<M[]> {
  const created = await model.bulkCreate(rows as CreationAttributes<M>[], { transaction });
  if (created.length < 2) return created;
  const [{ step }] = await getDb().sequelize.query<{ step: number | bigint }>(
    "SELECT @@SESSION.auto_increment_increment AS step",
    { type: QueryTypes.SELECT, transaction },
  );
  const increment = Number(step);
  if (increment !== 1) {
    const first = created[0].id;
    created.forEach((row, i) => row.setDataValue("id", first + i * increment));
  }
  return created;
}

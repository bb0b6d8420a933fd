import "server-only";
// One fixture's, position's, cue's or type's history from the change log, newest first, a line per field.
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { notFound } from "@/lib/errors";
import { historyLines, type HistoryEntity, type HistoryLine, type IdNames } from "@/lib/revisions/history-lines";
import { iso } from "./plain";
import { jsonColumn } from "./json-column";

type Row = {
  id: number;
  action: "create" | "update" | "delete";
  who: string | null;
  at: Date;
  before: unknown;
  after: unknown;
};

const TABLE: Record<HistoryEntity, string> = {
  fixture: "fixtures",
  position: "positions",
  cue: "cues",
  fixtureType: "fixture_types",
};

async function names(productionId: number, table: string): Promise<Map<number, string>> {
  const rows = await getDb().sequelize.query<{ id: number; name: string }>(
    `SELECT id, name FROM ${table} WHERE production_id = ?`,
    { replacements: [productionId], type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.id, r.name]));
}

/**
 * The history of one thing. A thing that no longer exists still has its history (its deletion is the
 * newest line); one that never existed in this production is a 404.
 */
export async function getHistory({
  productionId,
  entity,
  id,
  limit = 500,
}: {
  productionId: number;
  entity: HistoryEntity;
  id: number;
  limit?: number;
}): Promise<HistoryLine[]> {
  const { sequelize } = getDb();
  const rows = await sequelize.query<Row>(
    `SELECT c.id, c.action, u.name AS who, c.created_at AS at, c.\`before\`, c.\`after\`
       FROM change_entries c LEFT JOIN users u ON u.id = c.user_id
      WHERE c.production_id = ? AND c.entity = ? AND c.entity_id = ? ORDER BY c.id DESC LIMIT ?`,
    { replacements: [productionId, entity, id, limit], type: QueryTypes.SELECT },
  );
  if (!rows.length) {
    const [exists] = await sequelize.query(`SELECT id FROM ${TABLE[entity]} WHERE production_id = ? AND id = ?`, {
      replacements: [productionId, id],
      type: QueryTypes.SELECT,
    });
    if (!exists) throw notFound("That history");
    return [];
  }
  const idNames: IdNames =
    entity === "fixture"
      ? {
          positionId: await names(productionId, "positions"),
          fixtureTypeId: await names(productionId, "fixture_types"),
          focusPointId: await names(productionId, "focus_points"),
        }
      : {};
  return rows.flatMap((r) =>
    historyLines(
      entity,
      {
        id: r.id,
        action: r.action,
        who: r.who,
        at: iso(r.at)!,
        before: jsonColumn<Record<string, unknown> | null>(r.before),
        after: jsonColumn<Record<string, unknown> | null>(r.after),
      },
      idNames,
    ),
  );
}

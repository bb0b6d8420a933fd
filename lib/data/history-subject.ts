import "server-only";
// What a history page is about, in words, and where to go back to: the unit, position, cue or type as it is now.
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import type { HistoryEntity } from "@/lib/revisions/history-lines";

const QUERIES: Record<HistoryEntity, string> = {
  fixture: `SELECT CONCAT('unit ', f.unit_number, ' on ', p.name, IF(f.channel IS NULL, '', CONCAT(' (channel ', f.channel, ')'))) AS name
              FROM fixtures f JOIN positions p ON p.id = f.position_id WHERE f.production_id = ? AND f.id = ?`,
  position: "SELECT CONCAT('position ', name) AS name FROM positions WHERE production_id = ? AND id = ?",
  cue: "SELECT CONCAT('cue ', TRIM(TRAILING '.' FROM TRIM(TRAILING '0' FROM number)), IF(label = '', '', CONCAT(' \"', label, '\"'))) AS name FROM cues WHERE production_id = ? AND id = ?",
  fixtureType: "SELECT CONCAT('type ', name) AS name FROM fixture_types WHERE production_id = ? AND id = ?",
};

/** The thing's name now, or null when it has been deleted (its history still stands). */
export async function getHistorySubjectName({
  productionId,
  entity,
  id,
}: {
  productionId: number;
  entity: HistoryEntity;
  id: number;
}): Promise<string | null> {
  const [row] = await getDb().sequelize.query<{ name: string }>(QUERIES[entity], {
    replacements: [productionId, id],
    type: QueryTypes.SELECT,
  });
  return row?.name ?? null;
}

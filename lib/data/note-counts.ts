import "server-only";
// Open-note counts for every thing in a production, in one grouped query: the badges of a whole page come
// from this one read, never a request per row.
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { noteTargetKey, type NoteCounts } from "@/lib/notes/counts";
import type { NoteSubject } from "@/models/note-vocabulary";

export async function getOpenNoteCounts({ productionId }: { productionId: number }): Promise<NoteCounts> {
  const rows = await getDb().sequelize.query<{
    subject: NoteSubject;
    subjectId: number | null;
    open: number | string;
    high: number | string | null;
  }>(
    `SELECT subject, subject_id AS subjectId, COUNT(*) AS open, SUM(priority = 'high') AS high
       FROM notes
      WHERE production_id = ? AND status IN ('open', 'in_progress')
      GROUP BY subject, subject_id`,
    { replacements: [productionId], type: QueryTypes.SELECT },
  );
  const counts: NoteCounts = {};
  // The driver answers COUNT and SUM as BigInt or decimal text: numbers here.
  for (const r of rows)
    counts[noteTargetKey(r.subject, r.subjectId == null ? null : Number(r.subjectId))] = {
      open: Number(r.open),
      high: Number(r.high ?? 0),
    };
  return counts;
}

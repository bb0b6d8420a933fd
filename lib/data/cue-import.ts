import "server-only";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { normaliseParts, type CueWithMoves } from "@/lib/cues";
import { readUsittAscii } from "@/lib/cues/usitt-ascii-read";
import { emptyFileReason, toStoredMoves, type ImportMode } from "@/lib/cues/import-plan";
import type { ImportOutcome } from "@/lib/dto/cue";
import { recordChange } from "./changes";
import { getCuesByProduction } from "./cue-reads";
import { bulkCreateWithIds } from "./bulk-create";
import { inTransaction } from "./transaction";

/** Replaces the production's cue list with a USITT ASCII file: all of it, or (on any error) nothing. */
export async function importCuesFromAscii({
  productionId,
  text,
  mode,
  userId,
}: {
  productionId: number;
  text: string;
  mode: ImportMode;
  userId: number;
}): Promise<ImportOutcome> {
  const parsed = readUsittAscii(text);
  if (parsed.errors.length) {
    const fieldErrors = Object.fromEntries(parsed.errors.map((e) => [`line ${e.line}`, [e.message]]));
    const first = parsed.errors[0];
    const more = parsed.errors.length > 1 ? ` (and ${parsed.errors.length - 1} more)` : "";
    throw new AppError("bad_request", `Nothing was imported. Line ${first.line}: ${first.message}${more}.`, {
      fieldErrors,
    });
  }
  const empty = emptyFileReason(parsed);
  if (empty) throw new AppError("bad_request", empty, { fieldErrors: { text: [empty] } });
  const cues = toStoredMoves(parsed.cues, mode);
  const { Cue, CueLevel, CuePart } = getDb();
  await inTransaction(async (transaction) => {
    // The whole list as it was (fields, moves, parts), so a replacing import can be undone from the log.
    const replaced = (await getCuesByProduction({ productionId, transaction })).map(
      ({ id: _id, version: _v, updatedAt: _u, ...cue }) => cue,
    );
    await Cue.destroy({ where: { productionId }, transaction });
    const rows = await bulkCreateWithIds(
      Cue,
      cues.map((c) => ({ productionId, ...fieldsForRow(c) })),
      { transaction },
    );
    const levels = rows.flatMap((row, i) =>
      Object.entries(cues[i].levels).map(([ch, level]) => ({ cueId: row.id, channel: Number(ch), level })),
    );
    for (let i = 0; i < levels.length; i += 5000) await CueLevel.bulkCreate(levels.slice(i, i + 5000), { transaction });
    const parts = rows.flatMap((row, i) => normaliseParts(cues[i].parts).map((p) => ({ cueId: row.id, ...p })));
    if (parts.length) await CuePart.bulkCreate(parts, { transaction });
    await recordChange(
      {
        productionId,
        userId,
        entity: "cue",
        entityId: null,
        action: "update",
        before: { cues: replaced.length, replaced },
        after: { imported: rows.length, parts: parts.length, from: "USITT ASCII" },
      },
      transaction,
    );
  });
  const notices = [...parsed.notices];
  if (parsed.patch.length) {
    notices.push({
      line: 0,
      message: `${parsed.patch.length} patch entries (channel → universe/address) read; the rig's addresses were not changed by the cue import`,
    });
  }
  return { imported: cues.length, notices };
}

function fieldsForRow(c: CueWithMoves & { line?: number }) {
  const { levels: _levels, parts: _parts, line: _line, number, link, ...rest } = c;
  return { ...rest, number: String(number), link: link == null ? null : String(link) };
}

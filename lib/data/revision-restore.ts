import "server-only";
// Restoring one fixture's or one cue's values from an issued revision: a new change, written under the
// version the user last read (409 with the current row when stale) and recorded in the change log as a
// restore from that revision. Nothing else in the production moves.
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import { sameValue } from "@/lib/revisions/diff";
import { CUE_SNAPSHOT_FIELDS, FIXTURE_SNAPSHOT_FIELDS } from "@/lib/revisions/fields";
import type { SnapCue, SnapFixture, Snapshot } from "@/lib/revisions/types";
import { unitSortKey } from "@/lib/rig/unit-number";
import { normaliseParts, type CuePart } from "@/lib/cues";
import { recordChange } from "./changes";
import { toFixtureRecord, getFixtureById } from "./fixtures";
import { getCueById } from "./cue-reads";
import { writeParts } from "./cue-writes";
import { versionedUpdate } from "./versioned";
import { inTransaction } from "./transaction";
import { isDuplicateKey } from "./unique";

type Restore = {
  productionId: number;
  revisionId: number;
  id: number;
  version: number;
  userId: number;
  /** Called with the field names the restore would write, before anything is written (field rights). */
  allow: (fields: string[]) => void;
};

async function revisionSnapshot(productionId: number, revisionId: number) {
  const [row] = await getDb().sequelize.query<{ label: string; snapshot: string }>(
    "SELECT label, snapshot FROM revisions WHERE production_id = ? AND id = ?",
    { replacements: [productionId, revisionId], type: QueryTypes.SELECT },
  );
  if (!row) throw notFound("Revision");
  return { label: row.label, snapshot: JSON.parse(row.snapshot) as Snapshot };
}

const nothingToRestore = (what: string, label: string) =>
  new AppError("bad_request", `This ${what} already has the values of revision ${label}: nothing to restore.`);

export async function restoreFixture({ productionId, revisionId, id, version, userId, allow }: Restore) {
  const { label, snapshot } = await revisionSnapshot(productionId, revisionId);
  const then = snapshot.fixtures.find((f) => f.id === id) as SnapFixture | undefined;
  if (!then) throw notFound(`That fixture in revision ${label}`);
  const { Fixture, Position, FixtureType, FocusPoint } = getDb();
  await inTransaction(async (transaction) => {
    const row = await Fixture.findOne({ where: { productionId, id }, transaction, lock: true });
    if (!row) throw new AppError("not_found", "That fixture has been deleted since; it cannot be restored here.");
    const now = toFixtureRecord(row) as unknown as Record<string, unknown>;
    const changes = Object.fromEntries(
      FIXTURE_SNAPSHOT_FIELDS.filter((f) => !sameValue(now[f] as never, then[f])).map((f) => [f, then[f]]),
    );
    const fields = Object.keys(changes);
    if (!fields.length) throw nothingToRestore("fixture", label);
    allow(fields);
    // The rows it referred to must still be there: a deleted position is not brought back by a restore.
    const missing: Record<string, string[]> = {};
    if (!(await Position.findOne({ where: { productionId, id: then.positionId as number }, transaction })))
      missing.positionId = [`position ${then.positionName} has been deleted since`];
    if (!(await FixtureType.findOne({ where: { productionId, id: then.fixtureTypeId as number }, transaction })))
      missing.fixtureTypeId = [`type ${then.typeName} has been deleted since`];
    if (
      then.focusPointId &&
      !(await FocusPoint.findOne({ where: { productionId, id: then.focusPointId as number }, transaction }))
    )
      missing.focusPointId = [`focus point ${then.focusPointName} has been deleted since`];
    if (Object.keys(missing).length)
      throw new AppError("bad_request", `Cannot restore: ${Object.values(missing).flat().join("; ")}.`, {
        fieldErrors: missing,
      });
    const write: Record<string, unknown> = { ...changes };
    if (changes.unitNumber !== undefined) write.unitSort = unitSortKey(String(changes.unitNumber));
    const { before, after } = await versionedUpdate({
      model: Fixture,
      scope: { productionId },
      id,
      version,
      changes: write,
      toDto: toFixtureRecord,
      what: "Fixture",
      transaction,
    }).catch((err) => {
      if (isDuplicateKey(err))
        throw new AppError("bad_request", `Unit ${then.unitNumber} is now used by another fixture on that position.`, {
          fieldErrors: { unitNumber: ["already used on this position"] },
        });
      throw err;
    });
    await recordChange(
      {
        productionId,
        userId,
        entity: "fixture",
        entityId: id,
        action: "update",
        before: toFixtureRecord(before),
        after: { ...toFixtureRecord(after), restoredFrom: label },
      },
      transaction,
    );
  });
  return getFixtureById({ productionId, fixtureId: id });
}

export async function restoreCue({ productionId, revisionId, id, version, userId, allow }: Restore) {
  const { label, snapshot } = await revisionSnapshot(productionId, revisionId);
  const then = snapshot.cues.find((c) => c.id === id) as SnapCue | undefined;
  if (!then) throw notFound(`That cue in revision ${label}`);
  const { Cue, CueLevel } = getDb();
  await inTransaction(async (transaction) => {
    const before = await getCueById({ productionId, cueId: id, transaction }).catch(() => {
      throw new AppError("not_found", "That cue has been deleted since; it cannot be restored here.");
    });
    const now = before as unknown as Record<string, unknown>;
    const fields: string[] = CUE_SNAPSHOT_FIELDS.filter((f) => !sameValue(now[f] as never, then[f]));
    const levelsDiffer = !sameValue(before.levels as never, then.levels);
    if (!fields.length && !levelsDiffer) throw nothingToRestore("cue", label);
    allow(levelsDiffer ? [...fields, "levels"] : fields);
    const write: Record<string, unknown> = {};
    for (const f of fields) if (f !== "parts") write[f] = then[f];
    if ("number" in write) write.number = String(write.number);
    if ("link" in write) write.link = write.link == null ? null : String(write.link);
    await versionedUpdate({
      model: Cue,
      scope: { productionId },
      id,
      version,
      changes: write,
      toDto: (r) => r.id,
      what: "Cue",
      transaction,
    }).catch((err) => {
      if (isDuplicateKey(err))
        throw new AppError(
          "bad_request",
          `Cue ${then.number} now exists again as another cue; renumber that one first.`,
          {
            fieldErrors: { number: ["already used"] },
          },
        );
      throw err;
    });
    if (fields.includes("parts"))
      await writeParts(id, normaliseParts((then.parts ?? []) as unknown as CuePart[]), transaction);
    if (levelsDiffer) {
      await CueLevel.destroy({ where: { cueId: id }, transaction });
      const rows = Object.entries(then.levels).map(([ch, level]) => ({ cueId: id, channel: Number(ch), level }));
      if (rows.length) await CueLevel.bulkCreate(rows, { transaction });
    }
    const after = await getCueById({ productionId, cueId: id, transaction });
    await recordChange(
      {
        productionId,
        userId,
        entity: "cue",
        entityId: id,
        action: "update",
        before: before as unknown as object,
        after: { ...after, restoredFrom: label },
      },
      transaction,
    );
  }).catch(async (err) => {
    if (err instanceof AppError && err.code === "conflict")
      throw new AppError("conflict", err.message, { current: await getCueById({ productionId, cueId: id }) });
    throw err;
  });
  return getCueById({ productionId, cueId: id });
}

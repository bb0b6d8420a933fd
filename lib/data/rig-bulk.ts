import "server-only";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { addressRun, channelRun } from "@/lib/rig/dmx-ranges";
import type { BulkEdit } from "@/lib/validation/rig-bulk";
import type { DmxMode } from "@/lib/dto/fixture-type";
import { toFixtureRecord } from "./fixtures";
import { jsonColumn } from "./json-column";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";

/**
 * Applies one edit to a selection, in the order given (the order on screen), in one transaction:
 * a stale version anywhere answers 409 with that fixture's current row and changes nothing.
 */
export async function bulkEditFixtures({
  productionId,
  userId,
  edit,
}: {
  productionId: number;
  userId: number;
  edit: BulkEdit;
}) {
  const { Fixture, FixtureType } = getDb();
  const ids = edit.items.map((i) => i.id);
  if (new Set(ids).size !== ids.length)
    throw new AppError("bad_request", "The selection names a fixture twice.", {
      fieldErrors: { items: ["repeated fixture"] },
    });
  return inTransaction(async (transaction) => {
    // Every row is locked up front in id order, whatever order the selection came in: two bulk edits
    // over the same fixtures then queue behind each other instead of deadlocking.
    const rows = await Fixture.findAll({
      where: { productionId, id: ids },
      order: [["id", "ASC"]],
      lock: true,
      transaction,
    });
    if (rows.length !== ids.length)
      throw new AppError("not_found", "Some of the selected fixtures no longer exist. Reload the rig.");
    const byId = new Map(rows.map((r) => [r.id, r]));
    let values: Array<Record<string, unknown>>;
    if (edit.action.kind === "colour") {
      values = ids.map(() => ({ colour: edit.action.kind === "colour" ? edit.action.colour : null }));
    } else if (edit.action.kind === "channels") {
      values = channelRun(ids.length, edit.action.start, edit.action.step).map((channel) => ({ channel }));
      if ((values.at(-1)!.channel as number) > 99999)
        throw new AppError("bad_request", "The run goes past channel 99999.", {
          fieldErrors: { start: ["run too long"] },
        });
    } else {
      const types = new Map(
        (await FixtureType.findAll({ where: { productionId }, transaction })).map((t) => [t.id, t]),
      );
      const footprints = ids.map((id) => {
        const f = byId.get(id)!;
        const modes = jsonColumn<DmxMode[] | null>(types.get(f.fixtureTypeId)?.dmxModes ?? null);
        return f.footprint ?? modes?.find((m) => m.name === f.dmxMode)?.footprint ?? modes?.[0]?.footprint ?? 1;
      });
      try {
        values = addressRun(footprints, { universe: edit.action.universe, address: edit.action.address });
      } catch (err) {
        throw new AppError("bad_request", (err as Error).message, {
          fieldErrors: { address: [(err as Error).message] },
        });
      }
    }
    for (const [i, item] of edit.items.entries()) {
      const { before, after } = await versionedUpdate({
        model: Fixture,
        scope: { productionId },
        id: item.id,
        version: item.version,
        changes: values[i],
        toDto: toFixtureRecord,
        what: "Fixture",
        transaction,
      });
      await recordChange(
        {
          productionId,
          userId,
          entity: "fixture",
          entityId: item.id,
          action: "update",
          before: toFixtureRecord(before),
          after: toFixtureRecord(after),
        },
        transaction,
      );
    }
    return { updated: ids.length };
  });
}

/** The fields a bulk edit writes, for the role check. */
export const bulkFields = (edit: BulkEdit): string[] =>
  edit.action.kind === "colour" ? ["colour"] : edit.action.kind === "channels" ? ["channel"] : ["universe", "address"];

import "server-only";
import type { Transaction } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import type { CueCreate, CuePatch } from "@/lib/validation/cue";
import { computeTracking, formatCueNumber, normaliseParts, planRenumber, stateOf, type CuePart } from "@/lib/cues";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import type { CueDto } from "@/lib/dto/cue";
import { getCueById, getCuesByProduction } from "./cue-reads";
import { inTransaction } from "./transaction";
import { isDuplicateKey } from "./unique";

function duplicateNumber(err: unknown, number: number | undefined): never {
  if (isDuplicateKey(err)) {
    const n = number == null ? "that number" : formatCueNumber(number);
    throw new AppError("bad_request", `Cue ${n} already exists in this production.`, {
      fieldErrors: { number: [`cue ${n} already exists`] },
    });
  }
  throw err;
}

/** Writes channel → level (null removes the move) for one cue. */
async function writeLevels(cueId: number, levels: Record<string, number | null>, transaction: Transaction) {
  const { CueLevel } = getDb();
  const entries = Object.entries(levels);
  const remove = entries.filter(([, l]) => l === null).map(([ch]) => Number(ch));
  const set = entries
    .filter(([, l]) => l !== null)
    .map(([ch, level]) => ({ cueId, channel: Number(ch), level: level! }));
  if (remove.length) await CueLevel.destroy({ where: { cueId, channel: remove }, transaction });
  if (set.length) await CueLevel.bulkCreate(set, { updateOnDuplicate: ["level", "updatedAt"], transaction });
}

/** Replaces a cue's parts with `parts` (validated by the schema: numbers once, a channel in one part). */
export async function writeParts(cueId: number, parts: CuePart[], transaction: Transaction) {
  const { CuePart } = getDb();
  await CuePart.destroy({ where: { cueId }, transaction });
  if (parts.length)
    await CuePart.bulkCreate(
      normaliseParts(parts).map((p) => ({ cueId, ...p })),
      { transaction },
    );
}

/**
 * Marking a cue as block (or unmarking it) must not change what the audience sees: on, the tracked
 * state is written into the cue; off, channels the block held at 0 get an explicit 0 so nothing
 * tracks in from before.
 */
async function keepLookWhenBlockChanges(productionId: number, cueId: number, block: boolean, transaction: Transaction) {
  const cues = await getCuesByProduction({ productionId, transaction });
  const show = computeTracking(cues);
  const index = show.cueIds.indexOf(cueId);
  const state = stateOf(show, index);
  if (block) {
    await getDb().CueLevel.destroy({ where: { cueId }, transaction });
    await writeLevels(cueId, Object.fromEntries(state), transaction);
  } else if (index > 0) {
    const zeros: Record<number, number> = {};
    for (const [ch] of stateOf(show, index - 1)) if (!state.has(ch)) zeros[ch] = 0;
    await writeLevels(cueId, zeros, transaction);
  }
}

const numberText = (n: number | null | undefined) => (n == null ? null : String(n));

export async function createCue({
  productionId,
  input,
  userId,
}: {
  productionId: number;
  input: CueCreate;
  userId: number;
}): Promise<CueDto> {
  const { Cue } = getDb();
  const { levels, parts, ...fields } = input;
  const id = await inTransaction(async (transaction) => {
    const row = await Cue.create(
      { productionId, ...fields, number: String(fields.number), link: numberText(fields.link) },
      { transaction },
    );
    if (levels) await writeLevels(row.id, levels, transaction);
    if (parts?.length) await writeParts(row.id, parts, transaction);
    const after = await getCueById({ productionId, cueId: row.id, transaction });
    await recordChange({ productionId, userId, entity: "cue", entityId: row.id, action: "create", after }, transaction);
    return row.id;
  }).catch((err) => duplicateNumber(err, fields.number));
  return getCueById({ productionId, cueId: id });
}

/** Fields, levels and parts of one cue in one transaction, under the version the client read. */
export async function updateCue({
  productionId,
  cueId,
  patch,
  userId,
}: {
  productionId: number;
  cueId: number;
  patch: CuePatch;
  userId: number;
}): Promise<CueDto> {
  const { Cue } = getDb();
  const { version, levels, parts, ...fields } = patch;
  if (!Object.keys(fields).length && !levels && !parts)
    throw new AppError("bad_request", "Nothing to change: send at least one field.");
  const write: Record<string, unknown> = { ...fields };
  if (fields.number !== undefined) write.number = String(fields.number);
  if (fields.link !== undefined) write.link = numberText(fields.link);
  await inTransaction(async (transaction) => {
    const before = await getCueById({ productionId, cueId, transaction });
    await versionedUpdate({
      model: Cue,
      scope: { productionId },
      id: cueId,
      version,
      changes: write,
      toDto: (r) => r.id,
      what: "Cue",
      transaction,
    });
    if (fields.block !== undefined && before.block !== fields.block)
      await keepLookWhenBlockChanges(productionId, cueId, fields.block, transaction);
    if (levels) await writeLevels(cueId, levels, transaction);
    if (parts) await writeParts(cueId, parts, transaction);
    const after = await getCueById({ productionId, cueId, transaction });
    // The log keeps what changed: the fields, the levels touched and the parts when they were sent.
    const touched = levels ? Object.keys(levels).map(Number) : [];
    const pick = (c: CueDto) => ({
      ...Object.fromEntries(Object.keys(fields).map((k) => [k, c[k as keyof CueDto]])),
      ...(levels ? { levels: Object.fromEntries(touched.map((ch) => [ch, c.levels[ch] ?? null])) } : {}),
      ...(parts ? { parts: c.parts } : {}),
      version: c.version,
    });
    await recordChange(
      {
        productionId,
        userId,
        entity: "cue",
        entityId: cueId,
        action: "update",
        before: pick(before),
        after: pick(after),
      },
      transaction,
    );
  }).catch(async (err) => {
    // A 409 carries the cue with its levels and parts, so the client can show the other person's values.
    if (err instanceof AppError && err.code === "conflict")
      throw new AppError("conflict", err.message, { current: await getCueById({ productionId, cueId }) });
    duplicateNumber(err, fields.number);
  });
  return getCueById({ productionId, cueId });
}

export async function deleteCue({
  productionId,
  cueId,
  version,
  userId,
}: {
  productionId: number;
  cueId: number;
  version: number;
  userId: number;
}) {
  const { Cue } = getDb();
  await inTransaction(async (transaction) => {
    const before = await getCueById({ productionId, cueId, transaction });
    const count = await Cue.destroy({ where: { productionId, id: cueId, version }, transaction });
    if (!count)
      throw new AppError("conflict", "Someone else changed this cue first. Here is the current version.", {
        current: before,
      });
    await recordChange({ productionId, userId, entity: "cue", entityId: cueId, action: "delete", before }, transaction);
  });
}

export async function renumberCues({
  productionId,
  range,
  userId,
}: {
  productionId: number;
  range: { from: number; to: number; start: number; step: number };
  userId: number;
}) {
  const { sequelize, Cue } = getDb();
  return inTransaction(async (transaction) => {
    const cues = await getCuesByProduction({ productionId, transaction });
    let plan: ReturnType<typeof planRenumber>;
    try {
      plan = planRenumber(cues, range);
    } catch (e) {
      throw new AppError("bad_request", (e as Error).message, { fieldErrors: { start: [(e as Error).message] } });
    }
    // Two steps, numbers and links alike: first every moved cue (and every link to it) goes to a
    // placeholder (-id), then to its new number. So the unique (production, number) index never sees
    // two cues on one number midway, and a link is never moved twice when 1→2 and 2→3 in one go.
    const bump = { version: sequelize.literal("version + 1") as never };
    for (const m of plan.moves) {
      await Cue.update({ number: String(-m.id) }, { where: { id: m.id }, transaction });
      await Cue.update(
        { link: String(-m.id), ...bump },
        { where: { productionId, link: String(m.from) }, transaction },
      );
    }
    for (const m of plan.moves) {
      await Cue.update({ number: String(m.to), ...bump }, { where: { id: m.id }, transaction });
      await Cue.update({ link: String(m.to) }, { where: { productionId, link: String(-m.id) }, transaction });
    }
    await recordChange(
      {
        productionId,
        userId,
        entity: "cue",
        entityId: null,
        action: "update",
        before: { renumber: plan.moves.map((m) => m.from) },
        after: { renumber: plan.moves.map((m) => m.to) },
      },
      transaction,
    );
    // And each moved cue's own history: its number before and after.
    for (const m of plan.moves)
      await recordChange(
        {
          productionId,
          userId,
          entity: "cue",
          entityId: m.id,
          action: "update",
          before: { number: m.from },
          after: { number: m.to },
        },
        transaction,
      );
    return { renumbered: plan.moves.length };
  });
}

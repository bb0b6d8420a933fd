import "server-only";
import { Op, type Transaction } from "sequelize";
import { getDb, type Cue } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { CueCreate, CuePatch } from "@/lib/validation/cue";
import { computeTracking, formatCueNumber, groupStandbys, planRenumber, runningTime, stateOf, summarizeCue, type ChannelInfo, type CueFields, type CueWithMoves, type StandbyGroup } from "@/lib/cues";
import { readUsittAscii } from "@/lib/cues/usitt-ascii-read";
import { toStoredMoves, type ImportMode } from "@/lib/cues/import-plan";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { requireProduction } from "./productions";

export type CueDto = CueFields & { id: number; version: number; levels: Record<number, number>; updatedAt: string };
export type CueSheetRow = CueDto & { runningTime: number; summary: string; up: number; down: number; startsBy: "go" | "follow" };
export type ChannelLabel = { channel: number; purposes: string[]; areas: string[]; units: string[] };

function toCueDto(c: Cue, levels: Record<number, number> = {}): CueDto {
  return {
    id: c.id,
    number: Number(c.number),
    label: c.label,
    page: c.page,
    upTime: c.upTime,
    downTime: c.downTime,
    delay: c.delay,
    follow: c.follow,
    link: c.link == null ? null : Number(c.link),
    block: Boolean(c.block),
    callNote: c.callNote,
    version: c.version,
    levels,
    updatedAt: iso(c.updatedAt)!,
  };
}

/** Every cue of a production in running order, each with the levels it records (its moves). */
export async function getCuesByProduction({ productionId, transaction }: { productionId: number; transaction?: Transaction }): Promise<CueDto[]> {
  const { Cue, CueLevel } = getDb();
  const cues = await Cue.findAll({ where: { productionId }, order: [["number", "ASC"]], transaction });
  const levels = cues.length
    ? ((await CueLevel.findAll({ attributes: ["cueId", "channel", "level"], where: { cueId: cues.map((c) => c.id) }, raw: true, transaction })) as unknown as Array<{ cueId: number; channel: number; level: number }>)
    : [];
  const byCue = new Map<number, Record<number, number>>();
  for (const l of levels) (byCue.get(l.cueId) ?? byCue.set(l.cueId, {}).get(l.cueId)!)[l.channel] = l.level;
  return cues.map((c) => toCueDto(c, byCue.get(c.id) ?? {}));
}

/** What each channel lights, from the rig: purposes, focus points (acting areas) and unit names. */
export async function getChannelLabels({ productionId }: { productionId: number }): Promise<ChannelLabel[]> {
  const { Fixture, FocusPoint } = getDb();
  const [fixtures, points] = await Promise.all([
    Fixture.findAll({ attributes: ["channel", "purpose", "focusPointId", "unitNumber"], where: { productionId, channel: { [Op.ne]: null } }, raw: true }),
    FocusPoint.findAll({ attributes: ["id", "name"], where: { productionId }, raw: true }),
  ]);
  const names = new Map(points.map((p) => [p.id, p.name]));
  const byChannel = new Map<number, { purposes: Set<string>; areas: Set<string>; units: Set<string> }>();
  for (const f of fixtures) {
    const entry = byChannel.get(f.channel!) ?? byChannel.set(f.channel!, { purposes: new Set(), areas: new Set(), units: new Set() }).get(f.channel!)!;
    if (f.purpose) entry.purposes.add(f.purpose);
    if (f.focusPointId && names.has(f.focusPointId)) entry.areas.add(names.get(f.focusPointId)!);
    entry.units.add(f.unitNumber);
  }
  return [...byChannel]
    .sort(([a], [b]) => a - b)
    .map(([channel, e]) => ({ channel, purposes: [...e.purposes], areas: [...e.areas], units: [...e.units] }));
}

/** The stage manager's cue sheet: times, running time, a computed summary and the standbys. */
export async function getCueSheet({ productionId }: { productionId: number }): Promise<{ rows: CueSheetRow[]; standbys: StandbyGroup[] }> {
  await requireProduction(productionId);
  const [cues, labels] = await Promise.all([getCuesByProduction({ productionId }), getChannelLabels({ productionId })]);
  const info: ChannelInfo = new Map(labels.map((l) => [l.channel, l]));
  const show = computeTracking(cues);
  const rows = cues.map((cue, i): CueSheetRow => {
    const s = summarizeCue(show, i, info);
    const prev = cues[i - 1];
    return { ...cue, levels: {}, summary: s.text, up: s.up, down: s.down, runningTime: runningTime(cue, s), startsBy: prev?.follow != null ? "follow" : "go" };
  });
  return { rows, standbys: groupStandbys(cues) };
}

async function getCueRow(productionId: number, cueId: number, transaction?: Transaction) {
  const row = await getDb().Cue.findOne({ where: { productionId, id: cueId }, transaction });
  if (!row) throw notFound("Cue");
  return row;
}

function duplicateNumber(err: unknown, number: number | undefined): never {
  if ((err as { name?: string }).name === "SequelizeUniqueConstraintError") {
    const n = number == null ? "that number" : formatCueNumber(number);
    throw new AppError("bad_request", `Cue ${n} already exists in this production.`, { fieldErrors: { number: [`cue ${n} already exists`] } });
  }
  throw err;
}

/** Writes channel → level (null removes the move) for one cue. */
async function writeLevels(cueId: number, levels: Record<string, number | null>, transaction: Transaction) {
  const { CueLevel } = getDb();
  const entries = Object.entries(levels);
  const remove = entries.filter(([, l]) => l === null).map(([ch]) => Number(ch));
  const set = entries.filter(([, l]) => l !== null).map(([ch, level]) => ({ cueId, channel: Number(ch), level: level! }));
  if (remove.length) await CueLevel.destroy({ where: { cueId, channel: remove }, transaction });
  if (set.length) await CueLevel.bulkCreate(set, { updateOnDuplicate: ["level", "updatedAt"], transaction });
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
  const { CueLevel } = getDb();
  if (block) {
    await CueLevel.destroy({ where: { cueId }, transaction });
    await writeLevels(cueId, Object.fromEntries(state), transaction);
  } else if (index > 0) {
    const zeros: Record<number, number> = {};
    for (const [ch] of stateOf(show, index - 1)) if (!state.has(ch)) zeros[ch] = 0;
    await writeLevels(cueId, zeros, transaction);
  }
}

export async function createCue({ productionId, input, userId }: { productionId: number; input: CueCreate; userId: number }): Promise<CueDto> {
  const { sequelize, Cue } = getDb();
  const { levels, ...fields } = input;
  const id = await sequelize
    .transaction(async (transaction) => {
      const row = await Cue.create({ productionId, ...fields, number: String(fields.number), link: fields.link == null ? null : String(fields.link) }, { transaction });
      if (levels) await writeLevels(row.id, levels, transaction);
      await recordChange({ productionId, userId, entity: "cue", entityId: row.id, action: "create", after: { ...toCueDto(row), levels } }, transaction);
      return row.id;
    })
    .catch((err) => duplicateNumber(err, fields.number));
  return getCueById({ productionId, cueId: id });
}

export async function getCueById({ productionId, cueId, transaction }: { productionId: number; cueId: number; transaction?: Transaction }): Promise<CueDto> {
  const row = await getCueRow(productionId, cueId, transaction);
  const levels = await getDb().CueLevel.findAll({ where: { cueId }, raw: true, transaction });
  return toCueDto(row, Object.fromEntries(levels.map((l) => [l.channel, l.level])));
}

export async function updateCue({ productionId, cueId, patch, userId }: { productionId: number; cueId: number; patch: CuePatch; userId: number }): Promise<CueDto> {
  const { sequelize, Cue } = getDb();
  const { version, levels, ...fields } = patch;
  if (!Object.keys(fields).length && !levels) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  const write: Record<string, unknown> = { ...fields };
  if (fields.number !== undefined) write.number = String(fields.number);
  if (fields.link !== undefined) write.link = fields.link == null ? null : String(fields.link);
  const currentDto = async (row: Cue) => getCueById({ productionId, cueId: row.id });
  await sequelize
    .transaction(async (transaction) => {
      const beforeLevels = levels ? await getCueById({ productionId, cueId, transaction }) : null;
      const { before, after } = await versionedUpdate({ model: Cue, scope: { productionId }, id: cueId, version, changes: write, toDto: (r) => toCueDto(r), what: "Cue", transaction });
      if (fields.block !== undefined && Boolean(before.block) !== fields.block) await keepLookWhenBlockChanges(productionId, cueId, fields.block, transaction);
      if (levels) await writeLevels(cueId, levels, transaction);
      const changedLevels = levels ? Object.fromEntries(Object.keys(levels).map((ch) => [ch, beforeLevels!.levels[Number(ch)] ?? null])) : undefined;
      await recordChange({ productionId, userId, entity: "cue", entityId: cueId, action: "update", before: { ...toCueDto(before), levels: changedLevels }, after: { ...toCueDto(after), levels } }, transaction);
    })
    .catch(async (err) => {
      // A 409 carries the cue with its levels, so the client can show the other person's values.
      if (err instanceof AppError && err.code === "conflict") throw new AppError("conflict", err.message, { current: await currentDto(await getCueRow(productionId, cueId)) });
      duplicateNumber(err, fields.number);
    });
  return getCueById({ productionId, cueId });
}

export async function deleteCue({ productionId, cueId, version, userId }: { productionId: number; cueId: number; version: number; userId: number }) {
  const { sequelize, Cue } = getDb();
  await sequelize.transaction(async (transaction) => {
    const before = await getCueById({ productionId, cueId, transaction });
    const count = await Cue.destroy({ where: { productionId, id: cueId, version }, transaction });
    if (!count) throw new AppError("conflict", "Someone else changed this cue first. Here is the current version.", { current: before });
    await recordChange({ productionId, userId, entity: "cue", entityId: cueId, action: "delete", before }, transaction);
  });
}

export async function renumberCues({ productionId, range, userId }: { productionId: number; range: { from: number; to: number; start: number; step: number }; userId: number }) {
  const { sequelize, Cue } = getDb();
  return sequelize.transaction(async (transaction) => {
    const cues = await getCuesByProduction({ productionId, transaction });
    let plan;
    try {
      plan = planRenumber(cues, range);
    } catch (e) {
      throw new AppError("bad_request", (e as Error).message, { fieldErrors: { start: [(e as Error).message] } });
    }
    // Two steps so the unique (production, number) index never sees two cues on one number midway.
    for (const m of plan.moves) await Cue.update({ number: String(-m.id) }, { where: { id: m.id }, transaction });
    for (const m of plan.moves) {
      await Cue.update({ number: String(m.to), version: sequelize.literal("version + 1") as never }, { where: { id: m.id }, transaction });
      await Cue.update({ link: String(m.to) }, { where: { productionId, link: String(m.from) }, transaction });
    }
    await recordChange({ productionId, userId, entity: "cue", entityId: null, action: "update", before: { renumber: plan.moves.map((m) => m.from) }, after: { renumber: plan.moves.map((m) => m.to) } }, transaction);
    return { renumbered: plan.moves.length };
  });
}

export type ImportOutcome = { imported: number; notices: Array<{ line: number; message: string }> };

/** Replaces the production's cue list with a USITT ASCII file: all of it, or (on any error) nothing. */
export async function importCuesFromAscii({ productionId, text, mode, userId }: { productionId: number; text: string; mode: ImportMode; userId: number }): Promise<ImportOutcome> {
  const parsed = readUsittAscii(text);
  if (parsed.errors.length) {
    const fieldErrors = Object.fromEntries(parsed.errors.map((e) => [`line ${e.line}`, [e.message]]));
    const first = parsed.errors[0];
    const more = parsed.errors.length > 1 ? ` (and ${parsed.errors.length - 1} more)` : "";
    throw new AppError("bad_request", `Nothing was imported. Line ${first.line}: ${first.message}${more}.`, { fieldErrors });
  }
  const cues = toStoredMoves(parsed.cues, mode);
  const { sequelize, Cue, CueLevel } = getDb();
  await sequelize.transaction(async (transaction) => {
    const before = await Cue.count({ where: { productionId }, transaction });
    await Cue.destroy({ where: { productionId }, transaction });
    const rows = await Cue.bulkCreate(cues.map((c) => ({ productionId, ...fieldsForRow(c) })), { transaction });
    const levels = rows.flatMap((row, i) => Object.entries(cues[i].levels).map(([ch, level]) => ({ cueId: row.id, channel: Number(ch), level })));
    for (let i = 0; i < levels.length; i += 5000) await CueLevel.bulkCreate(levels.slice(i, i + 5000), { transaction });
    await recordChange({ productionId, userId, entity: "cue", entityId: null, action: "update", before: { cues: before }, after: { imported: rows.length, from: "USITT ASCII" } }, transaction);
  });
  return { imported: cues.length, notices: parsed.notices };
}

function fieldsForRow(c: CueWithMoves) {
  const { levels: _levels, number, link, ...rest } = c as CueWithMoves & { line?: number };
  delete (rest as { line?: number }).line;
  return { ...rest, number: String(number), link: link == null ? null : String(link) };
}

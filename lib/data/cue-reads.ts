import "server-only";
import { Op, QueryTypes, type Transaction } from "sequelize";
import { getDb } from "@/models";
import { notFound } from "@/lib/errors";
import { buildCueSheet, normaliseParts, type ChannelInfo, type CuePart, type StandbyGroup } from "@/lib/cues";
import type { ChannelLabel, CueDto, CueSheetRow } from "@/lib/dto/cue";
import { iso } from "./plain";
import { jsonColumn } from "./json-column";
import { requireProduction } from "./productions";

type CueRow = {
  id: number;
  number: string | number;
  label: string;
  page: string | null;
  up_time: number;
  down_time: number | null;
  delay: number;
  down_delay: number | null;
  follow: number | null;
  link: string | number | null;
  block: number | boolean;
  call_note: string | null;
  version: number;
  updated_at: Date | string;
};
type PartRow = {
  cue_id: number;
  part: number;
  label: string;
  up_time: number;
  down_time: number | null;
  delay: number;
  channels: string | number[];
};

const CUE_COLUMNS =
  "id, number, label, page, up_time, down_time, delay, down_delay, follow, link, block, call_note, version, updated_at";
const PART_COLUMNS = "p.cue_id, p.part, p.label, p.up_time, p.down_time, p.delay, p.channels";

export function toCueDto(c: CueRow, levels: Record<number, number> = {}, parts: CuePart[] = []): CueDto {
  return {
    id: c.id,
    number: Number(c.number),
    label: c.label,
    page: c.page,
    upTime: c.up_time,
    downTime: c.down_time,
    delay: c.delay,
    downDelay: c.down_delay ?? null,
    follow: c.follow,
    link: c.link == null ? null : Number(c.link),
    block: Boolean(c.block),
    callNote: c.call_note,
    parts,
    version: c.version,
    levels,
    updatedAt: iso(c.updated_at)!,
  };
}

function toPart(p: PartRow): CuePart {
  const channels = jsonColumn<number[]>(p.channels);
  return { part: p.part, label: p.label, upTime: p.up_time, downTime: p.down_time, delay: p.delay, channels };
}

type MovesRow = { cue_id: number; n: number | bigint; moves: string | null };

/**
 * "12:50;13:100;" → { 12: 50, 13: 100 }. Null when the text was cut short by GROUP_CONCAT's length
 * limit: then the last pair has no closing ";" or pairs are missing.
 */
function parseMoves(row: MovesRow): Record<number, number> | null {
  const text = row.moves ?? "";
  if (!text.endsWith(";")) return null;
  const out: Record<number, number> = {};
  let count = 0;
  for (let start = 0; start < text.length; ) {
    const colon = text.indexOf(":", start);
    const end = text.indexOf(";", colon);
    out[Number(text.slice(start, colon))] = Number(text.slice(colon + 1, end));
    count++;
    start = end + 1;
  }
  return count === Number(row.n) ? out : null;
}

/** The slow, sure way for a cue whose moves did not fit in one GROUP_CONCAT (tens of thousands of channels). */
async function movesOneByOne(cueId: number, transaction?: Transaction): Promise<Record<number, number>> {
  const rows = await select<{ channel: number; level: number }>(
    "SELECT channel, level FROM cue_levels WHERE cue_id = ?",
    [cueId],
    transaction,
  );
  return Object.fromEntries(rows.map((r) => [r.channel, r.level]));
}

async function select<T extends object>(sql: string, replacements: unknown[], transaction?: Transaction): Promise<T[]> {
  return getDb().sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT, transaction, raw: true });
}

/**
 * Cues, levels and parts with three plain queries (no model instances, only the columns needed).
 * They run side by side on the pool, or one after another inside a transaction.
 */
async function readCues(where: { productionId: number; cueId?: number }, transaction?: Transaction): Promise<CueDto[]> {
  const byCue = where.cueId === undefined ? "" : " AND c.id = ?";
  const args = where.cueId === undefined ? [where.productionId] : [where.productionId, where.cueId];
  const queries = [
    () =>
      select<CueRow>(
        `SELECT ${CUE_COLUMNS} FROM cues c WHERE c.production_id = ?${byCue} ORDER BY c.number`,
        args,
        transaction,
      ),
    // One row a cue with its moves as "ch:level;…": 2–3× faster than a row a move (measured on 9 600 moves).
    () =>
      select<MovesRow>(
        `SELECT l.cue_id, COUNT(*) AS n, GROUP_CONCAT(l.channel, ':', l.level, ';' SEPARATOR '') AS moves FROM cue_levels l JOIN cues c ON c.id = l.cue_id WHERE c.production_id = ?${byCue} GROUP BY l.cue_id`,
        args,
        transaction,
      ),
    () =>
      select<PartRow>(
        `SELECT ${PART_COLUMNS} FROM cue_parts p JOIN cues c ON c.id = p.cue_id WHERE c.production_id = ?${byCue}`,
        args,
        transaction,
      ),
  ] as const;
  const [cues, levels, parts] = transaction
    ? [await queries[0](), await queries[1](), await queries[2]()]
    : await Promise.all([queries[0](), queries[1](), queries[2]()]);
  const levelsBy = new Map<number, Record<number, number>>();
  for (const row of levels) levelsBy.set(row.cue_id, parseMoves(row) ?? (await movesOneByOne(row.cue_id, transaction)));
  const partsBy = new Map<number, CuePart[]>();
  for (const p of parts) {
    const list = partsBy.get(p.cue_id) ?? [];
    list.push(toPart(p));
    partsBy.set(p.cue_id, list);
  }
  return cues.map((c) => toCueDto(c, levelsBy.get(c.id) ?? {}, normaliseParts(partsBy.get(c.id) ?? [])));
}

/** Every cue of a production in numeric order, each with the levels it records (its moves) and its parts. */
export async function getCuesByProduction({
  productionId,
  transaction,
}: {
  productionId: number;
  transaction?: Transaction;
}): Promise<CueDto[]> {
  return readCues({ productionId }, transaction);
}

export async function getCueById({
  productionId,
  cueId,
  transaction,
}: {
  productionId: number;
  cueId: number;
  transaction?: Transaction;
}): Promise<CueDto> {
  const [cue] = await readCues({ productionId, cueId }, transaction);
  if (!cue) throw notFound("Cue");
  return cue;
}

/** What each channel lights, from the rig: purposes, focus points (acting areas) and unit names. */
export async function getChannelLabels({ productionId }: { productionId: number }): Promise<ChannelLabel[]> {
  const { Fixture, FocusPoint } = getDb();
  const [fixtures, points] = await Promise.all([
    Fixture.findAll({
      attributes: ["channel", "purpose", "focusPointId", "unitNumber"],
      where: { productionId, channel: { [Op.ne]: null } },
      raw: true,
    }),
    FocusPoint.findAll({ attributes: ["id", "name"], where: { productionId }, raw: true }),
  ]);
  const names = new Map(points.map((p) => [p.id, p.name]));
  const byChannel = new Map<number, { purposes: Set<string>; areas: Set<string>; units: Set<string> }>();
  for (const f of fixtures) {
    const entry =
      byChannel.get(f.channel!) ??
      byChannel.set(f.channel!, { purposes: new Set(), areas: new Set(), units: new Set() }).get(f.channel!)!;
    if (f.purpose) entry.purposes.add(f.purpose);
    if (f.focusPointId && names.has(f.focusPointId)) entry.areas.add(names.get(f.focusPointId)!);
    entry.units.add(f.unitNumber);
  }
  return [...byChannel]
    .sort(([a], [b]) => a - b)
    .map(([channel, e]) => ({ channel, purposes: [...e.purposes], areas: [...e.areas], units: [...e.units] }));
}

/**
 * The stage manager's cue sheet in running order (links followed): times, running time with parts,
 * a computed summary and the standbys. The production check and the reads run side by side.
 */
export async function getCueSheet({
  productionId,
}: {
  productionId: number;
}): Promise<{ rows: CueSheetRow[]; standbys: StandbyGroup[] }> {
  const [, cues, labels] = await Promise.all([
    requireProduction(productionId),
    getCuesByProduction({ productionId }),
    getChannelLabels({ productionId }),
  ]);
  const info: ChannelInfo = new Map(labels.map((l) => [l.channel, l]));
  const { rows, standbys } = buildCueSheet(cues, info);
  // The sheet does not need each cue's moves; leaving them out keeps the response small.
  return { rows: rows.map((r) => ({ ...r, levels: {} })), standbys };
}

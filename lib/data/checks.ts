import "server-only";
// Reads what the checks need in a few plain queries and runs them (lib/checks is pure), plus the writes
// of the checks' own settings: the production's electrical code and allowances, and a pipe's lift lines.
import { QueryTypes } from "sequelize";
import type { z } from "zod";
import { getDb, type Production } from "@/models";
import {
  CHECK_CAUTIONS,
  DMX_CAUTIONS,
  LOAD_KIND_RULE,
  POWER_CAUTIONS,
  effectiveElectrical,
  loadKindOfType,
  runChecks,
  type CheckPosition,
  type RiggingFixture,
} from "@/lib/checks";
import type { ChecksReport, ElectricalSettingsDto } from "@/lib/dto/checks";
import type { updateElectricalSettingsSchema, updateLiftLinesSchema } from "@/lib/validation/checks";
import { isPointHung, type PositionKind } from "@/lib/rig/position-kinds";
import { notFound } from "@/lib/errors";
import { recordChange } from "./changes";
import { jsonColumn } from "./json-column";
import { versionedUpdate } from "./versioned";
import { inTransaction } from "./transaction";

const SETTINGS_KEYS = [
  "electricalCode",
  "supplySystem",
  "voltage",
  "derating",
  "cableKgPerM",
  "hardwareKgPerUnit",
  "version",
] as const;

export const toElectricalSettingsDto = (
  p: Pick<Production, "id" | (typeof SETTINGS_KEYS)[number]>,
): ElectricalSettingsDto => ({
  productionId: p.id,
  electricalCode: p.electricalCode,
  supplySystem: p.supplySystem,
  voltage: Number(p.voltage),
  derating: p.derating == null ? null : Number(p.derating),
  cableKgPerM: Number(p.cableKgPerM),
  hardwareKgPerUnit: Number(p.hardwareKgPerUnit),
  version: p.version,
});

export async function getElectricalSettings({
  productionId,
}: {
  productionId: number;
}): Promise<ElectricalSettingsDto | null> {
  const row = await getDb().Production.findByPk(productionId, { attributes: ["id", ...SETTINGS_KEYS] });
  return row ? toElectricalSettingsDto(row) : null;
}

export async function updateElectricalSettings({
  productionId,
  userId,
  patch,
}: {
  productionId: number;
  userId: number;
  patch: z.infer<typeof updateElectricalSettingsSchema>;
}): Promise<ElectricalSettingsDto> {
  const { version, ...changes } = patch;
  const { Production } = getDb();
  return inTransaction(async (transaction) => {
    const { before, after } = await versionedUpdate({
      model: Production,
      scope: {},
      id: productionId,
      version,
      changes,
      toDto: toElectricalSettingsDto,
      what: "Production",
      transaction,
    });
    const dto = toElectricalSettingsDto(after);
    await recordChange(
      {
        productionId,
        userId,
        entity: "production",
        entityId: productionId,
        action: "update",
        before: toElectricalSettingsDto(before),
        after: dto,
      },
      transaction,
    );
    return dto;
  });
}

export async function updateLiftLines({
  productionId,
  positionId,
  userId,
  patch,
}: {
  productionId: number;
  positionId: number;
  userId: number;
  patch: z.infer<typeof updateLiftLinesSchema>;
}) {
  const { Position } = getDb();
  const toDto = (p: { id: number; liftLines: number | null; version: number }) => ({
    positionId: p.id,
    liftLines: p.liftLines,
    version: p.version,
  });
  return inTransaction(async (transaction) => {
    const { before, after } = await versionedUpdate({
      model: Position,
      scope: { productionId },
      id: positionId,
      version: patch.version,
      changes: { liftLines: patch.liftLines },
      toDto,
      what: "Position",
      transaction,
    });
    await recordChange(
      {
        productionId,
        userId,
        entity: "position",
        entityId: positionId,
        action: "update",
        before: toDto(before),
        after: toDto(after),
      },
      transaction,
    );
    return toDto(after);
  });
}

type FixtureRow = {
  id: number;
  positionId: number;
  fixtureTypeId: number;
  unitNumber: string;
  bodyKey: string | null;
  channel: number | null;
  universe: number | null;
  address: number | null;
  dmxMode: string | null;
  footprint: number | null;
  circuit: string | null;
  dimmer: string | null;
  x: number;
  y: number;
};
type TypeRow = {
  id: number;
  name: string;
  family: string;
  wattage: number;
  weightKg: number;
  dmxModes: unknown;
  loadKind: "lamp" | "switch-mode" | null;
  cells: number;
};
type AccessoryRow = {
  id: number;
  fixtureId: number;
  kind: string;
  universe: number | null;
  address: number | null;
  footprint: number | null;
  wattage: number;
  weightKg: number;
};
type CircuitRow = { id: number; name: string; ratingA: number; phase: string | null; power: string };
type DataLineRow = { id: number; name: string; universe: number | null; fixtureIds: unknown };
type PositionRow = {
  id: number;
  name: string;
  kind: PositionKind;
  x1: number;
  y1: number;
  x2: number | null;
  y2: number | null;
  ratedLoadKg: number | null;
  liftLines: number | null;
  version: number;
};

/** Where a unit hangs along a line position, metres from its first end (its plan point projected). */
function along(p: PositionRow, x: number, y: number): number | null {
  if (p.x2 == null || p.y2 == null) return null;
  const dx = p.x2 - p.x1;
  const dy = p.y2 - p.y1;
  const len2 = dx * dx + dy * dy;
  if (len2 === 0) return null;
  const t = Math.min(1, Math.max(0, ((x - p.x1) * dx + (y - p.y1) * dy) / len2));
  return t * Math.sqrt(len2);
}

function toCheckPosition(p: PositionRow): CheckPosition {
  const line = p.x2 != null && p.y2 != null && !isPointHung(p.kind);
  return {
    id: p.id,
    name: p.name,
    kind: p.kind,
    lengthM: line ? Math.hypot((p.x2 as number) - p.x1, (p.y2 as number) - p.y1) : null,
    ratedLoadKg: p.ratedLoadKg == null ? null : Number(p.ratedLoadKg),
    liftLines: p.liftLines,
    counterweighted: p.kind === "flying-electric",
  };
}

type SettingsRow = Pick<Production, "id" | (typeof SETTINGS_KEYS)[number]>;

/** All three checks for a production, computed from its current rows; the per-unit flags are left to getUnitChecks. */
export async function getChecksReport({ productionId }: { productionId: number }): Promise<ChecksReport | null> {
  const report = await computeChecks(productionId);
  if (!report) return null;
  // The flags repeat each unit's notes (about 200 KB at 1,500 units): only the badges' route sends them.
  const { units: _units, ...rest } = report;
  return rest;
}

/** What the checks say about each unit, for the badges on the plot and the rig table. */
export async function getUnitChecks({ productionId }: { productionId: number }) {
  const report = await computeChecks(productionId);
  return report ? { units: report.units, summary: report.summary } : null;
}

async function computeChecks(productionId: number) {
  const db = getDb();
  // Plain SQL rows rather than model queries, one query a table with only the columns used: these reads
  // need no model behaviour. At 1,500 fixtures that took Node's CPU for the report from 55 to 47 ms
  // (bench:checks, loaded machine); the production's row as a plain row too saves building a model instance.
  const select = <T extends object>(sql: string, id: number) =>
    db.sequelize.query<T>(sql, { replacements: [id], type: QueryTypes.SELECT, raw: true });
  const [[production], fixtures, types, positions, accessories, circuits, lines, cueChannels] = await Promise.all([
    select<SettingsRow>(
      "SELECT id, electrical_code AS electricalCode, supply_system AS supplySystem, voltage, derating, cable_kg_per_m AS cableKgPerM, hardware_kg_per_unit AS hardwareKgPerUnit, version FROM productions WHERE id = ?",
      productionId,
    ),
    select<FixtureRow>(
      "SELECT id, position_id AS positionId, fixture_type_id AS fixtureTypeId, unit_number AS unitNumber, body_key AS bodyKey, channel, universe, address, dmx_mode AS dmxMode, footprint, circuit, dimmer, x, y FROM fixtures WHERE production_id = ?",
      productionId,
    ),
    select<TypeRow>(
      "SELECT id, name, family, wattage, weight_kg AS weightKg, dmx_modes AS dmxModes, load_kind AS loadKind, cells FROM fixture_types WHERE production_id = ?",
      productionId,
    ),
    select<PositionRow>(
      "SELECT id, name, kind, x1, y1, x2, y2, rated_load_kg AS ratedLoadKg, lift_lines AS liftLines, version FROM positions WHERE production_id = ? ORDER BY sort_order, id",
      productionId,
    ),
    select<AccessoryRow>(
      "SELECT id, fixture_id AS fixtureId, kind, universe, address, footprint, wattage, weight_kg AS weightKg FROM accessories WHERE production_id = ?",
      productionId,
    ),
    select<CircuitRow>(
      "SELECT id, name, rating_a AS ratingA, phase, power FROM circuits WHERE production_id = ?",
      productionId,
    ),
    select<DataLineRow>(
      "SELECT id, name, universe, fixture_ids AS fixtureIds FROM data_lines WHERE production_id = ? ORDER BY name",
      productionId,
    ),
    select<{ channel: number }>(
      "SELECT DISTINCT l.channel FROM cue_levels l JOIN cues c ON c.id = l.cue_id WHERE c.production_id = ?",
      productionId,
    ),
  ]);
  if (!production) return null;
  const started = performance.now();
  const settings = toElectricalSettingsDto(production);
  const electrical = effectiveElectrical(settings);
  const typeById = new Map(
    types.map((t) => [t.id, { ...t, dmxModes: jsonColumn<{ name: string; footprint: number }[]>(t.dmxModes) ?? [] }]),
  );
  const positionById = new Map(positions.map((p) => [p.id, p]));

  const checkFixtures: RiggingFixture[] = fixtures.map((f) => {
    const t = typeById.get(f.fixtureTypeId);
    const modes = t?.dmxModes ?? [];
    const footprint =
      f.footprint ??
      modes.find((m) => m.name === f.dmxMode)?.footprint ??
      (modes.length === 1 ? modes[0].footprint : null);
    // A type's wattage is the whole unit's; each cell row of a multi-cell body draws its share on its own circuit.
    const cells = f.bodyKey && t && t.cells > 1 ? t.cells : 1;
    const position = positionById.get(f.positionId);
    const load = t ? loadKindOfType(t) : ({ kind: "lamp", source: "family" } as const);
    return {
      id: f.id,
      label: position ? `${f.unitNumber} (${position.name})` : f.unitNumber,
      positionId: f.positionId,
      fixtureTypeId: f.fixtureTypeId,
      typeName: t?.name ?? "unknown type",
      dmxMode: f.dmxMode,
      universe: f.universe,
      address: f.address,
      footprint,
      channel: f.channel,
      circuit: f.circuit,
      dimmer: f.dimmer,
      // Types store 0 for "not entered"; no real unit draws 0 W or weighs 0 kg, so 0 is reported as missing.
      wattage: t && Number(t.wattage) > 0 ? Number(t.wattage) / cells : null,
      weightKg: t && Number(t.weightKg) > 0 ? Number(t.weightKg) : null,
      loadKind: load.kind,
      loadKindSource: load.source,
      bodyKey: f.bodyKey,
      alongM: position ? along(position, Number(f.x), Number(f.y)) : null,
    };
  });

  const result = runChecks({
    fixtures: checkFixtures,
    accessories: accessories.map((a) => ({
      id: a.id,
      fixtureId: a.fixtureId,
      kind: a.kind,
      universe: a.universe,
      address: a.address,
      footprint: a.footprint,
      // 0 is the table's "not entered", as for the types.
      wattage: Number(a.wattage) > 0 ? Number(a.wattage) : null,
      weightKg: Number(a.weightKg) > 0 ? Number(a.weightKg) : null,
    })),
    positions: positions.map(toCheckPosition),
    circuits: circuits.map((c) => ({
      id: c.id,
      name: c.name,
      ratingA: Number(c.ratingA),
      phase: c.phase,
      dimmed: c.power === "dimmed",
    })),
    dataLines: lines.map((l) => ({
      id: l.id,
      name: l.name,
      universe: l.universe,
      fixtureIds: jsonColumn<number[]>(l.fixtureIds) ?? [],
    })),
    cueChannels: cueChannels.map((c) => Number(c.channel)),
    electrical,
    rigging: { cableKgPerM: settings.cableKgPerM, hardwareKgPerUnit: settings.hardwareKgPerUnit },
  });
  return {
    ...result,
    settings,
    electrical,
    cautions: { general: CHECK_CAUTIONS, power: POWER_CAUTIONS, dmx: DMX_CAUTIONS, loadKindRule: LOAD_KIND_RULE },
    liftLines: positions
      .filter((p) => toCheckPosition(p).lengthM != null)
      .map((p) => ({ positionId: p.id, liftLines: p.liftLines, version: p.version })),
    computedAt: new Date().toISOString(),
    computeMs: performance.now() - started,
  };
}

export async function requireUnitChecks({ productionId }: { productionId: number }) {
  const flags = await getUnitChecks({ productionId });
  if (!flags) throw notFound("Production");
  return flags;
}

export async function requireChecksReport({ productionId }: { productionId: number }): Promise<ChecksReport> {
  const report = await getChecksReport({ productionId });
  if (!report) throw notFound("Production");
  return report;
}

/** Each position's fixture ids in unit order: the default order of a data run along it. */
export async function getUnitOrderByPosition({
  productionId,
}: {
  productionId: number;
}): Promise<Record<number, number[]>> {
  const rows = (await getDb().Fixture.findAll({
    raw: true,
    where: { productionId },
    attributes: ["id", "positionId"],
    order: [
      ["positionId", "ASC"],
      ["unitSort", "ASC"],
      ["cell", "ASC"],
    ],
  })) as unknown as { id: number; positionId: number }[];
  const out: Record<number, number[]> = {};
  for (const r of rows) (out[r.positionId] ??= []).push(r.id);
  return out;
}

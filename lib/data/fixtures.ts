import "server-only";
import { getDb, type Fixture, type FixtureType, type FocusPoint, type Position } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { FixtureCreate, FixturePatch } from "@/lib/validation/fixture";
import { computeFixtureGeometry, type FixtureAim, type FixtureGeometry } from "@/lib/rig/fixture-geometry";
import { unitSortKey } from "@/lib/rig/unit-number";
import { iso, versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { requireProduction } from "./productions";

export type FixtureRecord = {
  id: number;
  productionId: number;
  positionId: number;
  fixtureTypeId: number;
  focusPointId: number | null;
  unitNumber: string;
  bodyKey: string | null;
  cell: number | null;
  channel: number | null;
  universe: number | null;
  address: number | null;
  dmxMode: string | null;
  footprint: number | null;
  circuit: string | null;
  dimmer: string | null;
  colour: string | null;
  gobo: string | null;
  purpose: string | null;
  shutterCuts: Fixture["shutterCuts"];
  irisPercent: number | null;
  notes: string | null;
  focusNotes: string | null;
  focusPhotoUploadId: number | null;
  goboRotationDeg: number | null;
  barnDoorTop: string | null;
  barnDoorBottom: string | null;
  barnDoorLeft: string | null;
  barnDoorRight: string | null;
  hung: boolean;
  focused: boolean;
  focusedAt: string | null;
  focusedBy: number | null;
  version: number;
  updatedAt: string;
} & FixtureAim;

export type FixtureDto = FixtureRecord & {
  positionName: string;
  typeName: string;
  family: string;
  focusPointName: string | null;
  computed: FixtureGeometry;
};

export function toFixtureRecord(f: Fixture): FixtureRecord {
  return {
    id: f.id,
    productionId: f.productionId,
    positionId: f.positionId,
    fixtureTypeId: f.fixtureTypeId,
    focusPointId: f.focusPointId,
    unitNumber: f.unitNumber,
    bodyKey: f.bodyKey,
    cell: f.cell,
    channel: f.channel,
    universe: f.universe,
    address: f.address,
    dmxMode: f.dmxMode,
    footprint: f.footprint,
    circuit: f.circuit,
    dimmer: f.dimmer,
    colour: f.colour,
    gobo: f.gobo,
    purpose: f.purpose,
    x: f.x,
    y: f.y,
    lensHeight: f.lensHeight,
    focusX: f.focusX,
    focusY: f.focusY,
    aim: f.aim,
    coneDeg: f.coneDeg,
    softnessDeg: f.softnessDeg,
    shutterCuts: f.shutterCuts,
    irisPercent: f.irisPercent,
    notes: f.notes,
    focusNotes: f.focusNotes,
    focusPhotoUploadId: f.focusPhotoUploadId ?? null,
    goboRotationDeg: f.goboRotationDeg ?? null,
    barnDoorTop: f.barnDoorTop ?? null,
    barnDoorBottom: f.barnDoorBottom ?? null,
    barnDoorLeft: f.barnDoorLeft ?? null,
    barnDoorRight: f.barnDoorRight ?? null,
    hung: Boolean(f.hung),
    focused: Boolean(f.focused),
    focusedAt: iso(f.focusedAt),
    focusedBy: f.focusedBy,
    version: f.version,
    updatedAt: iso(f.updatedAt)!,
  };
}

type Related = { positions: Map<number, Position>; types: Map<number, FixtureType>; points: Map<number, FocusPoint> };

async function loadRelated(productionId: number): Promise<Related> {
  const { Position, FixtureType, FocusPoint } = getDb();
  const [positions, types, points] = await Promise.all([
    Position.findAll({ where: { productionId } }),
    FixtureType.findAll({ where: { productionId } }),
    FocusPoint.findAll({ where: { productionId } }),
  ]);
  return {
    positions: new Map(positions.map((p) => [p.id, p])),
    types: new Map(types.map((t) => [t.id, t])),
    points: new Map(points.map((p) => [p.id, p])),
  };
}

function toFixtureDto(f: Fixture, rel: Related, headHeight: number): FixtureDto {
  const position = rel.positions.get(f.positionId)!;
  const type = rel.types.get(f.fixtureTypeId)!;
  const point = f.focusPointId ? rel.points.get(f.focusPointId) ?? null : null;
  const record = toFixtureRecord(f);
  return {
    ...record,
    positionName: position.name,
    typeName: type.name,
    family: type.family,
    focusPointName: point?.name ?? null,
    computed: computeFixtureGeometry({ ...record, focusPoint: point, position, type }, headHeight),
  };
}

/** Every fixture of a production in hanging order (position order, then unit number), with computed geometry. */
export async function getFixturesByProduction({ productionId }: { productionId: number }): Promise<FixtureDto[]> {
  const production = await requireProduction(productionId);
  const [rows, rel] = await Promise.all([
    getDb().Fixture.findAll({ where: { productionId }, order: [["positionId", "ASC"], ["unitSort", "ASC"], ["cell", "ASC"]] }),
    loadRelated(productionId),
  ]);
  const order = (id: number) => rel.positions.get(id)?.sortOrder ?? 0;
  return rows
    .map((f) => toFixtureDto(f, rel, production.headHeight))
    .sort((a, b) => order(a.positionId) - order(b.positionId) || a.positionName.localeCompare(b.positionName) || 0);
}

export async function getFixtureById({ productionId, fixtureId }: { productionId: number; fixtureId: number }): Promise<FixtureDto | null> {
  const production = await requireProduction(productionId);
  const row = await getDb().Fixture.findOne({ where: { productionId, id: fixtureId } });
  if (!row) return null;
  return toFixtureDto(row, await loadRelated(productionId), production.headHeight);
}

/** Checks that referenced rows belong to the same production and that the DMX range fits the universe. */
async function checkReferences(productionId: number, merged: FixtureRecord) {
  const { Position, FixtureType, FocusPoint } = getDb();
  const [position, type, point] = await Promise.all([
    Position.findOne({ where: { productionId, id: merged.positionId } }),
    FixtureType.findOne({ where: { productionId, id: merged.fixtureTypeId } }),
    merged.focusPointId ? FocusPoint.findOne({ where: { productionId, id: merged.focusPointId } }) : null,
  ]);
  const fieldErrors: Record<string, string[]> = {};
  if (!position) fieldErrors.positionId = ["no such position in this production"];
  if (!type) fieldErrors.fixtureTypeId = ["no such fixture type in this production"];
  if (merged.focusPointId && !point) fieldErrors.focusPointId = ["no such focus point in this production"];
  const footprint = merged.footprint ?? type?.dmxModes?.[0]?.footprint ?? 1;
  // ANSI E1.11 (DMX512-A): slots 1–512; a fixture may not straddle two universes.
  if (merged.address != null && merged.address + footprint - 1 > 512) {
    fieldErrors.address = [`a ${footprint}-slot fixture at ${merged.address} runs past slot 512`];
  }
  if (Object.keys(fieldErrors).length) {
    throw new AppError("bad_request", `Please check the input — ${Object.entries(fieldErrors).map(([k, v]) => `${k}: ${v[0]}`).join("; ")}`, { fieldErrors });
  }
}

export async function updateFixture({ productionId, fixtureId, patch, userId }: { productionId: number; fixtureId: number; patch: FixturePatch; userId: number }): Promise<FixtureDto> {
  const { sequelize, Fixture } = getDb();
  const { version, ...changes } = patch;
  if (Object.keys(changes).length === 0) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  const existing = await Fixture.findOne({ where: { productionId, id: fixtureId } });
  if (!existing) throw notFound("Fixture");
  const merged = { ...toFixtureRecord(existing), ...changes } as FixtureRecord;
  await checkReferences(productionId, merged);

  const write: Record<string, unknown> = { ...changes };
  if (changes.unitNumber !== undefined) write.unitSort = unitSortKey(changes.unitNumber);
  if (changes.focused === true && !existing.focused) Object.assign(write, { focusedAt: new Date(), focusedBy: userId });
  if (changes.focused === false) Object.assign(write, { focusedAt: null, focusedBy: null });

  await sequelize.transaction(async (transaction) => {
    const { before, after } = await versionedUpdate({
      model: Fixture,
      scope: { productionId },
      id: fixtureId,
      version,
      changes: write,
      toDto: toFixtureRecord,
      what: "Fixture",
      transaction,
    }).catch((err) => {
      if ((err as { name?: string }).name === "SequelizeUniqueConstraintError") {
        throw new AppError("bad_request", "Another fixture on that position already has this unit number.", { fieldErrors: { unitNumber: ["already used on this position"] } });
      }
      throw err;
    });
    await recordChange({ productionId, userId, entity: "fixture", entityId: fixtureId, action: "update", before: toFixtureRecord(before), after: toFixtureRecord(after) }, transaction);
  });
  return (await getFixtureById({ productionId, fixtureId }))!;
}

/** Creates fixtures in one transaction (all or none); returns them with computed geometry. */
export async function createFixtures({ productionId, userId, inputs }: { productionId: number; userId: number; inputs: FixtureCreate[] }): Promise<FixtureDto[]> {
  const { sequelize, Fixture } = getDb();
  const ids = await sequelize.transaction(async (transaction) => {
    const created: number[] = [];
    for (const [i, input] of inputs.entries()) {
      const merged = { focusPointId: null, address: null, footprint: null, ...input } as FixtureRecord;
      await checkReferences(productionId, merged).catch((err) => {
        if (err instanceof AppError && inputs.length > 1) err.message = `Fixture ${i + 1}: ${err.message}`;
        throw err;
      });
      const row = await Fixture.create({ ...emptyFixture(), ...input, productionId, unitSort: unitSortKey(input.unitNumber) }, { transaction }).catch((err) => {
        if ((err as { name?: string }).name === "SequelizeUniqueConstraintError") {
          throw new AppError("bad_request", `Unit ${input.unitNumber} already exists on that position.`, { fieldErrors: { unitNumber: ["already used on this position"] } });
        }
        throw err;
      });
      await recordChange({ productionId, userId, entity: "fixture", entityId: row.id, action: "create", after: toFixtureRecord(row) }, transaction);
      created.push(row.id);
    }
    return created;
  });
  const all = await getFixturesByProduction({ productionId });
  return all.filter((f) => ids.includes(f.id));
}

function emptyFixture() {
  return {
    focusPointId: null, bodyKey: null, cell: null, channel: null, universe: null, address: null, dmxMode: null, footprint: null,
    circuit: null, dimmer: null, colour: null, gobo: null, purpose: null, lensHeight: null, focusX: null, focusY: null,
    coneDeg: null, softnessDeg: null, shutterCuts: null, irisPercent: null, notes: null, focusNotes: null, focusedAt: null, focusedBy: null,
    focusPhotoUploadId: null, goboRotationDeg: null, barnDoorTop: null, barnDoorBottom: null, barnDoorLeft: null, barnDoorRight: null,
  };
}

/** Deletes fixtures of this production by id, recording each; unknown ids are a 404 and nothing is deleted. */
export async function deleteFixtures({ productionId, userId, fixtureIds }: { productionId: number; userId: number; fixtureIds: number[] }) {
  const { sequelize, Fixture } = getDb();
  await sequelize.transaction(async (transaction) => {
    const rows = await Fixture.findAll({ where: { productionId, id: fixtureIds }, transaction });
    if (rows.length !== new Set(fixtureIds).size) throw notFound("Fixture");
    for (const row of rows) {
      await recordChange({ productionId, userId, entity: "fixture", entityId: row.id, action: "delete", before: toFixtureRecord(row) }, transaction);
    }
    await Fixture.destroy({ where: { productionId, id: fixtureIds }, transaction });
  });
}

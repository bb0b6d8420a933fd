import "server-only";
import { literal, type Transaction } from "sequelize";
import { getDb, type Fixture } from "@/models";
import { AppError } from "@/lib/errors";
import { unitSortKey } from "@/lib/rig/unit-number";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import type { PositionKind } from "@/lib/rig/position-kinds";
import type { ImportPlanResult } from "@/lib/rig/import-plan";
import { toFixtureRecord } from "./fixtures";
import type { Progress } from "./import";

const CHUNK = 1000;
const lower = (s: string) => s.trim().toLowerCase();

// A position named in a file carries no geometry: it is drawn as a 10 m line (or a point for booms and
// floor units) at the centre line and a 6 m trim, for the designer to move on the plot.
function guessKind(name: string): PositionKind {
  const n = name.toLowerCase();
  if (/boom/.test(n)) return "boom";
  if (/ladder/.test(n)) return "ladder";
  if (/truss/.test(n)) return "truss";
  if (/bridge|foh|front of house|catwalk/.test(n)) return "foh-bridge";
  if (/rail|balcony/.test(n)) return "foh-rail";
  if (/floor|deck/.test(n)) return "floor";
  return "overhead-pipe";
}

async function createPositions(productionId: number, names: string[], transaction: Transaction) {
  const { Position } = getDb();
  const top = ((await Position.max("sortOrder", { where: { productionId }, transaction })) as number | null) ?? -1;
  const rows = names.map((name, i) => {
    const kind = guessKind(name);
    const line = !["boom", "ladder", "floor"].includes(kind);
    return { productionId, name, kind, x1: line ? -5 : 0, y1: 0, x2: line ? 5 : null, y2: line ? 0 : null, trimHeight: kind === "floor" ? 0 : 6, ratedLoadKg: null, sortOrder: top + 1 + i };
  });
  const created = await Position.bulkCreate(rows, { transaction });
  return new Map(created.map((p) => [lower(p.name), p]));
}

// A type named in a file becomes the starter type of that name when there is one, else a placeholder
// profile with typical figures (from memory) for the designer to correct.
async function createTypes(productionId: number, names: string[], transaction: Transaction) {
  const { FixtureType } = getDb();
  const rows = names.map((name) => {
    const starter = STARTER_TYPES.find((t) => lower(t.name) === lower(name));
    return starter
      ? { ...starter, productionId, name }
      : { productionId, name, family: "profile", coneMinDeg: 26, coneMaxDeg: 26, defaultSoftnessDeg: 2, peakCandela: 30000, dmxModes: [{ name: "dimmer", footprint: 1 }], frameSize: null, goboSize: null };
  });
  const created = await FixtureType.bulkCreate(rows as never[], { transaction });
  return new Map(created.map((t) => [lower(t.name), t.id]));
}

const EMPTY = {
  focusPointId: null, bodyKey: null, cell: null, channel: null, universe: null, address: null, dmxMode: null, footprint: null, circuit: null, dimmer: null,
  colour: null, gobo: null, purpose: null, lensHeight: null, focusX: null, focusY: null, coneDeg: null, softnessDeg: null, shutterCuts: null, irisPercent: null,
  notes: null, focusNotes: null, focusedAt: null, focusedBy: null, aim: "deck" as const, hung: false, focused: false,
};

/** Writes a checked plan in one transaction: every row lands, or (on any error) none does. */
export async function writeImport({ productionId, userId, plan, progress }: { productionId: number; userId: number; plan: ImportPlanResult; progress?: Progress }) {
  const { sequelize, Fixture, Position, ChangeEntry } = getDb();
  const creates = plan.plans.filter((p) => p.action === "create");
  const updates = plan.plans.filter((p) => p.action === "update");
  const total = creates.length + updates.length;
  let done = 0;
  await sequelize.transaction(async (transaction) => {
    const newPositions = plan.newPositions.length ? await createPositions(productionId, plan.newPositions, transaction) : new Map();
    const newTypes = plan.newTypes.length ? await createTypes(productionId, plan.newTypes, transaction) : new Map<string, number>();
    const positions = new Map((await Position.findAll({ where: { productionId }, transaction, raw: true })).map((p) => [p.id, p]));
    for (const p of newPositions.values()) positions.set(p.id, p);

    const rows = creates.map((c) => {
      const v = c.values as Record<string, unknown>;
      const positionId = (v.positionId as number | null) ?? newPositions.get(lower(c.positionName))!.id;
      const fixtureTypeId = (v.fixtureTypeId as number | null) ?? newTypes.get(lower(c.typeName))!;
      const pos = positions.get(positionId)!;
      // Without X/Y a new unit sits at the middle of its position until someone places it on the plot.
      const x = (v.x as number | undefined) ?? (pos.x2 != null ? (pos.x1 + pos.x2) / 2 : pos.x1);
      const y = (v.y as number | undefined) ?? (pos.y2 != null ? (pos.y1 + pos.y2) / 2 : pos.y1);
      return { ...EMPTY, ...v, positionId, fixtureTypeId, x, y, productionId, unitNumber: String(v.unitNumber), unitSort: unitSortKey(String(v.unitNumber)) };
    });
    const changes: Array<Record<string, unknown>> = [];
    for (let i = 0; i < rows.length; i += CHUNK) {
      const created = await Fixture.bulkCreate(rows.slice(i, i + CHUNK) as never[], { transaction, returning: false });
      for (const f of created) changes.push({ productionId, userId, entity: "fixture", entityId: f.id, action: "create", before: null, after: toFixtureRecord(f) });
      done += created.length;
      progress?.("writing", done, total);
    }

    for (const u of updates) {
      if (u.action !== "update") continue;
      const [count] = await Fixture.update({ ...u.changes, ...(u.changes.unitNumber ? { unitSort: unitSortKey(String(u.changes.unitNumber)) } : {}), version: literal("version + 1") } as never, {
        where: { productionId, id: u.fixtureId, version: u.version },
        transaction,
      });
      if (count === 0) throw new AppError("conflict", `Nothing was imported: the fixture in row ${u.rowNumber} was changed by someone else while the file was being checked. Check the file again.`);
      const before = toFixtureRecord(u.before as unknown as Fixture);
      changes.push({ productionId, userId, entity: "fixture", entityId: u.fixtureId, action: "update", before, after: { ...before, ...u.changes, version: u.version + 1 } });
      if (++done % 250 === 0) progress?.("writing", done, total);
    }
    for (let i = 0; i < changes.length; i += CHUNK) await ChangeEntry.bulkCreate(changes.slice(i, i + CHUNK) as never[], { transaction });
  });
  progress?.("writing", total, total);
}

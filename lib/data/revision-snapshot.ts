import "server-only";
// The snapshot of a production's paperwork a revision is issued from: every fixture with its paperwork
// fields and the names its ids stand for, positions, types, and cues with the levels they record.
import type { Transaction } from "sequelize";
import { getDb } from "@/models";
import type { SnapCue, SnapFixture, SnapRow, SnapValue, Snapshot } from "@/lib/revisions/types";
import { CUE_SNAPSHOT_FIELDS, FIXTURE_SNAPSHOT_FIELDS } from "@/lib/revisions/fields";
import { toFixtureRecord } from "./fixtures";
import { toPositionDto } from "./positions";
import { toFixtureTypeDto } from "./fixture-types";
import { getCuesByProduction } from "./cue-reads";

const ROW_SKIP = new Set(["productionId", "version", "updatedAt"]);
const snapRow = (dto: object) => Object.fromEntries(Object.entries(dto).filter(([k]) => !ROW_SKIP.has(k))) as SnapRow;

/** Reads everything one query at a time on the transaction's connection (never a second pooled one). */
export async function takeSnapshot({
  productionId,
  transaction,
}: {
  productionId: number;
  transaction?: Transaction;
}): Promise<Snapshot> {
  const { Fixture, Position, FixtureType, FocusPoint, Accessory } = getDb();
  const where = { productionId };
  const positions = await Position.findAll({
    where,
    order: [
      ["sortOrder", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  const types = await FixtureType.findAll({ where, order: [["id", "ASC"]], transaction });
  const points = await FocusPoint.findAll({ where, transaction });
  const fixtures = await Fixture.findAll({ where, order: [["id", "ASC"]], transaction });
  const accessories = await Accessory.findAll({ where, order: [["id", "ASC"]], transaction });
  const cues = await getCuesByProduction({ productionId, transaction });

  const positionName = new Map(positions.map((p) => [p.id, p.name]));
  const typeName = new Map(types.map((t) => [t.id, t.name]));
  const pointName = new Map(points.map((p) => [p.id, p.name]));
  const kindsOn = new Map<number, string[]>();
  for (const a of accessories) kindsOn.set(a.fixtureId, [...(kindsOn.get(a.fixtureId) ?? []), a.kind]);

  const snapFixtures: SnapFixture[] = fixtures.map((row) => {
    const record = toFixtureRecord(row) as unknown as Record<string, SnapValue>;
    const fields = Object.fromEntries(FIXTURE_SNAPSHOT_FIELDS.map((f) => [f, record[f] ?? null]));
    return {
      ...fields,
      id: row.id,
      positionName: positionName.get(row.positionId) ?? "?",
      typeName: typeName.get(row.fixtureTypeId) ?? "?",
      focusPointName: row.focusPointId ? (pointName.get(row.focusPointId) ?? null) : null,
      accessories: kindsOn.get(row.id) ?? [],
    };
  });
  const snapCues: SnapCue[] = cues.map((c) => ({
    ...(Object.fromEntries(CUE_SNAPSHOT_FIELDS.map((f) => [f, (c[f] ?? null) as SnapValue])) as object),
    id: c.id,
    number: c.number,
    label: c.label,
    levels: Object.fromEntries(Object.entries(c.levels).map(([ch, l]) => [ch, Number(l)])),
  }));
  return {
    format: 1,
    takenAt: new Date().toISOString(),
    fixtures: snapFixtures,
    positions: positions.map((p) => snapRow(toPositionDto(p))),
    types: types.map((t) => snapRow(toFixtureTypeDto(t))),
    cues: snapCues,
  };
}

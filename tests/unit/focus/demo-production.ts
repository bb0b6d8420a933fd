// The demo production as the seeder writes it, read without a database: the seeder runs against a small
// stand-in for sequelize-cli's queryInterface that keeps the inserted rows and answers its few SELECTs.
import { createRequire } from "node:module";
import path from "node:path";
import type { ChartProduction, FocusChart } from "@/lib/focus/chart-model";
import { computeFixtureGeometry } from "@/lib/rig/fixture-geometry";

// The chart's own fixture type, so this file follows wherever the DTO type lives.
type FixtureDto = FocusChart["fixture"];
type Row = Record<string, unknown> & { id: number };
export type DemoTables = Record<string, Row[]>;

const SEEDER = "seeders/20261202000100-demo-production.cjs";

export async function loadDemoTables(): Promise<DemoTables> {
  const tables: DemoTables = {};
  let nextId = 1;
  const qi = {
    bulkInsert: async (table: string, rows: Array<Record<string, unknown>>) => {
      tables[table] ??= [];
      for (const r of rows) tables[table].push({ ...r, id: nextId++ });
    },
    sequelize: {
      query: async (sql: string) => {
        const table = /FROM\s+(\w+)/i.exec(sql)?.[1] ?? "";
        const rows = [...(tables[table] ?? [])];
        return /ORDER BY number/i.test(sql) ? rows.sort((a, b) => Number(a.number) - Number(b.number)) : rows;
      },
    },
  };
  const require = createRequire(import.meta.url);
  const seeder = require(path.resolve(process.cwd(), SEEDER)) as { up: (q: typeof qi) => Promise<void> };
  await seeder.up(qi);
  return tables;
}

export function demoProduction(t: DemoTables): ChartProduction {
  const p = t.productions[0] as Record<string, unknown>;
  return {
    name: String(p.name),
    displayUnits: p.display_units as "metric",
    datumName: String(p.datum_name),
    headHeight: Number(p.head_height),
    prosceniumWidth: Number(p.proscenium_width),
    apronDepth: Number(p.apron_depth),
    backWallY: Number(p.back_wall_y),
    stageWidth: Number(p.stage_width),
  };
}

const camel = (k: string) => k.replace(/_([a-z])/g, (_, c: string) => c.toUpperCase());

/** Every demo fixture as the API would return it (the same geometry code), with its joins filled in. */
export function demoFixtures(t: DemoTables): FixtureDto[] {
  const p = demoProduction(t);
  return t.fixtures.map((row) => {
    const r = Object.fromEntries(Object.entries(row).map(([k, v]) => [camel(k), v])) as Record<string, unknown>;
    const position = t.positions.find((x) => x.id === r.positionId)!;
    const type = t.fixture_types.find((x) => x.id === r.fixtureTypeId)!;
    const point = t.focus_points.find((x) => x.id === r.focusPointId) ?? null;
    const cuts = typeof r.shutterCuts === "string" ? JSON.parse(r.shutterCuts) : (r.shutterCuts ?? null);
    const record = {
      ...r,
      shutterCuts: cuts,
      productionId: row.production_id,
      focusedAt: null,
      focusedBy: null,
      updatedAt: "2026-12-02T10:00:00.000Z",
    };
    const computed = computeFixtureGeometry(
      {
        ...(record as never as FixtureDto),
        focusPoint: point ? { x: Number(point.x), y: Number(point.y) } : null,
        position: { trimHeight: Number(position.trim_height) },
        type: {
          coneMinDeg: Number(type.cone_min_deg),
          coneMaxDeg: Number(type.cone_max_deg),
          defaultSoftnessDeg: Number(type.default_softness_deg),
          lensDropM: Number(type.lens_drop_m),
        },
      },
      p.headHeight,
    );
    return {
      ...record,
      positionName: String(position.name),
      typeName: String(type.name),
      family: String(type.family),
      focusPointName: point ? String(point.name) : null,
      computed,
    } as unknown as FixtureDto;
  });
}

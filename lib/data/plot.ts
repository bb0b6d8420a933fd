import "server-only";
import { getDb } from "@/models";
import type { PlotData, PlotWireData } from "@/lib/dto/plot";
import { PLOT_FIXTURE_FIELDS, toPlotFixtureWire, type PlotFixtureRecord } from "@/lib/plot/slim-fixtures";
import { getPositionsByProduction } from "./positions";
import { getFixturesByProduction } from "./fixtures";
import { getFixtureTypesByProduction } from "./fixture-types";
import { getFocusPointsByProduction } from "./focus-points";
import { getAreaZonesByProduction } from "./area-zones";
import { getLandmarksByProduction } from "./landmarks";
import { getUploadsByProduction } from "./uploads";
import { plain } from "./plain";
import { jsonColumn } from "./json-column";

/** Everything the plot draws, read in parallel for the first paint. */
export async function getPlotData({ productionId }: { productionId: number }): Promise<PlotData> {
  const [positions, fixtures, fixtureTypes, focusPoints, areaZones, landmarks, underlays] = await Promise.all([
    getPositionsByProduction({ productionId }),
    getFixturesByProduction({ productionId }),
    getFixtureTypesByProduction({ productionId }),
    getFocusPointsByProduction({ productionId }),
    getAreaZonesByProduction({ productionId }),
    getLandmarksByProduction({ productionId }),
    getUploadsByProduction({ productionId, kind: "underlay" }),
  ]);
  return { positions, fixtures, fixtureTypes, focusPoints, areaZones, landmarks, underlays };
}

/**
 * The editor's read: fixtures as short arrays of what the plot draws (lib/plot/slim-fixtures), no
 * server-computed pools; the browser computes those with the same module.
 */
export async function getPlotWireData({ productionId }: { productionId: number }): Promise<PlotWireData> {
  const [positions, records, fixtureTypes, focusPoints, areaZones, landmarks, underlays] = await Promise.all([
    getPositionsByProduction({ productionId }),
    getPlotFixtureRecords(productionId),
    getFixtureTypesByProduction({ productionId }),
    getFocusPointsByProduction({ productionId }),
    getAreaZonesByProduction({ productionId }),
    getLandmarksByProduction({ productionId }),
    getUploadsByProduction({ productionId, kind: "underlay" }),
  ]);
  // Hanging order, as getFixturesByProduction: position order, then position name, then unit order.
  const pos = new Map(positions.map((p) => [p.id, p]));
  const rank = (id: number) => pos.get(id)?.sortOrder ?? 0;
  const name = (id: number) => pos.get(id)?.name ?? "";
  records.sort(
    (a, b) => rank(a.positionId) - rank(b.positionId) || name(a.positionId).localeCompare(name(b.positionId)),
  );
  return {
    positions,
    fixtures: records.map(toPlotFixtureWire),
    fixtureTypes,
    focusPoints,
    areaZones,
    landmarks,
    underlays,
  };
}

async function getPlotFixtureRecords(productionId: number): Promise<PlotFixtureRecord[]> {
  // Plain rows, no model instances: building 1,500 instances was a visible part of the page's time.
  const rows = (await getDb().Fixture.findAll({
    where: { productionId },
    attributes: [...PLOT_FIXTURE_FIELDS],
    order: [
      ["positionId", "ASC"],
      ["unitSort", "ASC"],
      ["cell", "ASC"],
    ],
    raw: true,
  })) as unknown as Array<Record<string, unknown>>;
  return rows.map((f) => {
    const out = plain(f, PLOT_FIXTURE_FIELDS) as PlotFixtureRecord;
    out.shutterCuts = jsonColumn(out.shutterCuts);
    return out;
  });
}

/**
 * A cheap token that changes whenever anything in the production changes: the newest change-log entry
 * and the newest row edit. The plot polls this every few seconds and refetches only when it moves.
 */
export async function getPlotStamp({ productionId }: { productionId: number }): Promise<string> {
  const [rows] = (await getDb().sequelize.query(
    `SELECT (SELECT COALESCE(MAX(id), 0) FROM change_entries WHERE production_id = ?) AS c,
            (SELECT COALESCE(MAX(updated_at), 0) FROM fixtures WHERE production_id = ?) AS f,
            (SELECT COUNT(*) FROM fixtures WHERE production_id = ?) AS n`,
    { replacements: [productionId, productionId, productionId] },
  )) as unknown as [Array<{ c: number; f: unknown; n: number }>];
  const r = rows[0];
  return `${r.c}.${String(r.f)}.${r.n}`;
}

import "server-only";
import { getDb } from "@/models";
import { getPositionsByProduction, type PositionDto } from "./positions";
import { getFixturesByProduction, type FixtureDto } from "./fixtures";
import { getFixtureTypesByProduction, type FixtureTypeDto } from "./fixture-types";
import { getFocusPointsByProduction, type FocusPointDto } from "./focus-points";
import { getAreaZonesByProduction, type AreaZoneDto } from "./area-zones";
import { getLandmarksByProduction, type LandmarkDto } from "./landmarks";
import { getUploadsByProduction, type UploadDto } from "./uploads";

export type PlotData = {
  positions: PositionDto[];
  fixtures: FixtureDto[];
  fixtureTypes: FixtureTypeDto[];
  focusPoints: FocusPointDto[];
  areaZones: AreaZoneDto[];
  landmarks: LandmarkDto[];
  underlays: UploadDto[];
};

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

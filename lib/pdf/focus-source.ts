import "server-only";
// Everything a focus-chart print view, PDF or workbook needs, read through the data layer once.
import { getFixturesByProduction } from "@/lib/data/fixtures";
import { requireProduction } from "@/lib/data/productions";
import { getTeamByProduction } from "@/lib/data/memberships";
import { getLandmarksByProduction } from "@/lib/data/landmarks";
import { getAccessoriesByProduction } from "@/lib/data/accessories";
import { buildFocusChart, type ChartProduction, type FocusChart } from "@/lib/focus/chart-model";
import { extrasByFixture } from "@/lib/focus/extras";
import { filterFixtures, type FocusFilter } from "@/lib/focus/filters";
import { landmarksFromRows, mergeLandmarks, outlineLandmarks, type Landmark } from "@/lib/focus/landmarks";

export type FocusSource = { production: ChartProduction & { id: number }; charts: FocusChart[]; landmarks: Landmark[] };

export async function loadFocusCharts({
  productionId,
  filter,
  timeZone,
}: {
  productionId: number;
  filter: Partial<FocusFilter>;
  timeZone?: string;
}): Promise<FocusSource> {
  const [production, fixtures, team, drawn, accessories] = await Promise.all([
    requireProduction(productionId),
    getFixturesByProduction({ productionId }),
    getTeamByProduction({ productionId }),
    getLandmarksByProduction({ productionId }),
    getAccessoriesByProduction({ productionId }),
  ]);
  const userNames = Object.fromEntries(team.map((m) => [m.userId, m.name]));
  const landmarks = mergeLandmarks(landmarksFromRows(drawn), outlineLandmarks(production));
  const extras = extrasByFixture(accessories);
  const charts = filterFixtures(fixtures, filter).map((f) =>
    buildFocusChart(f, production, { landmarks, userNames, timeZone, extras: extras[f.id] }),
  );
  return { production, charts, landmarks };
}

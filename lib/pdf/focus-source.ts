import "server-only";
// Everything a focus-chart screen, print view, PDF or workbook needs, read through the data layer once.
import { getFixturesByProduction } from "@/lib/data/fixtures";
import { requireProduction } from "@/lib/data/productions";
import { getTeamByProduction } from "@/lib/data/memberships";
import { buildFocusChart, type ChartProduction, type FocusChart } from "@/lib/focus/chart-model";
import { filterFixtures, type FocusFilter } from "@/lib/focus/filters";
import { mergeLandmarks, outlineLandmarks, type Landmark } from "@/lib/focus/landmarks";

export type FocusSource = { production: ChartProduction & { id: number }; charts: FocusChart[]; landmarks: Landmark[]; userNames: Record<number, string> };

export async function loadFocusCharts({ productionId, filter, timeZone }: { productionId: number; filter: Partial<FocusFilter>; timeZone?: string }): Promise<FocusSource> {
  const [production, fixtures, team] = await Promise.all([
    requireProduction(productionId),
    getFixturesByProduction({ productionId }),
    getTeamByProduction({ productionId }),
  ]);
  const userNames = Object.fromEntries(team.map((m) => [m.userId, m.name]));
  const landmarks = mergeLandmarks(null, outlineLandmarks(production));
  const charts = filterFixtures(fixtures, filter).map((f) => buildFocusChart(f, production, { landmarks, userNames, timeZone }));
  return { production, charts, landmarks, userNames };
}

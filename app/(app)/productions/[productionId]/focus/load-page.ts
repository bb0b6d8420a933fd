import "server-only";
// What both focus screens (the list and the focus call) need from the server, in one parallel read.
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import { requireProduction } from "@/lib/data/productions";
import { getFixturesByProduction } from "@/lib/data/fixtures";
import { getPositionsByProduction } from "@/lib/data/positions";
import { getFocusPointsByProduction } from "@/lib/data/focus-points";
import { getTeamByProduction } from "@/lib/data/memberships";
import { getLandmarksByProduction } from "@/lib/data/landmarks";
import { getAccessoriesByProduction } from "@/lib/data/accessories";
import { extrasByFixture } from "@/lib/focus/extras";
import { landmarksFromRows } from "@/lib/focus/landmarks";
import type { FocusPageData } from "./_components/types";

export async function loadFocusPage(rawProductionId: string): Promise<FocusPageData> {
  const { productionId, member } = await memberForPage(rawProductionId);
  const [production, fixtures, positions, points, team, drawn, accessories] = await Promise.all([
    requireProduction(productionId),
    getFixturesByProduction({ productionId }),
    getPositionsByProduction({ productionId }),
    getFocusPointsByProduction({ productionId }),
    getTeamByProduction({ productionId }),
    getLandmarksByProduction({ productionId }),
    getAccessoriesByProduction({ productionId }),
  ]);
  return {
    production,
    fixtures,
    positions: positions.map((p) => ({ id: p.id, name: p.name, kind: p.kind })),
    points: points.map((p) => ({ id: p.id, name: p.name })),
    drawnLandmarks: landmarksFromRows(drawn),
    extras: extrasByFixture(accessories),
    userNames: Object.fromEntries(team.map((m) => [m.userId, m.name])),
    rights: {
      focus: can(member, "rig.editElectrics"),
      designerNotes: can(member, "plot.edit"),
      export: can(member, "rig.export"),
    },
  };
}

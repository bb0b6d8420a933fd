import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getColourList, getStudyFixtures, getStudyLevels, getStudyProduction } from "@/lib/data/studies";
import { getPerformerMarksByProduction } from "@/lib/data/performer-marks";
import { getScenicPanelsByProduction } from "@/lib/data/scenic-panels";
import { studyLights } from "@/lib/studies/lights";
import { shadowStudy } from "@/lib/studies/shadows";
import { shadowRequestSchema } from "@/lib/validation/studies";
import type { ShadowResult } from "@/lib/dto/studies";

type Ctx = { params: Promise<{ productionId: string }> };

/** Every lit unit's shadow of every performer mark and scenery panel in one state; the server's word on it. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "studies.view");
  const { source } = await readJson(req, shadowRequestSchema);
  const [production, fixtures, state, colours, performers, panels] = await Promise.all([
    getStudyProduction({ productionId }),
    getStudyFixtures({ productionId }),
    getStudyLevels({ productionId, source }),
    getColourList({ productionId }),
    getPerformerMarksByProduction({ productionId }),
    getScenicPanelsByProduction({ productionId }),
  ]);
  const deckHeight = production.showDeckHeight;
  const { lights, warnings } = studyLights(fixtures, state.levels, {
    headHeight: production.headHeight,
    deckHeight,
    colours,
  });
  const occluders = shadowStudy({ lights, performers, panels, backWallY: production.backWallY, deckHeight });
  const result: ShadowResult & { stateLabel: string; performers: typeof performers; panels: typeof panels } = {
    occluders,
    lights,
    backWallY: production.backWallY,
    deckHeight,
    warnings,
    stateLabel: state.label,
    performers,
    panels,
  };
  return result;
});

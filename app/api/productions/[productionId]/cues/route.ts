import { route } from "@/lib/http/respond";
import { collectionRoutes } from "@/lib/http/crud-routes";
import { requireMember } from "@/lib/auth/guards";
import { createCue, getChannelLabels, getCuesByProduction } from "@/lib/data/cues";
import { cueCreateSchema } from "@/lib/validation/cue";

type Ctx = { params: Promise<{ productionId: string }> };

/** The cue list with every cue's moves, and what each channel lights (for the level grid). */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const [cues, channels] = await Promise.all([
    getCuesByProduction({ productionId }),
    getChannelLabels({ productionId }),
  ]);
  return { cues, channels };
});

export const { POST } = collectionRoutes({
  key: "cues",
  itemKey: "cue",
  create: { permission: "cues.edit", schema: cueCreateSchema, run: createCue },
});

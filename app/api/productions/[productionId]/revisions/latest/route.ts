import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getChangedSinceLatest, getLatestRevisionStamp } from "@/lib/data/revisions";

type Ctx = { params: Promise<{ productionId: string }> };

/** The latest issued revision's stamp and the fixtures and cues changed since it (the views' markers). */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const latest = await getLatestRevisionStamp({ productionId });
  const changed = latest ? await getChangedSinceLatest({ productionId }) : null;
  return { latest, fixtureIds: changed?.fixtureIds ?? [], cueIds: changed?.cueIds ?? [] };
});

import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getCueSheet } from "@/lib/data/cues";

type Ctx = { params: Promise<{ productionId: string }> };

/** The stage manager's cue sheet: times, running times, one-line summaries and standbys. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return getCueSheet({ productionId });
});

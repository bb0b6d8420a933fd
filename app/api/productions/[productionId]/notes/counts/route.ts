import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getOpenNoteCounts } from "@/lib/data/note-counts";

type Ctx = { params: Promise<{ productionId: string }> };

/** Open notes per fixture, position, cue and focus point: one read for all the badges on a page. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { counts: await getOpenNoteCounts({ productionId }) };
});

import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getHistory } from "@/lib/data/change-history";
import { historyQuerySchema } from "@/lib/revisions/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/** One fixture's, position's, cue's or type's history: who, when, which field, before and after. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { entity, id } = readQuery(req, historyQuerySchema);
  return { history: await getHistory({ productionId, entity, id }) };
});

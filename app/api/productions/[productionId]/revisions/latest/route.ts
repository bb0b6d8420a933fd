import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getLatestRevisionMarks } from "@/lib/data/revisions";

type Ctx = { params: Promise<{ productionId: string }> };

/** The latest issued revision's stamp and the fixtures and cues changed since it (the views' markers). */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return getLatestRevisionMarks({ productionId });
});

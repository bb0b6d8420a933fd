import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { parseId } from "@/lib/http/respond";
import { notFound } from "@/lib/errors";
import { compareRevisions, getPreviousRevisionId, getRevisionById } from "@/lib/data/revisions";
import { diffSnapshots } from "@/lib/revisions/diff";
import { getSnapshot } from "@/lib/data/revisions";

type Ctx = { params: Promise<{ productionId: string; revisionId: string }> };

/** One revision with what changed since the one before it (everything, for the first). */
export const GET = route(async (_req, { params }: Ctx) => {
  const p = await params;
  const { productionId } = await requireMember(p.productionId);
  const revisionId = parseId(p.revisionId, "Revision");
  const revision = await getRevisionById({ productionId, revisionId });
  if (!revision) throw notFound("Revision");
  const previousId = await getPreviousRevisionId({ productionId, revisionId });
  if (previousId) {
    const { from, diff } = await compareRevisions({ productionId, from: previousId, to: revisionId });
    return { revision, previousLabel: from, diff };
  }
  const { snapshot } = await getSnapshot({ productionId, revision: revisionId });
  return { revision, previousLabel: null, diff: diffSnapshots(null, snapshot) };
});

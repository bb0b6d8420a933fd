import { route, readJson, parseId } from "@/lib/http/respond";
import { requireFields, requireMember } from "@/lib/auth/guards";
import { restoreCue, restoreFixture } from "@/lib/data/revision-restore";
import { restoreSchema } from "@/lib/revisions/schemas";

type Ctx = { params: Promise<{ productionId: string; revisionId: string }> };

/**
 * Puts one fixture's or cue's values back as they were in this revision: a new, recorded change under the
 * version the user last read (409 with the current row when someone changed it since). Each field it would
 * write needs its own right, as an edit of that field would.
 */
export const POST = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user, member } = await requireMember(p.productionId, "revisions.issue");
  const revisionId = parseId(p.revisionId, "Revision");
  const body = await readJson(req, restoreSchema);
  const args = { productionId, revisionId, id: body.id, version: body.version, userId: user.id };
  if (body.entity === "fixture")
    return { fixture: await restoreFixture({ ...args, allow: (f) => requireFields(member, "fixture", f) }) };
  return { cue: await restoreCue({ ...args, allow: (f) => requireFields(member, "cue", f) }) };
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getRevisionsByProduction, issueRevision } from "@/lib/data/revisions";
import { requireProduction } from "@/lib/data/productions";
import { issueRevisionSchema } from "@/lib/revisions/schemas";
import { mailRevision } from "@/lib/revisions/revision-mail";
import { summarise } from "@/lib/revisions/diff";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { revisions: await getRevisionsByProduction({ productionId }) };
});

/**
 * Issues a revision and queues the team's e-mail. The revision stands once its transaction commits: a
 * failure while the mail is prepared is reported beside it, never undoes it.
 */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "revisions.issue");
  const input = await readJson(req, issueRevisionSchema);
  const issued = await issueRevision({ productionId, userId: user.id, input });
  const production = await requireProduction(productionId);
  let mail: { queued: number } | { error: string };
  try {
    mail = await mailRevision({
      productionId,
      productionName: production.name,
      revision: issued.revision,
      previousRevisionId: issued.previous?.id ?? null,
      previousLabel: issued.previous?.label ?? null,
      diff: issued.diff,
      sparesPercent: input.sparesPercent,
    });
  } catch (err) {
    console.error("revision mail could not be prepared", err);
    mail = { error: "The revision is issued, but its e-mail could not be prepared. Try sending it from the outbox." };
  }
  return Response.json(
    { revision: issued.revision, previousLabel: issued.previous?.label ?? null, summary: summarise(issued.diff), mail },
    { status: 201 },
  );
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getRevisionMailChoices, setRevisionMail } from "@/lib/data/revision-mail-settings";
import { revisionMailChoiceSchema } from "@/lib/revisions/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/** Whether the signed-in member gets the revision e-mail; each member decides for themselves only. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId);
  return { receive: (await getRevisionMailChoices({ productionId }))[user.id] ?? true };
});

export const PUT = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId);
  const { receive } = await readJson(req, revisionMailChoiceSchema);
  return setRevisionMail({ productionId, userId: user.id, receive });
});

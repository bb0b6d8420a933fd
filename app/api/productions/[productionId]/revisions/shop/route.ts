import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getShopEmail, setShopEmail } from "@/lib/data/revision-mail-settings";
import { shopEmailSchema } from "@/lib/revisions/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/** The rental shop's address that gets the add / return list with each revision: the owner's to name. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "team.manage");
  return { shopEmail: await getShopEmail({ productionId }) };
});

export const PUT = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "team.manage");
  const { shopEmail } = await readJson(req, shopEmailSchema);
  return setShopEmail({ productionId, shopEmail: shopEmail || null });
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { setProductionArchived } from "@/lib/data/production-lifecycle";
import { archiveProductionSchema } from "@/lib/validation/production-lifecycle";

type Ctx = { params: Promise<{ productionId: string }> };

/** Archive (true) or restore (false): the owner's. An archived production leaves the list; nothing is removed. */
export const PUT = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "production.archive");
  const { archived } = await readJson(req, archiveProductionSchema);
  return { production: await setProductionArchived({ productionId, userId: user.id, archived }) };
});

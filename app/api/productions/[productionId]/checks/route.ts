import { requireMember } from "@/lib/auth/guards";
import { requireChecksReport } from "@/lib/data/checks";
import { route } from "@/lib/http/respond";

type Ctx = { params: Promise<{ productionId: string }> };

/** All three checks (DMX data, power, rigging), computed from the production's rows as they are now. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "studies.view");
  return { checks: await requireChecksReport({ productionId }) };
});

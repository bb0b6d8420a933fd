import { requireMember } from "@/lib/auth/guards";
import { requireUnitChecks } from "@/lib/data/checks";
import { route } from "@/lib/http/respond";

type Ctx = { params: Promise<{ productionId: string }> };

/** What the checks say about each unit, for the badges on the plot and the rig table (one request a page). */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "studies.view");
  return await requireUnitChecks({ productionId });
});

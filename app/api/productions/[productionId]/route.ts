import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getProductionOverview, requireProduction, updateProductionSettings } from "@/lib/data/productions";
import { getTeamByProduction } from "@/lib/data/memberships";
import { updateProductionSchema } from "@/lib/validation/production";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId, member } = await requireMember((await params).productionId);
  const [production, overview, team] = await Promise.all([
    requireProduction(productionId),
    getProductionOverview({ productionId }),
    getTeamByProduction({ productionId }),
  ]);
  return { production, overview, team, you: member };
});

export const PATCH = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "settings.edit");
  const { version, ...changes } = await readJson(req, updateProductionSchema);
  return { production: await updateProductionSettings({ productionId, version, changes, userId: user.id }) };
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getProductionOverview, requireProduction, updateProductionSettings } from "@/lib/data/productions";
import { getTeamByProduction } from "@/lib/data/memberships";
import { updateProductionSchema } from "@/lib/validation/production";
import { deleteProduction } from "@/lib/data/production-lifecycle";
import { deleteProductionSchema } from "@/lib/validation/production-lifecycle";

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

/** The owner deletes the production and everything of it; the body carries its name, typed, as the confirmation. */
export const DELETE = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "production.delete");
  const { confirmName } = await readJson(req, deleteProductionSchema);
  return { deleted: await deleteProduction({ productionId, confirmName }) };
});

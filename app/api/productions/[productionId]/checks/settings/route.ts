import { requireMember } from "@/lib/auth/guards";
import { getElectricalSettings, updateElectricalSettings } from "@/lib/data/checks";
import { notFound } from "@/lib/errors";
import { readJson, route } from "@/lib/http/respond";
import { updateElectricalSettingsSchema } from "@/lib/validation/checks";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const settings = await getElectricalSettings({ productionId });
  if (!settings) throw notFound("Production");
  return { settings };
});

/** The electrical code, supply, continuous-load factor and rigging allowances the checks use. */
export const PATCH = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "studies.run");
  const patch = await readJson(req, updateElectricalSettingsSchema);
  return { settings: await updateElectricalSettings({ productionId, userId: user.id, patch }) };
});

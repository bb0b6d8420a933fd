import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { notFound } from "@/lib/errors";
import { deleteAccessory, updateAccessory } from "@/lib/data/accessories";
import { accessoryPatchSchema } from "@/lib/validation/accessory";
import { idSchema } from "@/lib/validation/common";

type Ctx = { params: Promise<{ productionId: string; accessoryId: string }> };

async function ids(params: Ctx["params"]) {
  const p = await params;
  const id = idSchema.safeParse(p.accessoryId);
  if (!id.success) throw notFound("Accessory");
  return { rawProductionId: p.productionId, accessoryId: id.data };
}

export const PATCH = route(async (req, { params }: Ctx) => {
  const { rawProductionId, accessoryId } = await ids(params);
  const { productionId, user } = await requireMember(rawProductionId, "rig.editElectrics");
  const patch = await readJson(req, accessoryPatchSchema);
  return { accessory: await updateAccessory({ productionId, accessoryId, userId: user.id, patch }) };
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const { rawProductionId, accessoryId } = await ids(params);
  const { productionId, user } = await requireMember(rawProductionId, "rig.editElectrics");
  await deleteAccessory({ productionId, accessoryId, userId: user.id });
  return { ok: true };
});

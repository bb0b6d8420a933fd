import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { createAccessory, getAccessoriesByProduction } from "@/lib/data/accessories";
import { accessoryCreateSchema } from "@/lib/validation/accessory";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { accessories: await getAccessoriesByProduction({ productionId }) };
});

/** Accessories are electrics: the designer and the electrician may add them. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "rig.editElectrics");
  const input = await readJson(req, accessoryCreateSchema);
  return Response.json({ accessory: await createAccessory({ productionId, userId: user.id, input }) }, { status: 201 });
});

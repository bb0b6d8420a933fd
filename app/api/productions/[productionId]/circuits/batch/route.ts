import { requireMember } from "@/lib/auth/guards";
import { createCircuits } from "@/lib/data/circuits";
import { readJson, route } from "@/lib/http/respond";
import { createCircuitsSchema } from "@/lib/validation/checks";

type Ctx = { params: Promise<{ productionId: string }> };

/** A rack's worth of circuits at once: every row is checked first, then all are written or none. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "rig.editElectrics");
  const { circuits } = await readJson(req, createCircuitsSchema);
  return Response.json(
    { circuits: await createCircuits({ productionId, userId: user.id, inputs: circuits }) },
    { status: 201 },
  );
});

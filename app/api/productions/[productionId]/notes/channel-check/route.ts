import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { recordChannelCheck } from "@/lib/data/notes-rig";
import { channelCheckSchema } from "@/lib/notes/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/** The crew's channel check: each faulty fixture becomes a work note on it. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "rig.editElectrics");
  const input = await readJson(req, channelCheckSchema);
  return Response.json(await recordChannelCheck({ productionId, userId: user.id, input }), { status: 201 });
});

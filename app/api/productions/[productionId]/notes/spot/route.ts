import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getSpotContributions } from "@/lib/data/notes-rig";
import { spotRequestSchema } from "@/lib/notes/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/** "What lights this spot?": computing changes nothing, so any member may ask. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { x, y, cueId } = await readJson(req, spotRequestSchema);
  return getSpotContributions({ productionId, x, y, cueId });
});

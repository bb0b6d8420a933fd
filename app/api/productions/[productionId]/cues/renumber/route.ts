import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { renumberCues } from "@/lib/data/cues";
import { renumberSchema } from "@/lib/validation/cue";

type Ctx = { params: Promise<{ productionId: string }> };

export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "cues.edit");
  const range = await readJson(req, renumberSchema);
  return renumberCues({ productionId, range, userId: user.id });
});

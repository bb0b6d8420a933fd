import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getCurrentCue, setCurrentCue } from "@/lib/data/notes";
import { currentCueSchema } from "@/lib/notes/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { currentCue: await getCurrentCue({ productionId }) };
});

/** The stage manager or board operator moves the current cue as the show runs; new notes pick it up. */
export const PUT = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "notes.setCurrentCue");
  const { cueId } = await readJson(req, currentCueSchema);
  return { currentCue: await setCurrentCue({ productionId, userId: user.id, cueId }) };
});

import { route, readJson } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { importCuesFromAscii } from "@/lib/data/cues";
import { cueImportSchema } from "@/lib/validation/cue";

type Ctx = { params: Promise<{ productionId: string }> };

/** Replaces the cue list with a USITT ASCII file, in one transaction: all of it or nothing. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "cues.edit");
  const { text, mode } = await readJson(req, cueImportSchema);
  return importCuesFromAscii({ productionId, text, mode, userId: user.id });
});

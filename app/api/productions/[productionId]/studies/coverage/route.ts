import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { runCoverageStudy } from "@/lib/data/studies";
import { coverageRequestSchema } from "@/lib/validation/studies";

type Ctx = { params: Promise<{ productionId: string }> };

/**
 * The coverage grid of one state (a cue, all at full, or chosen channels) on the deck, at head height or on
 * faces. A POST because the request is a small document; it writes nothing, so every member may run it.
 */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "studies.view");
  const request = await readJson(req, coverageRequestSchema);
  return runCoverageStudy({ productionId, request });
});

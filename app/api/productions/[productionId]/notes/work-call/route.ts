import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getWorkCall } from "@/lib/data/notes-rig";

type Ctx = { params: Promise<{ productionId: string }> };

/** Open work notes in the order the crew walks the rig. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { stops: await getWorkCall({ productionId }) };
});

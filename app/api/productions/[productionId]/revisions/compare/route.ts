import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { compareRevisions } from "@/lib/data/revisions";
import { compareQuerySchema } from "@/lib/revisions/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/** What changed between any two revisions, or between one and the paperwork as it stands ("current"). */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { from, to } = readQuery(req, compareQuerySchema);
  return compareRevisions({ productionId, from, to });
});

import { parseId, readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { updateShowReport } from "@/lib/data/show-reports";
import { updateShowReportSchema } from "@/lib/notes/schemas";

type Ctx = { params: Promise<{ productionId: string; reportId: string }> };

/** The stage manager edits a draft report (409 when stale, and for a report already sent: it is read-only). */
export const PATCH = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "notes.fileShowReport");
  const id = parseId(p.reportId, "Show report");
  const patch = await readJson(req, updateShowReportSchema);
  return { showReport: await updateShowReport({ productionId, id, userId: user.id, patch }) };
});

import { parseId, readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { sendShowReport } from "@/lib/data/show-reports";
import { sendShowReportSchema } from "@/lib/notes/schemas";
import { mailShowReport } from "@/lib/notes/show-report-mail";

type Ctx = { params: Promise<{ productionId: string; reportId: string }> };

/** The stage manager sends a draft: its items and logged faults become notes, the team gets it by e-mail. */
export const POST = route(async (req, { params }: Ctx) => {
  const p = await params;
  const { productionId, user } = await requireMember(p.productionId, "notes.fileShowReport");
  const id = parseId(p.reportId, "Show report");
  const { version } = await readJson(req, sendShowReportSchema);
  const sent = await sendShowReport({ productionId, id, userId: user.id, version });
  // After the commit: a mail failure leaves the messages queued and never undoes the sending.
  const mail = await mailShowReport(productionId, sent.report, sent.notes);
  return { ...sent, mail };
});

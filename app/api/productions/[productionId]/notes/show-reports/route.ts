import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { fileShowReport, getShowReports } from "@/lib/data/show-reports";
import { showReportSchema } from "@/lib/notes/schemas";
import { mailShowReport } from "@/lib/notes/show-report-mail";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { showReports: await getShowReports({ productionId }) };
});

/**
 * The stage manager files the report after a performance: sent at once (its lighting items and logged faults
 * become notes; the team gets it by e-mail), or kept as a draft with `send: false` (written nowhere, mailed to nobody).
 */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "notes.fileShowReport");
  const input = await readJson(req, showReportSchema);
  const filed = await fileShowReport({ productionId, userId: user.id, input });
  if (filed.report.status === "draft") return Response.json(filed, { status: 201 });
  // After the commit: a mail failure leaves the messages queued and never undoes the report.
  const mail = await mailShowReport(productionId, filed.report, filed.notes);
  return Response.json({ ...filed, mail }, { status: 201 });
});

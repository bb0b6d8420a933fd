import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { fileShowReport, getShowReports } from "@/lib/data/show-reports";
import { showReportSchema } from "@/lib/notes/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  return { showReports: await getShowReports({ productionId }) };
});

/** The stage manager files the report after a performance; its lighting items and logged faults become notes. */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, user } = await requireMember((await params).productionId, "notes.fileShowReport");
  const input = await readJson(req, showReportSchema);
  return Response.json(await fileShowReport({ productionId, userId: user.id, input }), { status: 201 });
});

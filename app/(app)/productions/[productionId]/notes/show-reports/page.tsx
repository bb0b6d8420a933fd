import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import { getShowReports } from "@/lib/data/show-reports";
import { getNoteSubjects } from "@/lib/data/note-subjects";
import { ShowReportsView } from "./_components/show-reports-view";

export const metadata: Metadata = { title: "Show reports" };

export default async function ShowReportsPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const [reports, subjects] = await Promise.all([getShowReports({ productionId }), getNoteSubjects({ productionId })]);
  return (
    <ShowReportsView
      productionId={productionId}
      initial={reports}
      subjects={subjects}
      canFile={can(member, "notes.fileShowReport")}
    />
  );
}

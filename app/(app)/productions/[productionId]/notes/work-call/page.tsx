import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { closableNoteKinds } from "@/lib/auth/policy";
import { getWorkCall } from "@/lib/data/notes-rig";
import { getNoteSubjects } from "@/lib/data/note-subjects";
import { requireProduction } from "@/lib/data/productions";
import { WorkCallView } from "./_components/work-call-view";

export const metadata: Metadata = { title: "Work call" };

export default async function WorkCallPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const [stops, subjects, production] = await Promise.all([
    getWorkCall({ productionId }),
    getNoteSubjects({ productionId }),
    requireProduction(productionId),
  ]);
  return (
    <WorkCallView
      productionId={productionId}
      productionName={production.name}
      displayUnits={production.displayUnits}
      initial={stops}
      people={subjects.people}
      canClose={closableNoteKinds(member).includes("work")}
    />
  );
}

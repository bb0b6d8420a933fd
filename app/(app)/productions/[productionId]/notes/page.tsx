import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { can, closableNoteKinds } from "@/lib/auth/policy";
import { getCurrentCue, getNotesByProduction } from "@/lib/data/notes";
import { getNoteSubjects } from "@/lib/data/note-subjects";
import { requireProduction } from "@/lib/data/productions";
import { NotesView } from "./_components/notes-view";

export const metadata: Metadata = { title: "Notes" };

type Search = { subject?: string; subjectId?: string };

export default async function NotesPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<Search>;
}) {
  const { productionId, member, user } = await memberForPage((await params).productionId);
  const [notes, subjects, currentCue, production, search] = await Promise.all([
    getNotesByProduction({ productionId }),
    getNoteSubjects({ productionId }),
    getCurrentCue({ productionId }),
    requireProduction(productionId),
    searchParams,
  ]);
  // A notes button elsewhere (a fixture, a cue, a position) opens this page with the subject chosen.
  const subjectId = Number(search.subjectId);
  const preset =
    search.subject && Number.isInteger(subjectId) && subjectId > 0 ? { subject: search.subject, subjectId } : null;
  return (
    <NotesView
      productionId={productionId}
      userId={user.id}
      initial={notes}
      subjects={subjects}
      currentCue={currentCue}
      preset={preset}
      displayUnits={production.displayUnits}
      rights={{
        write: can(member, "notes.write"),
        setCurrentCue: can(member, "notes.setCurrentCue"),
        closable: closableNoteKinds(member),
        channelCheck: can(member, "rig.editElectrics"),
      }}
    />
  );
}

import type { Metadata } from "next";
import { HydrationBoundary, dehydrate } from "@tanstack/react-query";
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import { makeQueryClient } from "@/lib/query/query-client";
import { productionKeys } from "@/hooks/query-keys";
import { getChannelLabels, getCueSheet, getCuesByProduction } from "@/lib/data/cues";
import { requireProduction } from "@/lib/data/productions";
import { getLatestRevisionMarks } from "@/lib/data/revisions";
import { latestRevisionKey } from "@/hooks/latest-revision-key";
import { CueSheetView } from "./_components/cue-sheet";
import { CueWorkspace } from "./_components/cue-workspace";
import { CueLevelsView } from "./_components/cue-levels-view";
import { CueViewSwitch } from "./_components/cue-view-switch";

export const metadata: Metadata = { title: "Cues" };

/**
 * The designer writes cues here; everyone else (the stage manager first of all) reads the cue
 * sheet, or the levels read only with ?view=levels. The designer can open the sheet too with ?view=sheet.
 */
export default async function CuesPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<{ view?: string }>;
}) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const canEdit = can(member, "cues.edit");
  const view = (await searchParams).view;
  const showLevels = !canEdit && view === "levels";
  const showSheet = !showLevels && (!canEdit || view === "sheet");
  const queryClient = makeQueryClient();
  const production = await requireProduction(productionId);
  if (showSheet) {
    await queryClient.prefetchQuery({
      queryKey: productionKeys.cueSheet(productionId),
      queryFn: () => getCueSheet({ productionId }),
    });
    // The "changed since revision" bars and the sheet's revision stamp draw with the first paint.
    queryClient.setQueryData(latestRevisionKey(productionId, "cues"), await getLatestRevisionMarks({ productionId }));
  } else {
    await queryClient.prefetchQuery({
      queryKey: productionKeys.cues(productionId),
      queryFn: async () => {
        const [cues, channels] = await Promise.all([
          getCuesByProduction({ productionId }),
          getChannelLabels({ productionId }),
        ]);
        return { cues, channels };
      },
    });
  }
  return (
    <main className="px-4 py-4 print:p-0">
      <HydrationBoundary state={dehydrate(queryClient)}>
        {canEdit ? null : <CueViewSwitch current={showLevels ? "levels" : "sheet"} />}
        {showLevels ? (
          <CueLevelsView productionId={productionId} />
        ) : showSheet ? (
          <CueSheetView
            productionId={productionId}
            productionName={production.name}
            canEditNotes={can(member, "cues.editCallNotes")}
            canWriteCues={canEdit}
          />
        ) : (
          <CueWorkspace
            productionId={productionId}
            stage={{
              prosceniumWidth: production.prosceniumWidth,
              stageWidth: production.stageWidth,
              stageDepth: production.stageDepth,
              apronDepth: production.apronDepth,
              backWallY: production.backWallY,
              datumName: production.datumName,
            }}
          />
        )}
      </HydrationBoundary>
    </main>
  );
}

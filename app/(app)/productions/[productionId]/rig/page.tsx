import { TYPE_COLUMNS } from "@/lib/rig/type-fields";
import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { can, canEditField } from "@/lib/auth/policy";
import { requireProduction } from "@/lib/data/productions";
import { getFixturesByProduction } from "@/lib/data/fixtures";
import { getFixtureTypesByProduction } from "@/lib/data/fixture-types";
import { getPositionsByProduction } from "@/lib/data/positions";
import { getAccessoriesByProduction } from "@/lib/data/accessories";
import { RIG_COLUMNS } from "@/lib/rig/columns";
import { isRigViewId } from "@/lib/rig/views";
import { RigWorkspace } from "./_components/rig-workspace";
import { requireChecksReport } from "@/lib/data/checks";
import { ChecksBadge } from "@/components/checks/checks-badge";
import { HydrationBoundary, dehydrate } from "@tanstack/react-query";
import { getLatestRevisionMarks } from "@/lib/data/revisions";
import { makeQueryClient } from "@/lib/query/query-client";
import { latestRevisionKey } from "@/hooks/latest-revision-key";
import { revisionStampText } from "@/components/revisions/revision-marks";

export const metadata: Metadata = { title: "Rig" };

const TYPE_FIELDS = TYPE_COLUMNS.flatMap((c) => c.fields as string[]);

export default async function RigPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<{ view?: string }>;
}) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const [production, fixtures, types, positions, accessories, checks, marks] = await Promise.all([
    requireProduction(productionId),
    getFixturesByProduction({ productionId }),
    getFixtureTypesByProduction({ productionId }),
    getPositionsByProduction({ productionId }),
    getAccessoriesByProduction({ productionId }),
    requireChecksReport({ productionId }),
    getLatestRevisionMarks({ productionId }),
  ]);
  // The "changed since revision" bars draw with the first paint: the answer goes to the browser's cache.
  const queryClient = makeQueryClient();
  queryClient.setQueryData(latestRevisionKey(productionId, "fixtures"), marks);
  const editable = RIG_COLUMNS.filter(
    (c) =>
      c.importKey &&
      c.id !== "unitNumber" &&
      c.id !== "focusPoint" &&
      canEditField(member, "fixture", c.attribute ?? c.id),
  ).map((c) => c.id);
  const view = (await searchParams).view;
  return (
    <>
      <ChecksBadge
        productionId={productionId}
        summary={checks.summary}
        className="fixed right-4 bottom-4 z-30 shadow"
      />
      {/* The printed rig carries the revision it belongs to; the rows changed since it carry a side bar. */}
      <p className="hidden px-4 text-xs print:block print:p-0">{revisionStampText(marks.latest)}</p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <RigWorkspace
          productionId={productionId}
          productionName={production.name}
          units={production.displayUnits}
          initialView={view && isRigViewId(view) ? view : "hang"}
          initialFixtures={fixtures}
          initialTypes={types}
          initialAccessories={accessories}
          positions={positions.map((p) => ({ id: p.id, name: p.name }))}
          rights={{
            editable,
            typeFields: TYPE_FIELDS.filter((f) => canEditField(member, "fixtureType", f)),
            canImport: can(member, "rig.import"),
            canPlot: can(member, "plot.edit"),
            canElectrics: can(member, "rig.editElectrics"),
          }}
        />
      </HydrationBoundary>
    </>
  );
}

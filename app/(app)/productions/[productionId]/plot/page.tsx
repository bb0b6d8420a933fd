import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import { requireProduction } from "@/lib/data/productions";
import { getPlotWireData, getPlotStamp } from "@/lib/data/plot";
import { PlotEditor } from "./_components/plot-editor";
import { requireChecksReport } from "@/lib/data/checks";
import { ChecksBadge } from "@/components/checks/checks-badge";

export const metadata: Metadata = { title: "Plot" };

export default async function PlotPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const stamp = await getPlotStamp({ productionId });
  const [production, data, checks] = await Promise.all([
    requireProduction(productionId),
    getPlotWireData({ productionId }),
    requireChecksReport({ productionId }),
  ]);
  return (
    <main aria-label="Plot">
      <ChecksBadge
        productionId={productionId}
        summary={checks.summary}
        className="fixed right-4 bottom-4 z-30 shadow"
      />
      <PlotEditor production={production} initial={{ stamp, ...data }} canEdit={can(member, "plot.edit")} />
    </main>
  );
}

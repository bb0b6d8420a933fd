import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import { getUnitOrderByPosition, requireChecksReport } from "@/lib/data/checks";
import { getCircuitsByProduction } from "@/lib/data/circuits";
import { getDataLinesByProduction } from "@/lib/data/data-lines";
import { getPositionsByProduction } from "@/lib/data/positions";
import { ChecksView } from "./_components/checks-view";

export const metadata: Metadata = { title: "Checks" };

export default async function ChecksPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId, "studies.view");
  const [report, circuits, dataLines, positions, unitOrder] = await Promise.all([
    requireChecksReport({ productionId }),
    getCircuitsByProduction({ productionId }),
    getDataLinesByProduction({ productionId }),
    getPositionsByProduction({ productionId }),
    getUnitOrderByPosition({ productionId }),
  ]);
  return (
    <ChecksView
      productionId={productionId}
      initial={{ report, circuits, dataLines }}
      positions={positions.map((p) => ({ id: p.id, name: p.name, unitIds: unitOrder[p.id] ?? [] }))}
      rights={{
        electrics: can(member, "rig.editElectrics"),
        run: can(member, "studies.run"),
        export: can(member, "studies.view"),
      }}
    />
  );
}

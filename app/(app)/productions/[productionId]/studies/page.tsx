import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import { requireProduction } from "@/lib/data/productions";
import { getCuesByProduction } from "@/lib/data/cues";
import { getAreaZonesByProduction } from "@/lib/data/area-zones";
import { getStudyProduction } from "@/lib/data/studies";
import { getPerformerMarksByProduction } from "@/lib/data/performer-marks";
import { getScenicPanelsByProduction } from "@/lib/data/scenic-panels";
import { getColourTransmissionsByProduction } from "@/lib/data/colour-transmissions";
import { StudiesWorkspace } from "./_components/studies-workspace";

export const metadata: Metadata = { title: "Studies" };

/** Coverage of the acting areas and the shadows performers cast, for a cue or any chosen light. */
export default async function StudiesPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<{ study?: string }>;
}) {
  const { productionId, member } = await memberForPage((await params).productionId, "studies.view");
  const [production, study, cues, areas, performers, panels, colours] = await Promise.all([
    requireProduction(productionId),
    getStudyProduction({ productionId }),
    getCuesByProduction({ productionId }),
    getAreaZonesByProduction({ productionId }),
    getPerformerMarksByProduction({ productionId }),
    getScenicPanelsByProduction({ productionId }),
    getColourTransmissionsByProduction({ productionId }),
  ]);
  const initialStudy = (await searchParams).study === "shadows" ? "shadows" : "coverage";
  return (
    <main className="px-4 py-4">
      <StudiesWorkspace
        productionId={productionId}
        canRun={can(member, "studies.run")}
        initialStudy={initialStudy}
        units={production.displayUnits}
        stage={{
          prosceniumWidth: production.prosceniumWidth,
          stageWidth: production.stageWidth,
          stageDepth: production.stageDepth,
          apronDepth: production.apronDepth,
          backWallY: production.backWallY,
          datumName: production.datumName,
        }}
        heights={{ head: study.headHeight, face: study.faceHeight, deck: study.showDeckHeight }}
        cues={cues.map((c) => ({ id: c.id, number: c.number, label: c.label }))}
        areas={areas.map((a) => ({ id: a.id, name: a.name, polygon: a.polygon }))}
        performers={performers}
        panels={panels}
        colours={colours}
      />
    </main>
  );
}

import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { getFixturesByProduction } from "@/lib/data/fixtures";
import { compareUnitNumbers } from "@/lib/rig/unit-number";
import { ChannelCheckView } from "./_components/channel-check-view";

export const metadata: Metadata = { title: "Channel check" };

export default async function ChannelCheckPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId } = await memberForPage((await params).productionId, "rig.editElectrics");
  const fixtures = await getFixturesByProduction({ productionId });
  // Channel order, as the board brings them up; units with no channel cannot be brought up and are left out.
  const units = fixtures
    .filter((f) => f.channel != null)
    .sort(
      (a, b) =>
        a.channel! - b.channel! ||
        a.positionName.localeCompare(b.positionName) ||
        compareUnitNumbers(a.unitNumber, b.unitNumber),
    )
    .map((f) => ({
      id: f.id,
      channel: f.channel!,
      label: `${f.positionName} unit ${f.unitNumber}`,
      type: f.typeName,
      colour: f.colour,
    }));
  return <ChannelCheckView productionId={productionId} units={units} />;
}

import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { equipmentFile, getEquipment } from "@/lib/data/revision-equipment";
import { requireProduction } from "@/lib/data/productions";
import { equipmentQuerySchema } from "@/lib/revisions/schemas";

type Ctx = { params: Promise<{ productionId: string }> };

/**
 * The equipment list of a revision (or "current"), with spares; with `from`, also the add / return list
 * from that revision. JSON for the page, CSV or Excel for the shop.
 */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "rig.export");
  const q = readQuery(req, equipmentQuerySchema);
  const report = await getEquipment({ productionId, of: q.of, from: q.from, sparesPercent: q.spares });
  if (!q.format || q.format === "json") return report;
  const production = await requireProduction(productionId);
  const file = await equipmentFile(report, q.format, production.name);
  return new Response(new Uint8Array(file.body), {
    headers: {
      "content-type": file.contentType,
      "content-disposition": `attachment; filename="${encodeURIComponent(file.fileName)}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      "cache-control": "no-store",
    },
  });
});

import { z } from "zod";
import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getPlotData, getPlotStamp } from "@/lib/data/plot";

type Ctx = { params: Promise<{ productionId: string }> };
const query = z.object({ only: z.enum(["stamp"], { error: "only may be: stamp" }).optional() }).strict();

/** Everything the plot draws; `?only=stamp` answers just the change token the editor polls. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { only } = readQuery(req, query);
  if (only === "stamp") return { stamp: await getPlotStamp({ productionId }) };
  // The token first: a change landing during the read moves the next poll's token, never hides.
  const stamp = await getPlotStamp({ productionId });
  return { stamp, ...(await getPlotData({ productionId })) };
});

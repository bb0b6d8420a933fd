import { z } from "zod";
import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getPlotData, getPlotStamp, getPlotWireData } from "@/lib/data/plot";

type Ctx = { params: Promise<{ productionId: string }> };
const query = z
  .object({
    only: z.enum(["stamp"], { error: "only may be: stamp" }).optional(),
    shape: z.enum(["full", "slim"], { error: "shape may be: full or slim" }).optional(),
  })
  .strict();

/**
 * Everything the plot draws; `?only=stamp` answers just the change token the editor polls, and
 * `?shape=slim` the editor's compact read (fixtures as short arrays, geometry computed in the browser).
 */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { only, shape } = readQuery(req, query);
  if (only === "stamp") return { stamp: await getPlotStamp({ productionId }) };
  // The token first: a change landing during the read moves the next poll's token, never hides.
  const stamp = await getPlotStamp({ productionId });
  if (shape === "slim") return { stamp, ...(await getPlotWireData({ productionId })) };
  return { stamp, ...(await getPlotData({ productionId })) };
});

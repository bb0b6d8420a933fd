import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { requireProduction } from "@/lib/data/productions";
import { getPlotData } from "@/lib/data/plot";
import { stageBounds, extendBounds } from "@/lib/plot/stage-outline";
import { PAPERS, SCALES, bestScale, type PaperName } from "./paper";
import { PrintSheet } from "./print-sheet";

export const metadata: Metadata = { title: "Plot — print to scale" };

type Search = Promise<{ paper?: string; scale?: string }>;

export default async function PrintPlotPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Search;
}) {
  const { productionId } = await memberForPage((await params).productionId);
  const [production, data, q] = await Promise.all([
    requireProduction(productionId),
    getPlotData({ productionId }),
    searchParams,
  ]);
  const paper: PaperName =
    q.paper && q.paper in PAPERS ? (q.paper as PaperName) : production.displayUnits === "metric" ? "A3" : "tabloid";
  const pts = data.positions.flatMap((p) => [
    { x: p.x1, y: p.y1 },
    ...(p.x2 != null && p.y2 != null ? [{ x: p.x2, y: p.y2 }] : []),
  ]);
  const bounds = extendBounds(stageBounds(production), pts);
  const scales = SCALES[production.displayUnits];
  const chosen =
    scales.find((s) => String(s.ratio) === q.scale) ??
    bestScale(production.displayUnits, paper, bounds.maxX - bounds.minX + 2, bounds.maxY - bounds.minY + 2);
  return (
    <main className="p-4 print:p-0">
      <form className="no-print mb-3 flex flex-wrap items-end gap-3 text-sm" method="get">
        <label className="flex flex-col gap-1">
          Paper (landscape)
          <select name="paper" defaultValue={paper} className="rounded border border-line bg-surface px-2 py-1">
            {Object.entries(PAPERS).map(([k, p]) => (
              <option key={k} value={k}>
                {p.label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Scale
          <select
            name="scale"
            defaultValue={String(chosen.ratio)}
            className="rounded border border-line bg-surface px-2 py-1"
          >
            {scales.map((s) => (
              <option key={s.ratio} value={s.ratio}>
                {s.label}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" className="rounded-md border border-line px-3 py-1.5">
          Update
        </button>
        <span className="text-muted">Print at 100 % (no “fit to page”) so the scale holds.</span>
      </form>
      <PrintSheet production={production} data={data} paper={paper} scale={chosen} bounds={bounds} />
    </main>
  );
}

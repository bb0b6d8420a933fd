import type { Metadata } from "next";
import { z } from "zod";
import { memberForPage } from "@/lib/auth/page-guards";
import { requireProduction } from "@/lib/data/productions";
import { getPlotData } from "@/lib/data/plot";
import { getTeamByProduction } from "@/lib/data/memberships";
import { getLatestRevisionStamp } from "@/lib/data/revisions";
import { stageBounds, extendBounds } from "@/lib/plot/stage-outline";
import { ORIENTATIONS, PAPERS, SCALES, bestScale, sheetLayout, type PaperName } from "./paper";
import { PrintSheet } from "./print-sheet";
import { symbolKey } from "./sheet-plan";

export const metadata: Metadata = { title: "Plot — print to scale" };

// Anything unknown in the address falls back to the production's usual sheet rather than an error page.
const searchSchema = z.object({
  paper: z
    .enum(Object.keys(PAPERS) as [PaperName, ...PaperName[]])
    .optional()
    .catch(undefined),
  orient: z.enum(["landscape", "portrait"]).optional().catch(undefined),
  scale: z.string().max(8).optional().catch(undefined),
});

const selectClass = "rounded border border-line bg-surface px-2 py-1";

export default async function PrintPlotPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { productionId } = await memberForPage((await params).productionId);
  const [production, data, team, revision, raw] = await Promise.all([
    requireProduction(productionId),
    getPlotData({ productionId }),
    getTeamByProduction({ productionId }),
    getLatestRevisionStamp({ productionId }),
    searchParams,
  ]);
  const q = searchSchema.parse(raw);
  const paper: PaperName = q.paper ?? (production.displayUnits === "metric" ? "A3" : "tabloid");
  const orientation = q.orient ?? "landscape";
  const keyEntries = symbolKey(data);
  // One row is kept for a note under the key (labels that found no room), so the layout need not wait for it.
  const layout = sheetLayout(paper, orientation, keyEntries.length + 2);
  const pts = data.positions.flatMap((p) => [
    { x: p.x1, y: p.y1 },
    ...(p.x2 != null && p.y2 != null ? [{ x: p.x2, y: p.y2 }] : []),
  ]);
  const bounds = extendBounds(stageBounds(production), pts);
  const scales = SCALES[production.displayUnits];
  const chosen =
    scales.find((s) => String(s.ratio) === q.scale) ??
    bestScale(production.displayUnits, layout.drawing, bounds.maxX - bounds.minX + 2, bounds.maxY - bounds.minY + 2);
  const designers = team.filter((m) => m.role === "designer").sort((a, b) => Number(b.isOwner) - Number(a.isOwner));
  return (
    <main className="p-4 print:p-0">
      <form className="no-print mb-3 flex flex-wrap items-end gap-3 text-sm" method="get">
        <label className="flex flex-col gap-1">
          Paper
          <select name="paper" defaultValue={paper} className={selectClass}>
            {Object.entries(PAPERS).map(([key, p]) => (
              <option key={key} value={key}>
                {p.label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Orientation
          <select name="orient" defaultValue={orientation} className={selectClass}>
            {Object.entries(ORIENTATIONS).map(([key, label]) => (
              <option key={key} value={key}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Scale
          <select name="scale" defaultValue={String(chosen.ratio)} className={selectClass}>
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
      <PrintSheet
        production={production}
        data={data}
        layout={layout}
        scale={chosen}
        bounds={bounds}
        keyEntries={keyEntries}
        title={{
          production: production.name,
          venue: production.venue,
          designer: designers.map((d) => d.name).join(", "),
          date: new Date().toISOString().slice(0, 10),
          // The latest issued revision; until one is issued the block shows a dash.
          revision: revision ? `${revision.label} (${revision.issuedAt.slice(0, 10)})` : null,
          scale: chosen.label,
          paper: `${PAPERS[paper].label}, ${ORIENTATIONS[orientation].toLowerCase()}`,
          datum: `${production.datumName} (y = 0); CL x = 0`,
        }}
      />
    </main>
  );
}

import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getCueSheet, getCuesByProduction } from "@/lib/data/cues";
import { requireProduction } from "@/lib/data/productions";
import { cueExportQuerySchema } from "@/lib/validation/cue";
import { writeUsittAscii } from "@/lib/cues/usitt-ascii-write";
import { cuesToCsv } from "@/lib/cues/table-export";
import { cuesToXlsx } from "@/lib/cues/xlsx-export";
import { compareCueNumbers } from "@/lib/cues";

type Ctx = { params: Promise<{ productionId: string }> };

const TYPES = { ascii: "text/plain; charset=us-ascii", csv: "text/csv; charset=utf-8", xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" };
const EXTENSIONS = { ascii: "asc", csv: "csv", xlsx: "xlsx" };

/** Everyone who can see the cues can take them away: USITT ASCII, CSV or Excel. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { format } = readQuery(req, cueExportQuerySchema);
  const production = await requireProduction(productionId);
  const [cues, sheet] = await Promise.all([getCuesByProduction({ productionId }), getCueSheet({ productionId })]);
  const levels = new Map(cues.map((c) => [c.id, c.levels]));
  // The sheet comes in running order; files list the cues by number, as the cue list does.
  const rows = sheet.rows.map((r) => ({ ...r, levels: levels.get(r.id) ?? {} })).sort((a, b) => compareCueNumbers(a.number, b.number));
  const body =
    format === "ascii"
      ? writeUsittAscii({ title: `${production.name} — ${production.venue}`, cues: rows })
      : format === "csv"
        ? "\uFEFF" + cuesToCsv(rows)
        : new Uint8Array(await cuesToXlsx({ title: production.name, rows }));
  const filename = `${production.name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "") || "cues"}-cues.${EXTENSIONS[format]}`;
  return new Response(body, { headers: { "content-type": TYPES[format], "content-disposition": `attachment; filename="${filename}"` } });
});

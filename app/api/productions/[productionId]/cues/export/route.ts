import { route, readQuery } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { getCueSheet, getCuesByProduction } from "@/lib/data/cues";
import { requireProduction } from "@/lib/data/productions";
import { cueExportQuerySchema } from "@/lib/validation/cue";
import { writeUsittAscii } from "@/lib/cues/usitt-ascii-write";
import { patchToCsv } from "@/lib/cues/usitt-ascii-patch";
import { getPatchByProduction } from "@/lib/data/cue-patch";
import { cuesToCsv } from "@/lib/cues/table-export";
import { cuesToXlsx } from "@/lib/cues/xlsx-export";
import { compareCueNumbers } from "@/lib/cues";

type Ctx = { params: Promise<{ productionId: string }> };

const TYPES = {
  ascii: "text/plain; charset=us-ascii",
  csv: "text/csv; charset=utf-8",
  xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
  patch: "text/csv; charset=utf-8",
};
const EXTENSIONS = { ascii: "asc", csv: "csv", xlsx: "xlsx", patch: "csv" };
const SUFFIX = { ascii: "cues", csv: "cues", xlsx: "cues", patch: "patch" };

/** Everyone who can see the cues can take them away: USITT ASCII (with the patch), CSV or Excel; or the patch as CSV. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId);
  const { format } = readQuery(req, cueExportQuerySchema);
  const production = await requireProduction(productionId);
  if (format === "patch") {
    const body = patchToCsv(await getPatchByProduction({ productionId }));
    return new Response(body, {
      headers: {
        "content-type": TYPES.patch,
        "content-disposition": `attachment; filename="${fileStem(production.name)}-patch.csv"`,
      },
    });
  }
  const [cues, sheet, patch] = await Promise.all([
    getCuesByProduction({ productionId }),
    getCueSheet({ productionId }),
    format === "ascii" ? getPatchByProduction({ productionId }) : [],
  ]);
  const levels = new Map(cues.map((c) => [c.id, c.levels]));
  // The sheet comes in running order; files list the cues by number, as the cue list does.
  const rows = sheet.rows
    .map((r) => ({ ...r, levels: levels.get(r.id) ?? {} }))
    .sort((a, b) => compareCueNumbers(a.number, b.number));
  const body =
    format === "ascii"
      ? writeUsittAscii({ title: `${production.name} — ${production.venue}`, cues: rows, patch })
      : format === "csv"
        ? "\uFEFF" + cuesToCsv(rows)
        : new Uint8Array(await cuesToXlsx({ title: production.name, rows }));
  const filename = `${fileStem(production.name)}-${SUFFIX[format]}.${EXTENSIONS[format]}`;
  return new Response(body, {
    headers: { "content-type": TYPES[format], "content-disposition": `attachment; filename="${filename}"` },
  });
});

function fileStem(name: string): string {
  return name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "") || "production";
}

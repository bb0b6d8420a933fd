import { z } from "zod";
import { readQuery, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { exportRig } from "@/lib/data/rig-export";

type Ctx = { params: Promise<{ productionId: string }> };

const querySchema = z.object({
  view: z
    .enum(["hang", "patch", "program", "focus", "all", "stock", "workbook"], {
      error: "view must be hang, patch, program, focus, all, stock or workbook",
    })
    .default("all"),
  format: z.enum(["csv", "xlsx"], { error: "format must be csv or xlsx" }).default("xlsx"),
  columns: z
    .string()
    .max(2000)
    .optional()
    .transform((s) => (s ? s.split(",").filter(Boolean) : undefined)),
});

/** Any view as CSV or .xlsx; "workbook" is every view on its own sheet (xlsx only). Everyone on the team may export. */
export const GET = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "rig.export");
  const q = readQuery(req, querySchema);
  const file = await exportRig({ productionId, ...q });
  return new Response(new Uint8Array(file.body), {
    headers: {
      "content-type": file.contentType,
      "content-disposition": `attachment; filename="${file.fileName}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      "cache-control": "no-store",
    },
  });
});

import Papa from "papaparse";
import { z } from "zod";
import { readJson, route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { runCoverageStudy } from "@/lib/data/studies";
import { coverageRequestSchema } from "@/lib/validation/studies";
import { areaTableColumns, areaTableRows } from "@/lib/studies/area-table";
import { areaTableXlsx } from "@/lib/studies/area-xlsx";
import { DIMMER_CURVE_WORDS } from "@/lib/optics";

type Ctx = { params: Promise<{ productionId: string }> };

const exportSchema = coverageRequestSchema.extend({
  format: z.enum(["csv", "xlsx"], { error: "Format must be csv or xlsx" }),
});

/** The acting-area table of a coverage study as CSV or Excel, computed afresh (the server's numbers). */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "studies.view");
  const { format, ...request } = await readJson(req, exportSchema);
  const r = await runCoverageStudy({ productionId, request });
  const plane =
    r.measure.kind === "face"
      ? `faces ${r.measure.planeHeight} m above the deck, facing ${r.measure.facingDeg}°`
      : r.measure.kind === "head"
        ? `head height, ${r.measure.planeHeight} m above the deck`
        : "the deck";
  const conditions = [
    `Light: ${r.stateLabel}`,
    `Measured on ${plane}; grid ${request.resolution} m`,
    ...r.curves.map((c) => `Dimmer curve ${DIMMER_CURVE_WORDS[c]}`),
    ...r.warnings,
  ];
  const name = `coverage-areas.${format}`;
  if (format === "csv") {
    const csv = Papa.unparse({
      fields: areaTableColumns(r.displayUnits),
      data: areaTableRows(r.areas, r.displayUnits),
    });
    return new Response(csv, {
      headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${name}"` },
    });
  }
  const buf = await areaTableXlsx({
    title: "Coverage of the acting areas",
    conditions,
    areas: r.areas,
    units: r.displayUnits,
  });
  return new Response(new Uint8Array(buf), {
    headers: {
      "content-type": "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
      "content-disposition": `attachment; filename="${name}"`,
    },
  });
});

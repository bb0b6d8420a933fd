// The acting-area table as rows for CSV and Excel, in the production's units. One home for the columns,
// so the screen's export and the file agree.
import { luxToFootcandles, type AreaCoverage } from "@/lib/optics";
import { neutralise } from "@/lib/cues/table-export";

const FLAG_WORDS: Record<AreaCoverage["flags"][number], string> = {
  uniformity: "uneven",
  brighter: "brighter than the others",
  dimmer: "dimmer than the others",
  "no-cells": "no grid cells inside",
};

export function flagWords(flags: AreaCoverage["flags"]): string {
  return flags.map((f) => FLAG_WORDS[f]).join("; ");
}

export function areaTableColumns(units: "metric" | "imperial"): string[] {
  const lx = ["Min (lx)", "Mean (lx)", "Max (lx)"];
  const fc = units === "imperial" ? ["Min (fc)", "Mean (fc)", "Max (fc)"] : [];
  return [
    "Area",
    ...lx,
    ...fc,
    "Uniformity Emin/Eavg",
    "Eavg:Emin",
    "Mean vs other areas",
    "Darkest spot x (m)",
    "Darkest spot y (m)",
    "Flags",
  ];
}

const round = (v: number | null, digits: number) =>
  v === null || !Number.isFinite(v) ? "" : Number(v.toFixed(digits));

export function areaTableRows(areas: AreaCoverage[], units: "metric" | "imperial"): Array<Array<string | number>> {
  return areas.map((a) => {
    const lux = [round(a.min, 1), round(a.mean, 1), round(a.max, 1)];
    const fc =
      units === "imperial" ? [a.min, a.mean, a.max].map((v) => round(v === null ? null : luxToFootcandles(v), 2)) : [];
    return [
      neutralise(a.name),
      ...lux,
      ...fc,
      round(a.uniformity, 3),
      round(a.averageToMinimum, 2),
      round(a.meanRatio, 2),
      round(a.minAt?.x ?? null, 2),
      round(a.minAt?.y ?? null, 2),
      flagWords(a.flags),
    ];
  });
}

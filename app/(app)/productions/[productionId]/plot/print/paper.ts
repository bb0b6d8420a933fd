// Paper sizes and drawing scales for the printed plot. ISO 216 sizes in millimetres; US sizes from
// inches (ANSI/ASME Y14.1). Imperial scales are architect's scales (1/4" = 1'-0" is 1:48).
export const PAPERS = {
  A4: { w: 297, h: 210, label: "A4" },
  A3: { w: 420, h: 297, label: "A3" },
  A2: { w: 594, h: 420, label: "A2" },
  letter: { w: 279.4, h: 215.9, label: "Letter" },
  tabloid: { w: 431.8, h: 279.4, label: "Tabloid (11 × 17 in)" },
} as const;
export type PaperName = keyof typeof PAPERS;

export const SCALES = {
  metric: [
    { ratio: 25, label: "1:25" },
    { ratio: 50, label: "1:50" },
    { ratio: 100, label: "1:100" },
    { ratio: 200, label: "1:200" },
  ],
  imperial: [
    { ratio: 24, label: `1/2" = 1'-0"` },
    { ratio: 48, label: `1/4" = 1'-0"` },
    { ratio: 96, label: `1/8" = 1'-0"` },
    { ratio: 192, label: `1/16" = 1'-0"` },
  ],
} as const;

export const MARGIN_MM = 10;
export const TITLE_MM = 28;

/** The drawing area of a landscape sheet, less margins and the title block strip. */
export function drawingArea(paper: PaperName) {
  const p = PAPERS[paper];
  return { w: p.w - 2 * MARGIN_MM, h: p.h - 2 * MARGIN_MM - TITLE_MM };
}

/** The largest standard scale at which a plan of w × h metres fits the sheet, or the smallest one. */
export function bestScale(units: "metric" | "imperial", paper: PaperName, w: number, h: number) {
  const area = drawingArea(paper);
  const list = SCALES[units];
  return list.find((s) => (w * 1000) / s.ratio <= area.w && (h * 1000) / s.ratio <= area.h) ?? list[list.length - 1];
}

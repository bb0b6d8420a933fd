// Paper sizes, drawing scales and the layout of one printed plot sheet, in millimetres. ISO 216 sizes;
// US sizes from inches (ANSI/ASME Y14.1). Imperial scales are architect's scales (1/4" = 1'-0" is 1:48).
import type { Box } from "@/lib/plot/label-placement";

export const PAPERS = {
  A4: { w: 297, h: 210, label: "A4" },
  A3: { w: 420, h: 297, label: "A3" },
  A2: { w: 594, h: 420, label: "A2" },
  letter: { w: 279.4, h: 215.9, label: "Letter" },
  tabloid: { w: 431.8, h: 279.4, label: "Tabloid (11 × 17 in)" },
} as const;
export type PaperName = keyof typeof PAPERS;

export const ORIENTATIONS = { landscape: "Landscape", portrait: "Portrait" } as const;
export type Orientation = keyof typeof ORIENTATIONS;

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
export type Scale = { ratio: number; label: string };

export const MARGIN_MM = 10;
/** Height of the title block strip along the foot of the sheet; a narrow sheet stacks it in two bands. */
export const TITLE_MM = 30;
export const TITLE_STACKED_MM = 44;
/** Below this width the title block's particulars go under its name instead of beside it. */
export const STACK_BELOW_MM = 300;
/** Gap between the drawing frame, the key and the title block. */
export const GUTTER_MM = 4;
/** Width of the key column on a landscape sheet; on a portrait sheet the key is a band above the title block. */
export const KEY_COLUMN_MM = 62;
export const KEY_ROW_MM = 7;
export const KEY_HEAD_MM = 8;

export function sheetSize(paper: PaperName, orientation: Orientation) {
  const p = PAPERS[paper];
  const long = Math.max(p.w, p.h);
  const short = Math.min(p.w, p.h);
  return orientation === "landscape" ? { w: long, h: short } : { w: short, h: long };
}

export type SheetLayout = { sheet: { w: number; h: number }; drawing: Box; key: Box; keyColumns: number; title: Box };

/**
 * Where the drawing, the symbol key and the title block sit. `keyRows` is the number of entries the key
 * lists (plus any note lines), so a portrait band is only as tall as it needs to be.
 */
export function sheetLayout(paper: PaperName, orientation: Orientation, keyRows: number): SheetLayout {
  const sheet = sheetSize(paper, orientation);
  const inner = { x: MARGIN_MM, y: MARGIN_MM, w: sheet.w - 2 * MARGIN_MM, h: sheet.h - 2 * MARGIN_MM };
  const titleH = inner.w < STACK_BELOW_MM ? TITLE_STACKED_MM : TITLE_MM;
  const title = { x: inner.x, y: inner.y + inner.h - titleH, w: inner.w, h: titleH };
  const above = inner.h - titleH - GUTTER_MM;
  if (orientation === "landscape") {
    const key = { x: inner.x + inner.w - KEY_COLUMN_MM, y: inner.y, w: KEY_COLUMN_MM, h: above };
    const drawing = { x: inner.x, y: inner.y, w: inner.w - KEY_COLUMN_MM - GUTTER_MM, h: above };
    return { sheet, drawing, key, keyColumns: 1, title };
  }
  const keyColumns = 2;
  const keyH = KEY_HEAD_MM + Math.max(1, Math.ceil(keyRows / keyColumns)) * KEY_ROW_MM + 2;
  const key = { x: inner.x, y: inner.y + above - keyH, w: inner.w, h: keyH };
  const drawing = { x: inner.x, y: inner.y, w: inner.w, h: above - keyH - GUTTER_MM };
  return { sheet, drawing, key, keyColumns, title };
}

/** The largest standard scale at which a plan of w × h metres fits the drawing frame, or the smallest one. */
export function bestScale(
  units: "metric" | "imperial",
  drawing: { w: number; h: number },
  w: number,
  h: number,
): Scale {
  const list = SCALES[units];
  return (
    list.find((s) => (w * 1000) / s.ratio <= drawing.w && (h * 1000) / s.ratio <= drawing.h) ?? list[list.length - 1]
  );
}

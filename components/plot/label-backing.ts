// A label drawn over pools sits on a small backing of the theme's surface colour, so it keeps its contrast
// however many translucent pools add up beneath it, in the light theme and the low-glare dark one.
import type { PlotPalette } from "./palette";

/** Share of the surface colour the backing is painted at: enough to hide the wash, still hinting at the plan. */
const BACKING_ALPHA = 0.88;
const PAD = 2; // px around the text

/**
 * fillText on a backing. Uses the context's current font, alignment, baseline and fill colour; the box comes
 * from the text's measured extent around its anchor, so every alignment and baseline is covered.
 */
export function fillTextOnBacking(
  ctx: CanvasRenderingContext2D,
  text: string,
  x: number,
  y: number,
  pal: Pick<PlotPalette, "surface">,
) {
  const m = ctx.measureText(text);
  const ink = ctx.fillStyle;
  const alpha = ctx.globalAlpha;
  ctx.fillStyle = pal.surface;
  ctx.globalAlpha = alpha * BACKING_ALPHA;
  ctx.fillRect(
    x - m.actualBoundingBoxLeft - PAD,
    y - m.actualBoundingBoxAscent - PAD,
    m.actualBoundingBoxLeft + m.actualBoundingBoxRight + 2 * PAD,
    m.actualBoundingBoxAscent + m.actualBoundingBoxDescent + 2 * PAD,
  );
  ctx.globalAlpha = alpha;
  ctx.fillStyle = ink;
  ctx.fillText(text, x, y);
}

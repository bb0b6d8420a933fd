import type { UnderlayPlacement } from "@/lib/plot/underlay";
import { planToScreen, type View } from "@/lib/plot/view";
import type { Ctx } from "./draw-stage";

/** Draws a calibrated groundplan image: its top-left pixel at the plan offset, scaled and rotated. */
export function drawUnderlay(
  ctx: Ctx,
  v: View,
  img: CanvasImageSource,
  u: UnderlayPlacement & { opacity: number },
  dark = false,
) {
  const o = planToScreen(v, { x: u.offsetX, y: u.offsetY });
  ctx.save();
  ctx.globalAlpha = u.opacity;
  if (dark) ctx.filter = "invert(0.9) sepia(0.25)"; // a white drawing would glare in the dark room
  ctx.translate(o.x, o.y);
  ctx.rotate((-u.rotationDeg * Math.PI) / 180); // counter-clockwise on the plan is clockwise in screen y-down terms
  const k = u.metresPerPixel * v.scale;
  ctx.scale(k, k);
  ctx.imageSmoothingEnabled = k < 1;
  ctx.drawImage(img, 0, 0);
  ctx.restore();
}

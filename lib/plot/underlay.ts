// A groundplan image on the plan: image pixels (u right, v down) map to plan metres by a scale,
// a rotation (counter-clockwise on the plan) and the plan point of the image's top-left corner.
import type { Point } from "@/lib/optics";

export type UnderlayPlacement = { metresPerPixel: number; offsetX: number; offsetY: number; rotationDeg: number };

export function imageToPlan(u: UnderlayPlacement, px: Point): Point {
  const r = (u.rotationDeg * Math.PI) / 180;
  const ex = px.x * u.metresPerPixel;
  const ey = -px.y * u.metresPerPixel; // image rows run down the screen, which is downstage
  return { x: u.offsetX + ex * Math.cos(r) - ey * Math.sin(r), y: u.offsetY + ex * Math.sin(r) + ey * Math.cos(r) };
}

export function planToImage(u: UnderlayPlacement, p: Point): Point {
  const r = (u.rotationDeg * Math.PI) / 180;
  const dx = p.x - u.offsetX;
  const dy = p.y - u.offsetY;
  const ex = dx * Math.cos(r) + dy * Math.sin(r);
  const ey = -dx * Math.sin(r) + dy * Math.cos(r);
  return { x: ex / u.metresPerPixel, y: -ey / u.metresPerPixel };
}

/**
 * Two-point calibration: the user clicks two points on the image (plan coordinates under the current
 * placement) and types the real distance between them. The image is rescaled about the first point, so
 * that point stays where it was.
 */
export function calibrate(u: UnderlayPlacement, a: Point, b: Point, realMetres: number): UnderlayPlacement {
  const shown = Math.hypot(b.x - a.x, b.y - a.y);
  if (!(realMetres > 0)) throw new RangeError("Type the real distance between the two points (more than zero).");
  if (shown < 1e-9) throw new RangeError("Pick two different points on the groundplan.");
  const k = realMetres / shown;
  const anchor = planToImage(u, a);
  const scaled = { ...u, metresPerPixel: u.metresPerPixel * k };
  const moved = imageToPlan(scaled, anchor);
  return { ...scaled, offsetX: scaled.offsetX + (a.x - moved.x), offsetY: scaled.offsetY + (a.y - moved.y) };
}

/** Moves the image so the image point now at `from` lands on `to` (e.g. the centre line × setting line on 0,0). */
export function alignPoint(u: UnderlayPlacement, from: Point, to: Point): UnderlayPlacement {
  return { ...u, offsetX: u.offsetX + (to.x - from.x), offsetY: u.offsetY + (to.y - from.y) };
}

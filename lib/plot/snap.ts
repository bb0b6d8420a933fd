// Grid snapping while drawing: a plan point moves to the nearest grid crossing of the step the screen
// shows (lib/plot/grid gridStep), so positions drawn by hand land on round distances from the datum.
import type { Point } from "@/lib/optics";

/** Nearest multiple of `step` on each axis (the datum, 0/0, is always on the grid). */
export function snapPoint(p: Point, step: number): Point {
  if (!(step > 0)) return p;
  // "+ 0" turns -0 into 0, so a point snapped onto the centre line reads as 0.
  const snap = (v: number) => Math.round(Math.round(v / step) * step * 1e6) / 1e6 + 0;
  return { x: snap(p.x), y: snap(p.y) };
}

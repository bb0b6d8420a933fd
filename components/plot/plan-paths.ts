// Path pieces shared by the plan's layers (stage, rig, the gesture overlay): each adds to the current
// path and leaves filling or stroking, colour and dashes to the caller.
import type { Point } from "@/lib/optics";
import { planToScreen, type View } from "@/lib/plot/view";

type Ctx = CanvasRenderingContext2D;

/** A polyline through plan points, closed into a polygon unless `close` is false. */
export function planPath(ctx: Ctx, v: View, pts: readonly Point[], close = true) {
  pts.forEach((p, i) => {
    const s = planToScreen(v, p);
    if (i === 0) ctx.moveTo(s.x, s.y);
    else ctx.lineTo(s.x, s.y);
  });
  if (close) ctx.closePath();
}

/** A straight stroke between two screen points, on a path of its own. */
export function strokeSegment(ctx: Ctx, a: Point, b: Point) {
  ctx.beginPath();
  ctx.moveTo(a.x, a.y);
  ctx.lineTo(b.x, b.y);
  ctx.stroke();
}

/** The focus point's diamond around screen point `s`, `r` pixels to each corner. */
export function diamondPath(ctx: Ctx, s: Point, r: number) {
  ctx.moveTo(s.x, s.y - r);
  ctx.lineTo(s.x + r, s.y);
  ctx.lineTo(s.x, s.y + r);
  ctx.lineTo(s.x - r, s.y);
  ctx.closePath();
}

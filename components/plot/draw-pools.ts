// Every unit's pool at once, faint, for the plot's pools layer. Drawn in two passes so the costly part
// can be drawn at a lower resolution: the washes (soft band and core; large translucent areas, most of
// the rasterising) and the 50 % edges and shutter cuts (thin lines that must stay sharp).
import type { Ellipse } from "@/lib/optics";
import type { Bounds, View } from "@/lib/plot/view";
import { addPoolPath, intersects, type RigItem } from "./draw-rig";
import { over, type PlotPalette } from "./palette";
import type { Ctx } from "./draw-stage";

function drawable(it: RigItem, visible: Bounds): it is RigItem & { pool: { outer: Ellipse } } {
  return it.pool?.status === "ok" && !!it.pool.outer && intersects(visible, it.pool.outer);
}

const cutsOf = (it: RigItem) => (it.cuts.length && it.mark ? it.cuts : null);

/**
 * The soft band as a ring (outer with the core cut out) and the core in the colour the two fills make
 * together: the same picture as filling the outer and then the core on top, with each pixel filled once.
 */
export function drawPoolWashes(ctx: Ctx, v: View, items: RigItem[], pal: PlotPalette, visible: Bounds) {
  const coreColour = over(pal.poolCore, pal.poolOuter);
  for (const it of items) {
    if (!drawable(it, visible)) continue;
    const cuts = cutsOf(it);
    const core = it.pool.core;
    ctx.fillStyle = pal.poolOuter;
    ctx.beginPath();
    addPoolPath(ctx, v, it.pool.outer, cuts, it.mark);
    if (core) addPoolPath(ctx, v, core, cuts, it.mark);
    ctx.fill("evenodd");
    if (core) {
      ctx.fillStyle = coreColour;
      ctx.beginPath();
      addPoolPath(ctx, v, core, cuts, it.mark);
      ctx.fill();
    }
  }
}

/**
 * The 50 % edges as one faint solid path, one stroke (dashing 1,500 ellipses costs ~20× as much to
 * draw; the selected units' edges are still dashed, in the selection's layer), and the shutter cut lines.
 */
export function drawPoolEdges(ctx: Ctx, v: View, items: RigItem[], pal: PlotPalette, visible: Bounds) {
  ctx.strokeStyle = pal.poolEdge;
  ctx.globalAlpha = 0.5;
  ctx.lineWidth = 0.75;
  ctx.beginPath();
  for (const it of items)
    if (drawable(it, visible) && it.pool.half) addPoolPath(ctx, v, it.pool.half, cutsOf(it), it.mark);
  ctx.stroke();
  ctx.globalAlpha = 1;
  ctx.strokeStyle = pal.danger;
  ctx.lineWidth = 1.25;
  ctx.beginPath();
  for (const it of items) {
    if (!drawable(it, visible) || !cutsOf(it)) continue;
    for (const c of it.cuts) {
      ctx.moveTo(v.ox + v.scale * c.a.x, v.oy - v.scale * c.a.y);
      ctx.lineTo(v.ox + v.scale * c.b.x, v.oy - v.scale * c.b.y);
    }
  }
  ctx.stroke();
}

// The top layer: what a gesture in progress looks like (box, rubber band, draft outline) and the scale bar.
import type { Point } from "@/lib/optics";
import { formatLength } from "@/lib/optics";
import { scaleBar } from "@/lib/plot/grid";
import { planToScreen, type View } from "@/lib/plot/view";
import type { PlotPalette } from "@/components/plot/palette";
import type { Ctx, Size } from "@/components/plot/draw-stage";
import { diamondPath, planPath, strokeSegment } from "@/components/plot/plan-paths";
import type { Gesture, Tool } from "./canvas-types";

export function drawOverlay(
  ctx: Ctx,
  v: View,
  size: Size,
  pal: PlotPalette,
  o: { gesture: Gesture | null; draft: Point[]; tool: Tool; units: "metric" | "imperial" },
) {
  const g = o.gesture;
  ctx.strokeStyle = pal.selection;
  ctx.fillStyle = pal.selection;
  ctx.lineWidth = 1.5;
  if (g?.kind === "box") {
    const a = planToScreen(v, g.from);
    const b = planToScreen(v, g.to);
    ctx.setLineDash([4, 3]);
    ctx.strokeRect(Math.min(a.x, b.x), Math.min(a.y, b.y), Math.abs(b.x - a.x), Math.abs(b.y - a.y));
    ctx.setLineDash([]);
  }
  if (g?.kind === "line") {
    const b = planToScreen(v, g.to);
    strokeSegment(ctx, planToScreen(v, g.from), b);
    const len = Math.hypot(g.to.x - g.from.x, g.to.y - g.from.y);
    ctx.font = "12px 'IBM Plex Sans', system-ui, sans-serif";
    ctx.textAlign = "left";
    ctx.textBaseline = "bottom";
    ctx.fillText(formatLength(len, o.units), b.x + 8, b.y - 6);
  }
  if (g?.kind === "focusPoint" || g?.kind === "underlay") {
    const b = planToScreen(v, g.to);
    if (g.kind === "underlay") {
      ctx.setLineDash([6, 4]);
      strokeSegment(ctx, planToScreen(v, g.from), b);
      ctx.setLineDash([]);
    }
    ctx.beginPath();
    diamondPath(ctx, b, 8);
    ctx.stroke();
  }
  if (g?.kind === "vertex") {
    // The edited shape as it will be, with the dragged point ringed.
    const pts = g.target.points.map((p, i) => (i === g.target.index ? g.to : p));
    ctx.setLineDash([5, 3]);
    ctx.beginPath();
    planPath(ctx, v, pts, g.target.kind === "area");
    ctx.stroke();
    ctx.setLineDash([]);
    const s = planToScreen(v, g.to);
    ctx.beginPath();
    ctx.arc(s.x, s.y, 5, 0, Math.PI * 2);
    ctx.stroke();
  }
  if (o.draft.length) {
    ctx.beginPath();
    planPath(ctx, v, o.draft, false);
    ctx.stroke();
    for (const p of o.draft) {
      const s = planToScreen(v, p);
      ctx.beginPath();
      ctx.arc(s.x, s.y, 4, 0, Math.PI * 2);
      ctx.fill();
    }
  }
  drawScaleBar(ctx, v, size, pal, o.units);
}

function drawScaleBar(ctx: Ctx, v: View, size: Size, pal: PlotPalette, units: "metric" | "imperial") {
  const bar = scaleBar(v.scale, units);
  const x = 16;
  const y = size.height - 18;
  ctx.fillStyle = pal.surface;
  ctx.globalAlpha = 0.85;
  ctx.fillRect(x - 8, y - 22, bar.px + 16, 32);
  ctx.globalAlpha = 1;
  ctx.fillStyle = pal.ink;
  ctx.fillRect(x, y, bar.px / 2, 4);
  ctx.strokeStyle = pal.ink;
  ctx.lineWidth = 1;
  ctx.strokeRect(x + 0.5, y + 0.5, bar.px, 4);
  ctx.font = "11px 'IBM Plex Sans', system-ui, sans-serif";
  ctx.textAlign = "left";
  ctx.textBaseline = "bottom";
  ctx.fillText(`0`, x, y - 3);
  ctx.textAlign = "right";
  ctx.fillText(bar.label, x + bar.px, y - 3);
}

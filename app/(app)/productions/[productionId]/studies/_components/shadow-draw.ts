// Drawing the shadow study: every lit unit's penumbra and umbra on the deck, the performers and panels.
import type { Ctx } from "@/components/plot/draw-stage";
import type { PlotPalette } from "@/components/plot/palette";
import { planPath } from "@/components/plot/plan-paths";
import { planToScreen, type View } from "@/lib/plot/view";
import type { OccluderShadows, PerformerMarkDto, ScenicPanelDto } from "@/lib/dto/studies";

export function drawShadows(
  ctx: Ctx,
  v: View,
  occluders: OccluderShadows[],
  pal: PlotPalette,
  selectedFixture: number | null,
) {
  ctx.save();
  for (const o of occluders) {
    for (const s of o.shadows) {
      const chosen = selectedFixture === s.fixtureId;
      if (s.penumbra.length) {
        ctx.beginPath();
        planPath(ctx, v, s.penumbra);
        ctx.fillStyle = chosen ? "rgba(40,90,200,0.28)" : pal.dark ? "rgba(0,0,0,0.22)" : "rgba(30,30,60,0.10)";
        ctx.fill();
      }
      if (s.umbra.length) {
        ctx.beginPath();
        planPath(ctx, v, s.umbra);
        ctx.fillStyle = chosen ? "rgba(20,50,160,0.55)" : pal.dark ? "rgba(0,0,0,0.4)" : "rgba(30,30,60,0.22)";
        ctx.fill();
      }
    }
  }
  ctx.restore();
}

export function drawOccluders(
  ctx: Ctx,
  v: View,
  performers: PerformerMarkDto[],
  panels: ScenicPanelDto[],
  pal: PlotPalette,
  active: number | null,
) {
  ctx.save();
  ctx.font = "12px 'IBM Plex Sans', system-ui, sans-serif";
  ctx.textAlign = "left";
  ctx.textBaseline = "middle";
  for (const p of panels) {
    const a = planToScreen(v, { x: p.x1, y: p.y1 });
    const b = planToScreen(v, { x: p.x2, y: p.y2 });
    ctx.strokeStyle = pal.ink;
    ctx.lineWidth = 4;
    ctx.beginPath();
    ctx.moveTo(a.x, a.y);
    ctx.lineTo(b.x, b.y);
    ctx.stroke();
    ctx.fillStyle = pal.ink;
    ctx.fillText(`${p.name} (${p.height} m)`, (a.x + b.x) / 2 + 6, (a.y + b.y) / 2 - 10);
  }
  for (const p of performers) {
    const s = planToScreen(v, p);
    const r = Math.max(4, (p.shoulderWidth / 2) * v.scale);
    ctx.beginPath();
    ctx.arc(s.x, s.y, r, 0, 2 * Math.PI);
    ctx.fillStyle = active === p.id ? pal.selection : pal.accent;
    ctx.fill();
    ctx.fillStyle = pal.ink;
    ctx.fillText(p.name, s.x + r + 4, s.y);
  }
  ctx.restore();
}

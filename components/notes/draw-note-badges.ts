// Open-note badges on the plot's unit symbols: a small disc with the count at the symbol's upper right,
// in the caution colour when one of the notes is high priority. Drawn on the plot's top layer, which is
// repainted every frame of a drag, so it only touches units that have notes (usually a handful).
import type { RigItem } from "@/components/plot/draw-rig";
import type { PlotPalette } from "@/components/plot/palette";
import { symbolPixels, symbolScreenPoint } from "@/lib/plot/symbol";
import type { View } from "@/lib/plot/view";
import { countFor, type NoteCounts } from "@/lib/notes/counts";

type Ctx = CanvasRenderingContext2D;

/** Draws the badges inside the visible area; returns how many were drawn (kept on the canvas for tests). */
export function drawNoteBadges(
  ctx: Ctx,
  v: View,
  items: RigItem[],
  counts: NoteCounts | undefined,
  pal: PlotPalette,
  visible: { width: number; height: number },
): number {
  if (!counts) return 0;
  const px = symbolPixels(v.scale);
  const r = Math.max(6, Math.min(10, px * 0.28));
  let drawn = 0;
  ctx.save();
  ctx.font = `700 ${Math.round(r * 1.2)}px 'IBM Plex Sans', system-ui, sans-serif`;
  ctx.textAlign = "center";
  ctx.textBaseline = "middle";
  for (const it of items) {
    const c = countFor(counts, "fixture", it.id);
    if (!c.open) continue;
    const s = symbolScreenPoint(v, it);
    const bx = s.x + px * 0.5;
    const by = s.y - px * 0.5;
    if (bx < -r || by < -r || bx > visible.width + r || by > visible.height + r) continue;
    ctx.beginPath();
    ctx.arc(bx, by, r, 0, Math.PI * 2);
    ctx.fillStyle = c.high ? pal.caution : pal.accent;
    ctx.fill();
    ctx.lineWidth = 1.5;
    ctx.strokeStyle = pal.surface;
    ctx.stroke();
    ctx.fillStyle = pal.surface;
    ctx.fillText(c.open > 9 ? "9+" : String(c.open), bx, by + 0.5);
    drawn++;
  }
  ctx.restore();
  return drawn;
}

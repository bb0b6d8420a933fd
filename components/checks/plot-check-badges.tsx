"use client";
// The checks' per-unit badges on the plot. The canvas gets a small triangle at each flagged symbol's upper
// left (the notes badge has the upper right); over it sit real links, one per flagged unit in view, named
// with what is wrong and opening its finding on the checks page, so a badge needs no hover and works from
// the keyboard and a screen reader. The links are moved by the plot's own redraw, not by React renders.
import Link from "next/link";
import { useEffect, useRef } from "react";
import type { RigItem } from "@/components/plot/draw-rig";
import type { PlotPalette } from "@/components/plot/palette";
import { symbolPixels, symbolScreenPoint } from "@/lib/plot/symbol";
import type { View } from "@/lib/plot/view";
import { unitFlagLabel, type UnitFlag } from "@/lib/checks/unit-flags";

type Flags = Record<number, UnitFlag> | undefined;

/** More links than this are not put in the page (the triangles are still drawn): the worst come first. */
export const MAX_PLOT_CHECK_LINKS = 150;

function badgeCentre(v: View, it: RigItem) {
  const px = symbolPixels(v.scale);
  const s = symbolScreenPoint(v, it);
  return { x: s.x - px * 0.5, y: s.y - px * 0.5, r: Math.max(7, Math.min(11, px * 0.3)) };
}

/** Draws the triangles inside the visible area; returns how many were drawn (kept on the canvas for tests). */
export function drawCheckBadges(
  ctx: CanvasRenderingContext2D,
  v: View,
  items: RigItem[],
  flags: Flags,
  pal: PlotPalette,
  visible: { width: number; height: number },
): number {
  if (!flags) return 0;
  let drawn = 0;
  ctx.save();
  for (const it of items) {
    const flag = flags[it.id];
    if (!flag) continue;
    const { x, y, r } = badgeCentre(v, it);
    if (x < -r || y < -r || x > visible.width + r || y > visible.height + r) continue;
    ctx.beginPath();
    ctx.moveTo(x, y - r);
    ctx.lineTo(x + r, y + r * 0.8);
    ctx.lineTo(x - r, y + r * 0.8);
    ctx.closePath();
    ctx.fillStyle = flag.severity === "error" ? pal.danger : flag.severity === "warning" ? pal.caution : pal.muted;
    ctx.fill();
    ctx.lineWidth = 1.5;
    ctx.strokeStyle = pal.surface;
    ctx.stroke();
    ctx.fillStyle = pal.surface;
    ctx.fillRect(x - 0.9, y - r * 0.35, 1.8, r * 0.6);
    ctx.fillRect(x - 0.9, y + r * 0.38, 1.8, 1.8);
    drawn++;
  }
  ctx.restore();
  return drawn;
}

/** Moves each link onto its unit's triangle and hides the ones out of view; called on every redraw. */
export function placeCheckLinks(
  layer: HTMLElement | null,
  v: View,
  items: RigItem[],
  visible: { width: number; height: number },
  shown: boolean,
) {
  if (!layer) return;
  const links = layer.children;
  if (!links.length) return;
  const byId = new Map(items.map((it) => [it.id, it]));
  for (const el of Array.from(links) as HTMLElement[]) {
    const it = byId.get(Number(el.dataset.fixtureId));
    const at = it ? badgeCentre(v, it) : null;
    const inView = shown && at && at.x >= 0 && at.y >= 0 && at.x <= visible.width && at.y <= visible.height;
    el.hidden = !inView;
    if (!inView || !at) continue;
    el.style.transform = `translate(${Math.round(at.x - at.r)}px, ${Math.round(at.y - at.r)}px)`;
    el.style.width = el.style.height = `${Math.round(at.r * 2)}px`;
  }
}

/** The links layer; `layerRef` is handed to placeCheckLinks by the canvas. */
export function PlotCheckLinks({
  productionId,
  flags,
  layerRef,
}: {
  productionId: number;
  flags: Flags;
  layerRef: React.RefObject<HTMLDivElement | null>;
}) {
  const own = useRef<HTMLDivElement | null>(null);
  // The plan's own press handling (pan, select) listens on the canvas around this layer: a press on a link
  // stays the link's.
  useEffect(() => {
    const el = own.current;
    if (!el) return;
    const stop = (e: Event) => e.stopPropagation();
    el.addEventListener("pointerdown", stop);
    el.addEventListener("dblclick", stop);
    return () => {
      el.removeEventListener("pointerdown", stop);
      el.removeEventListener("dblclick", stop);
    };
  }, []);
  const flagged = Object.entries(flags ?? {})
    .map(([id, flag]) => ({ id: Number(id), flag }))
    .sort((a, b) => rank(a.flag) - rank(b.flag))
    .slice(0, MAX_PLOT_CHECK_LINKS);
  return (
    <div
      ref={(el) => {
        own.current = el;
        layerRef.current = el;
      }}
      className="pointer-events-none absolute inset-0 overflow-hidden"
      data-testid="plot-check-links"
    >
      {flagged.map(({ id, flag }) => (
        <Link
          key={id}
          hidden
          href={`/productions/${productionId}/checks#${flag.findingKey}`}
          aria-label={unitFlagLabel(flag)}
          title={unitFlagLabel(flag)}
          data-fixture-id={id}
          data-severity={flag.severity}
          data-testid="plot-check-badge"
          className="pointer-events-auto absolute top-0 left-0 block rounded-full focus-visible:outline-2 focus-visible:outline-accent"
        />
      ))}
    </div>
  );
}

const rank = (f: UnitFlag) => (f.severity === "error" ? 0 : f.severity === "warning" ? 1 : 2);

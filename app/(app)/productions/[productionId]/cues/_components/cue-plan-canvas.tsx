"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { Layer, Stage } from "react-konva";
import type Konva from "konva";
import type { PlanePool, Point } from "@/lib/optics";
import { lookExposure } from "@/lib/cues/look-exposure";
import { PlanShape } from "@/components/plot/plan-shape";
import { readPalette, type PlotPalette } from "@/components/plot/palette";
import { drawStageOutline, type Ctx } from "@/components/plot/draw-stage";
import { drawPool } from "@/components/plot/draw-rig";
import { extendBounds, stageBounds, stageOutline, type StageSettings } from "@/lib/plot/stage-outline";
import { fitBounds, planToScreen, type View } from "@/lib/plot/view";
import { useViewNavigation } from "@/components/plot/use-view-navigation";

export type LookPool = {
  id: number;
  pool: PlanePool;
  mark: Point | null;
  cuts: Array<{ a: Point; b: Point }>;
  level: number;
  channel: number | null;
};

// The look is drawn as a darkened stage in either theme: light adds up on black, as it does in the room.
function stagePalette(base: PlotPalette): PlotPalette {
  return {
    ...base,
    dark: true,
    deck: "#16130f",
    canvas: "#0c0a08",
    muted: "#7d7469",
    ink: "#b9b0a4",
    surface: "#16130f",
  };
}

/** A pool's fill for a level: warm light whose strength follows the level (times the exposure); the core is brighter. */
function litPalette(p: PlotPalette, level: number, exposure: number): PlotPalette {
  // poolDim: the dark theme draws the look dimmer (app/globals.css --pool-dim), for a dark house.
  const a = (k: number) => Math.min(1, k * level * exposure * p.poolDim).toFixed(3);
  return {
    ...p,
    poolOuter: `rgba(255,170,90,${a(0.3)})`,
    poolCore: `rgba(255,200,130,${a(0.3)})`,
    poolEdge: `rgba(255,200,130,${a(0.25)})`,
  };
}

function darkPalette(p: PlotPalette): PlotPalette {
  return { ...p, poolOuter: "rgba(0,0,0,0)", poolCore: "rgba(0,0,0,0)", poolEdge: "rgba(150,140,128,0.55)" };
}

function drawLook(ctx: Ctx, v: View, pools: LookPool[], pal: PlotPalette, exposure: number) {
  const asItem = (p: LookPool) => ({ pool: p.pool, cuts: p.cuts, mark: p.mark });
  const dark = darkPalette(pal);
  for (const p of pools) if (p.level <= 0) drawPool(ctx, v, asItem(p), dark, true);
  // "lighter" adds each pool's light to what is under it, so overlaps read brighter, as on stage.
  ctx.save();
  ctx.globalCompositeOperation = "lighter";
  for (const p of pools) if (p.level > 0) drawPool(ctx, v, asItem(p), litPalette(pal, p.level, exposure));
  ctx.restore();
}

function drawLabels(ctx: Ctx, v: View, pools: LookPool[]) {
  ctx.font = "600 13px 'IBM Plex Sans', system-ui, sans-serif";
  ctx.textAlign = "center";
  ctx.textBaseline = "middle";
  ctx.lineJoin = "round";
  const placed: Array<{ x: number; y: number; w: number }> = [];
  // Brightest first, so when labels would overlap the lit channel keeps its label.
  for (const p of [...pools].sort((a, b) => b.level - a.level)) {
    if (p.channel == null || !p.pool.outer) continue;
    const at = planToScreen(v, p.pool.axisHit ?? p.pool.outer.centre);
    const text = p.level > 0 ? `${p.channel} · ${Math.round(p.level * 100)}` : String(p.channel);
    const w = ctx.measureText(text).width + 6;
    if (placed.some((q) => Math.abs(q.x - at.x) < (q.w + w) / 2 && Math.abs(q.y - at.y) < 16)) continue;
    placed.push({ x: at.x, y: at.y, w });
    ctx.lineWidth = 4;
    ctx.strokeStyle = "rgba(12,10,8,0.85)";
    ctx.strokeText(text, at.x, at.y);
    ctx.fillStyle = p.level > 0 ? "#fff3df" : "#8d857a";
    ctx.fillText(text, at.x, at.y);
  }
}

/** Read-only plan of the cue's look: stage outline, pools added up by level, channel labels. Drag pans, Ctrl+wheel or a pinch zooms, a double-click frames the stage again. */
export function CuePlanCanvas({ pools, stage }: { pools: LookPool[]; stage: StageSettings }) {
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(480);
  const [palette, setPalette] = useState<PlotPalette | null>(null);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const read = () => {
      setWidth(Math.max(200, el.clientWidth));
      setPalette(stagePalette(readPalette()));
    };
    read();
    const ro = new ResizeObserver(read);
    ro.observe(el);
    const mo = new MutationObserver(read); // the theme toggle changes <html class>
    mo.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    return () => (ro.disconnect(), mo.disconnect());
  }, []);

  const outline = useMemo(() => stageOutline(stage), [stage]);
  // Frame the stage and the pools' centres (not their full extent: a wide wash would shrink the stage).
  const bounds = useMemo(
    () =>
      extendBounds(
        stageBounds(stage),
        pools.map((p) => p.pool.outer!.centre),
      ),
    [stage, pools],
  );
  const height = Math.round(
    Math.min(560, Math.max(260, (width * (bounds.maxY - bounds.minY)) / (bounds.maxX - bounds.minX) + 40)),
  );
  const fitted = useMemo(() => fitBounds(bounds, { width, height }, 20), [bounds, width, height]);
  // The view moves with the hand (use-view-navigation). Stepping through cues keeps it; a new frame (the
  // plan resized, the stage changed) puts the framed stage back.
  const view = useRef<View>(fitted);
  const layer = useRef<Konva.Layer>(null);
  const frame = useRef(fitted);
  if (frame.current.scale !== fitted.scale || frame.current.ox !== fitted.ox || frame.current.oy !== fitted.oy) {
    frame.current = fitted; // set while rendering, so this render's drawing already uses it
    view.current = fitted;
  }
  // The plan sits in a scrolling page: a plain wheel scrolls the page, Ctrl/⌘ + wheel (or a trackpad pinch) zooms.
  useViewNavigation({ element: box, view, wheelNeedsModifier: true, onFrame: () => layer.current?.draw() });
  const lit = pools.filter((p) => p.level > 0).length;
  const exposure = useMemo(
    () =>
      lookExposure(
        pools.map((p) => ({ outer: p.pool.outer!, level: p.level })),
        bounds,
      ),
    [pools, bounds],
  );

  return (
    <div
      ref={box}
      className="relative w-full cursor-grab touch-none select-none overflow-hidden rounded-md"
      onDoubleClick={() => {
        view.current = frame.current;
        layer.current?.batchDraw();
      }}
      data-testid="cue-plan"
      data-lit={lit}
      data-exposure={exposure.toFixed(2)}
      aria-label={`Plan of the look: ${lit} of ${pools.length} pools lit`}
      role="img"
    >
      {palette ? (
        <Stage width={width} height={height} listening={false}>
          <Layer ref={layer} listening={false}>
            <PlanShape
              name="look"
              draw={(ctx) => {
                const v = view.current;
                ctx.fillStyle = palette.canvas;
                ctx.fillRect(0, 0, width, height);
                drawStageOutline(ctx, v, outline, palette, true);
                drawLook(ctx, v, pools, palette, exposure);
                drawLabels(ctx, v, pools);
              }}
            />
          </Layer>
        </Stage>
      ) : (
        <div style={{ height }} className="bg-black" />
      )}
      <p className="pointer-events-none absolute bottom-1 right-2 text-[11px] text-[#8d857a]">
        Drag to pan · Ctrl + wheel or pinch to zoom · double-click to frame
      </p>
    </div>
  );
}

"use client";

import type Konva from "konva";
import { forwardRef, useEffect, useImperativeHandle, useMemo, useRef, useState } from "react";
import { Layer, Stage } from "react-konva";
import { PlanShape } from "@/components/plot/plan-shape";
import { drawAreas, drawGrid, drawStageOutline, type Ctx } from "@/components/plot/draw-stage";
import { readPalette, type PlotPalette } from "@/components/plot/palette";
import { stageBounds, stageOutline, type StageSettings } from "@/lib/plot/stage-outline";
import { fitBounds, screenToPlan, type View } from "@/lib/plot/view";
import type { Point } from "@/lib/optics";

export type StudyDraw = (ctx: Ctx, v: View, pal: PlotPalette) => void;

export type StudyCanvasHandle = { toPng: () => string | null };

type Props = {
  stage: StageSettings;
  units: "metric" | "imperial";
  areas: Array<{ name: string; polygon: Point[] }>;
  /** Drawn over the deck, under the areas (the heat map). */
  under?: StudyDraw;
  /** Drawn over it (contours, units, shadows, marks). */
  over?: StudyDraw;
  height?: number;
  label: string;
  onPointerDown?: (p: Point, e: React.PointerEvent) => boolean | void;
  onPointerMove?: (p: Point, e: React.PointerEvent) => void;
  onPointerUp?: (p: Point, e: React.PointerEvent) => void;
};

/**
 * The stage seen from above, fitted to the container, with the plot's own stage outline and acting areas,
 * and two drawing hooks for a study. Pointer positions reach the study in plan metres. The canvas is
 * not interactive through Konva: picking is plan geometry, as on the plot.
 */
export const StudyCanvas = forwardRef<StudyCanvasHandle, Props>(function StudyCanvas(p, ref) {
  const box = useRef<HTMLDivElement>(null);
  const stageRef = useRef<Konva.Stage>(null);
  const [width, setWidth] = useState(800);
  const height = p.height ?? 520;
  const [pal, setPal] = useState<PlotPalette | null>(null);
  useEffect(() => {
    setPal(readPalette());
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(() => setWidth(Math.max(320, el.clientWidth)));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  useImperativeHandle(ref, () => ({ toPng: () => stageRef.current?.toDataURL({ pixelRatio: 2 }) ?? null }), []);
  const view = useMemo(() => fitBounds(stageBounds(p.stage), { width, height }), [p.stage, width, height]);
  const outline = useMemo(() => stageOutline(p.stage), [p.stage]);
  const plan = (e: React.PointerEvent) => {
    const r = box.current!.getBoundingClientRect();
    return screenToPlan(view, { x: e.clientX - r.left, y: e.clientY - r.top });
  };
  return (
    <div
      ref={box}
      className="relative w-full min-w-0 touch-none select-none overflow-hidden rounded-md border border-line"
      style={{ height }}
      aria-label={p.label}
      role="img"
      data-testid="study-canvas"
      onPointerDown={(e) => {
        if (p.onPointerDown?.(plan(e), e)) (e.target as Element).setPointerCapture?.(e.pointerId);
      }}
      onPointerMove={(e) => p.onPointerMove?.(plan(e), e)}
      onPointerUp={(e) => p.onPointerUp?.(plan(e), e)}
    >
      {/* Out of the flow, so the drawing never widens its box: the box sets the width, the drawing follows it
          (a drawing in the flow kept a grid column at its first width, and the page scrolled sideways at 800 px). */}
      {pal && (
        <div className="absolute inset-0">
          <Stage ref={stageRef} width={width} height={height} listening={false}>
            <Layer listening={false}>
              <PlanShape
                draw={(ctx) => {
                  const t0 = performance.now();
                  ctx.fillStyle = pal.canvas;
                  ctx.fillRect(0, 0, width, height);
                  drawGrid(ctx, view, { width, height }, p.units, pal);
                  drawStageOutline(ctx, view, outline, pal, true);
                  p.under?.(ctx, view, pal);
                  drawAreas(ctx, view, p.areas, pal, true);
                  p.over?.(ctx, view, pal);
                  // Read by the end-to-end test and the benchmark: the whole study drawn once, in ms.
                  box.current?.setAttribute("data-draw-ms", (performance.now() - t0).toFixed(1));
                }}
              />
            </Layer>
          </Stage>
        </div>
      )}
    </div>
  );
});

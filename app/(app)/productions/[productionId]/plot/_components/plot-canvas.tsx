"use client";

import { memo, useCallback, useEffect, useImperativeHandle, useMemo, useRef, useState } from "react";
import { Layer, Stage } from "react-konva";
import type Konva from "konva";
import { PlanShape } from "@/components/plot/plan-shape";
import { readPalette, type PlotPalette } from "@/components/plot/palette";
import { drawAreas, drawGrid, drawLandmarks, drawPositions, drawStageOutline, type Ctx } from "@/components/plot/draw-stage";
import { drawFixtures, drawFocusPoints, drawMarks, drawPool, drawPools } from "@/components/plot/draw-rig";
import { drawUnderlay } from "@/components/plot/draw-underlay";
import { drawOverlay } from "./draw-overlay";
import { stageBounds, stageOutline, extendBounds } from "@/lib/plot/stage-outline";
import { fitBounds, visiblePlanBounds, zoomAbout, type View } from "@/lib/plot/view";
import type { ProductionDto } from "@/lib/data/productions";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { PlotPayload } from "@/hooks/use-plot";
import { buildRigItems, toRigItem } from "./rig-items";
import { useCanvasGestures } from "./use-canvas-gestures";
import type { CanvasEvents, CanvasHandle, Gesture, LayerVisibility, Selection, Tool } from "./canvas-types";

export type PlotCanvasProps = {
  data: PlotPayload;
  production: ProductionDto;
  layers: LayerVisibility;
  selection: Selection;
  tool: Tool;
  canEdit: boolean;
  events: CanvasEvents;
  handleRef: React.RefObject<CanvasHandle | null>;
};

// Memoised: the side panel follows a drag once a frame through the editor's state; the canvas draws
// the drag itself from refs, so those re-renders must not reach it (and its 1,500-unit props).
export default memo(PlotCanvas);

function PlotCanvas(props: PlotCanvasProps) {
  const { data, production, layers, selection } = props;
  const container = useRef<HTMLDivElement>(null);
  const stage = useRef<Konva.Stage>(null);
  const overlayLayer = useRef<Konva.Layer>(null);
  const poolsLayer = useRef<Konva.Layer>(null);
  const rigLayer = useRef<Konva.Layer>(null);
  const [size, setSize] = useState({ width: 800, height: 600 });
  const [palette, setPalette] = useState<PlotPalette | null>(null);
  const view = useRef<View>({ scale: 40, ox: 400, oy: 400 });
  const gesture = useRef<Gesture | null>(null);
  const draft = useRef<Array<{ x: number; y: number }>>([]);
  const preview = useRef<PlotFixture | null>(null);
  const image = useRef<HTMLImageElement | null>(null);
  const fitted = useRef(false);

  const outline = useMemo(() => stageOutline(production), [production]);
  const items = useMemo(() => buildRigItems(data), [data]);
  const underlay = data.underlays[0] ?? null;

  // Everything the draw functions read, in one ref so they stay stable between renders.
  const live = useRef({ props, items, outline, palette, size, underlay });
  live.current = { props, items, outline, palette, size, underlay };

  /** Redraws now when called from a gesture's animation frame (no extra frame of lag), else on the next frame. */
  const redraw = useCallback((which: "all" | "overlay" = "all", now = false) => {
    const t0 = performance.now();
    const target = which === "overlay" ? overlayLayer.current : stage.current;
    if (now) target?.draw();
    else target?.batchDraw();
    // bench:plot reads the cost of each drawn frame from here (absent in normal use).
    const perf = (window as unknown as { __plotDrawMs?: number[] }).__plotDrawMs;
    if (now && perf) perf.push(performance.now() - t0);
    if (which === "overlay") return;
    // The current view, for tests and the benchmark to turn plan metres into screen points.
    if (container.current) container.current.dataset.view = JSON.stringify(view.current);
  }, []);

  // A released drag keeps its preview until the server's row arrives (then the server's numbers show).
  useEffect(() => {
    const p = preview.current;
    if (p && !gesture.current) {
      const server = data.fixtures.find((f) => f.id === p.id);
      if (!server || server.version !== p.version) {
        preview.current = null;
        props.events.preview(null); // the panel goes back to the server's numbers too
      }
    }
    redraw();
  }, [data, layers, selection, palette, size, props.tool, redraw]);

  useEffect(() => {
    const el = container.current!;
    const ro = new ResizeObserver(([e]) => setSize({ width: Math.max(50, Math.floor(e.contentRect.width)), height: Math.max(50, Math.floor(e.contentRect.height)) }));
    ro.observe(el);
    setPalette(readPalette());
    const mo = new MutationObserver(() => setPalette(readPalette()));
    mo.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    return () => {
      ro.disconnect();
      mo.disconnect();
    };
  }, []);

  useEffect(() => {
    if (!underlay) {
      image.current = null;
      return;
    }
    const img = new Image();
    img.onload = () => {
      image.current = img;
      redraw();
    };
    img.src = underlay.url;
  }, [underlay?.url, underlay, redraw]);

  const fit = useCallback(() => {
    const { size: sz, props: p } = live.current;
    const pts = p.data.positions.flatMap((q) => [{ x: q.x1, y: q.y1 }, ...(q.x2 != null && q.y2 != null ? [{ x: q.x2, y: q.y2 }] : [])]);
    view.current = fitBounds(extendBounds(stageBounds(p.production), pts), sz, 32);
    redraw();
  }, [redraw]);

  useEffect(() => {
    if (!fitted.current && size.width > 100) {
      fitted.current = true;
      fit();
    }
  }, [size, fit]);

  useImperativeHandle(props.handleRef, () => ({
    fit,
    zoom: (factor: number) => {
      const { size: sz } = live.current;
      view.current = zoomAbout(view.current, { x: sz.width / 2, y: sz.height / 2 }, factor);
      redraw();
    },
    toDataURL: () => stage.current?.toDataURL({ pixelRatio: 2 }) ?? "",
    view: () => view.current,
  }), [fit, redraw]);

  useCanvasGestures({ container, view, gesture, draft, preview, live, redraw });

  const drawUnderlayLayer = useCallback((ctx: Ctx) => {
    const { props: p, underlay: u, palette: pal, size: sz } = live.current;
    if (!pal) return;
    ctx.fillStyle = pal.canvas;
    ctx.fillRect(0, 0, sz.width, sz.height);
    if (p.layers.underlay && u && image.current) drawUnderlay(ctx, view.current, image.current, u, pal.dark);
  }, []);

  const drawBase = useCallback((ctx: Ctx) => {
    const { props: p, palette: pal, outline: o, size: sz } = live.current;
    if (!pal) return;
    const v = view.current;
    drawGrid(ctx, v, sz, p.production.displayUnits, pal);
    drawStageOutline(ctx, v, o, pal, p.layers.labels);
    if (p.layers.areas) drawAreas(ctx, v, p.data.areaZones, pal, p.layers.labels);
    if (p.layers.landmarks) drawLandmarks(ctx, v, p.data.landmarks, pal, p.layers.labels);
    if (p.layers.positions) drawPositions(ctx, v, p.data.positions, pal, p.layers.labels, new Set(p.selection.positionId ? [p.selection.positionId] : []));
  }, []);

  const drawPoolLayer = useCallback((ctx: Ctx) => {
    const { props: p, palette: pal, items: its, size: sz } = live.current;
    if (!pal || !p.layers.pools) return;
    const skip = new Set(preview.current ? [preview.current.id] : []);
    drawPools(ctx, view.current, its, pal, visiblePlanBounds(view.current, sz), skip);
    // The selection's pools are drawn again with their edges, so the one being worked on stands out.
    for (const it of its) if (p.selection.fixtures.has(it.id) && !skip.has(it.id)) drawPool(ctx, view.current, it, pal, true);
  }, []);

  const drawRig = useCallback((ctx: Ctx) => {
    const { props: p, palette: pal, items: its, size: sz } = live.current;
    if (!pal) return;
    const v = view.current;
    const shown = preview.current ? its.filter((i) => i.id !== preview.current!.id) : its;
    if (p.layers.marks) {
      drawMarks(ctx, v, shown, pal, p.selection.fixtures);
      drawFocusPoints(ctx, v, p.data.focusPoints, pal, p.layers.labels, p.selection.focusPointId);
    }
    if (p.layers.fixtures) drawFixtures(ctx, v, shown, pal, { labels: p.layers.labels, selected: p.selection.fixtures, visible: sz });
  }, []);

  const drawOver = useCallback((ctx: Ctx) => {
    const { props: p, palette: pal, size: sz, items: its } = live.current;
    if (!pal) return;
    const v = view.current;
    const pv = preview.current;
    if (pv) {
      const stackIndex = its.find((i) => i.id === pv.id)?.stack.index ?? 0;
      const item = toRigItem(pv, stackIndex);
      if (p.layers.pools) drawPool(ctx, v, item, pal, true);
      drawMarks(ctx, v, [item], pal, new Set([pv.id]));
      drawFixtures(ctx, v, [item], pal, { labels: p.layers.labels, selected: new Set([pv.id]), visible: sz });
    }
    drawOverlay(ctx, v, sz, pal, { gesture: gesture.current, draft: draft.current, tool: p.tool, units: p.production.displayUnits });
  }, []);

  return (
    <div ref={container} data-testid="plot-canvas" tabIndex={0} className="relative h-full w-full touch-none select-none overflow-hidden outline-none" aria-label="Plot: plan view of the stage">
      <Stage ref={stage} width={size.width} height={size.height} listening={false}>
        <Layer listening={false}>
          <PlanShape draw={drawUnderlayLayer} />
        </Layer>
        <Layer listening={false}>
          <PlanShape draw={drawBase} />
        </Layer>
        <Layer ref={poolsLayer} listening={false}>
          <PlanShape draw={drawPoolLayer} />
        </Layer>
        <Layer ref={rigLayer} listening={false}>
          <PlanShape draw={drawRig} />
        </Layer>
        <Layer ref={overlayLayer} listening={false}>
          <PlanShape draw={drawOver} />
        </Layer>
      </Stage>
    </div>
  );
}

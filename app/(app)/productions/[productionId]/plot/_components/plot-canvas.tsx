"use client";

import { memo, useCallback, useEffect, useImperativeHandle, useLayoutEffect, useMemo, useRef, useState } from "react";
import { Layer, Stage } from "react-konva";
import type Konva from "konva";
import { PlanShape } from "@/components/plot/plan-shape";
import { readPalette, type PlotPalette } from "@/components/plot/palette";
import {
  drawAreas,
  drawGrid,
  drawLandmarks,
  drawPositions,
  drawStageOutline,
  type Ctx,
} from "@/components/plot/draw-stage";
import { drawFixtures, drawFocusPoints, drawMarks, drawPool } from "@/components/plot/draw-rig";
import { drawPoolEdges, drawPoolWashes } from "@/components/plot/draw-pools";
import { drawUnderlay } from "@/components/plot/draw-underlay";
import { LayerSnapshot } from "@/components/plot/snapshot";
import { drawOverlay } from "./draw-overlay";
import { drawNoteBadges } from "@/components/notes/draw-note-badges";
import { drawCheckBadges, placeCheckLinks, PlotCheckLinks } from "@/components/checks/plot-check-badges";
import { useUnitChecks } from "@/components/checks/use-unit-checks";
import { stageBounds, stageOutline, extendBounds } from "@/lib/plot/stage-outline";
import { fitBounds, visiblePlanBounds, zoomAbout, type View } from "@/lib/plot/view";
import { useViewNavigation } from "@/components/plot/use-view-navigation";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import { buildRigItems, toRigItem } from "./rig-items";
import { useCanvasGestures } from "./use-canvas-gestures";
import { PLOT_CANVAS_DESCRIPTION_ID, type Gesture } from "./canvas-types";
import type { PlotCanvasProps } from "./plot-canvas-props";

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
  const [size, setSize] = useState({ width: 0, height: 0 }); // measured before the first paint
  const [palette, setPalette] = useState<PlotPalette | null>(null);
  const view = useRef<View>({ scale: 40, ox: 400, oy: 400 });
  const gesture = useRef<Gesture | null>(null);
  const draft = useRef<Array<{ x: number; y: number }>>([]);
  const preview = useRef<PlotFixture | null>(null);
  const image = useRef<HTMLImageElement | null>(null);
  const fitted = useRef(false);
  const drawnOnce = useRef(false);
  // Bitmaps of the costly layers, reused while the view moves (components/plot/snapshot.ts).
  const snaps = useRef({
    washes: new LayerSnapshot(0.5),
    edges: new LayerSnapshot(),
    rig: new LayerSnapshot(),
    chosen: new LayerSnapshot(),
  });
  /** True while the PNG export draws at its own pixel ratio: every layer is drawn directly. */
  const exporting = useRef(false);

  const outline = useMemo(() => stageOutline(production), [production]);
  const items = useMemo(() => buildRigItems(data), [data]);
  const underlay = data.underlays[0] ?? null;
  // What the checks flag on each unit: a badge on its symbol and a link over it (components/checks).
  const checkFlags = useUnitChecks(production.id).data?.units;
  const flags = useRef(checkFlags);
  flags.current = checkFlags;
  const checkLinks = useRef<HTMLDivElement | null>(null);

  // Everything the draw functions read, in one ref so they stay stable between renders.
  const live = useRef({ props, items, outline, palette, size, underlay });
  live.current = { props, items, outline, palette, size, underlay };

  /** Redraws now when called from a gesture's animation frame (no extra frame of lag), else on the next frame. */
  const redraw = useCallback((which: "all" | "overlay" = "all", now = false) => {
    const t0 = performance.now();
    const target = which === "overlay" ? overlayLayer.current : stage.current;
    if (now) target?.draw();
    else target?.batchDraw();
    // bench:plot reads the cost of each drawn frame from here (absent in normal use). Reading a pixel
    // back makes the browser rasterise now, so the figure is the whole cost, not just the script's.
    const perf = (window as unknown as { __plotDrawMs?: number[] }).__plotDrawMs;
    if (now && perf) {
      for (const l of which === "overlay" ? [overlayLayer.current] : (stage.current?.getLayers() ?? []))
        l?.getContext()._context.getImageData(0, 0, 1, 1);
      perf.push(performance.now() - t0);
    }
    if (which === "overlay") return;
    // The current view, for tests and the benchmark to turn plan metres into screen points.
    if (container.current) container.current.dataset.view = JSON.stringify(view.current);
  }, []);

  // A released drag keeps its preview until the server's row arrives (then the server's numbers show).
  // biome-ignore lint/correctness/useExhaustiveDependencies: the listed props are what the picture shows; any change redraws it (the draw functions read them from `live`)
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
  }, [data, layers, selection, palette, size, props.tool, props.noteCounts, checkFlags, redraw]);

  useLayoutEffect(() => {
    // Size, colours and the fitted view before anything is drawn: Konva draws every layer as soon as the
    // stage gets its size, and a first picture at any other view would be drawn (at full cost) for nothing.
    const r = container.current!.getBoundingClientRect();
    const sz = { width: Math.max(50, Math.floor(r.width)), height: Math.max(50, Math.floor(r.height)) };
    view.current = fittedView(live.current.props, sz);
    fitted.current = true;
    setSize(sz);
    setPalette(readPalette());
  }, []);

  useEffect(() => {
    const el = container.current!;
    const ro = new ResizeObserver(([e]) =>
      setSize({
        width: Math.max(50, Math.floor(e.contentRect.width)),
        height: Math.max(50, Math.floor(e.contentRect.height)),
      }),
    );
    ro.observe(el);
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
    view.current = fittedView(live.current.props, live.current.size);
    redraw();
  }, [redraw]);

  useImperativeHandle(
    props.handleRef,
    () => ({
      fit,
      zoom: (factor: number) => {
        const { size: sz } = live.current;
        view.current = zoomAbout(view.current, { x: sz.width / 2, y: sz.height / 2 }, factor);
        redraw();
      },
      toDataURL: () => {
        exporting.current = true;
        try {
          return stage.current?.toDataURL({ pixelRatio: 2 }) ?? "";
        } finally {
          exporting.current = false;
        }
      },
      view: () => view.current,
    }),
    [fit, redraw],
  );

  const press = useCanvasGestures({ container, view, gesture, draft, preview, live, redraw });
  /** `moving` is true while a pan, pinch or wheel zoom is under way: the snapshots are moved, not redrawn. */
  const { moving } = useViewNavigation({
    element: container,
    view,
    press,
    spacePans: true,
    onFrame: () => redraw("all", true),
    onRest: () => redraw("all"),
  });

  /** Draws a costly layer through its snapshot (or directly for the PNG export) and notes fresh drawings for the bench. */
  // biome-ignore lint/correctness/useExhaustiveDependencies: reads refs only (`live`, `snaps`, `view`, `moving`, `exporting`), so it never needs remaking
  const throughSnapshot = useCallback(
    (
      ctx: Ctx,
      which: keyof typeof snaps.current,
      stamp: unknown[],
      paint: (g: Ctx, v: View, s: { width: number; height: number }) => void,
    ) => {
      const sz = live.current.size;
      if (exporting.current) return paint(ctx, view.current, sz);
      const snap = snaps.current[which];
      if (snap.draw(ctx, view.current, sz, stamp, paint, moving.current) === "fresh") {
        (window as unknown as { __plotFreshMs?: number[] }).__plotFreshMs?.push(snap.lastFreshMs);
      }
    },
    [],
  );

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
    const handles = p.canEdit && p.tool === "select";
    if (p.layers.areas) drawAreas(ctx, v, p.data.areaZones, pal, p.layers.labels, handles);
    if (p.layers.landmarks) drawLandmarks(ctx, v, p.data.landmarks, pal, p.layers.labels, handles);
    if (p.layers.positions)
      drawPositions(
        ctx,
        v,
        p.data.positions,
        pal,
        p.layers.labels,
        new Set(p.selection.positionId ? [p.selection.positionId] : []),
      );
  }, []);

  // Every pool, faint. A unit whose mark is being dragged keeps its saved pool here (the live one is
  // drawn strongly on top), so starting a drag does not redraw 1,500 pools.
  const drawPoolLayer = useCallback(
    (ctx: Ctx) => {
      const { props: p, palette: pal, items: its } = live.current;
      if (!pal || !p.layers.pools) return;
      throughSnapshot(ctx, "washes", [its, pal], (g, v, s) => drawPoolWashes(g, v, its, pal, visiblePlanBounds(v, s)));
      throughSnapshot(ctx, "edges", [its, pal], (g, v, s) => drawPoolEdges(g, v, its, pal, visiblePlanBounds(v, s)));
    },
    [throughSnapshot],
  );

  const drawRig = useCallback(
    (ctx: Ctx) => {
      const { props: p, palette: pal, items: its } = live.current;
      if (!pal) return;
      const skip = preview.current?.id ?? null;
      throughSnapshot(ctx, "rig", [its, pal, p.layers, p.selection, p.data.focusPoints, skip], (g, v, s) => {
        const shown = skip != null ? its.filter((i) => i.id !== skip) : its;
        if (p.layers.marks) {
          drawMarks(g, v, shown, pal, p.selection.fixtures);
          drawFocusPoints(g, v, p.data.focusPoints, pal, p.layers.labels, p.selection.focusPointId);
        }
        if (p.layers.fixtures)
          drawFixtures(g, v, shown, pal, { labels: p.layers.labels, selected: p.selection.fixtures, visible: s });
      });
      if (!drawnOnce.current && fitted.current) {
        // The first complete picture (palette read, view fitted): bench:plot and the e2e tests wait for it.
        drawnOnce.current = true;
        performance.mark("plot:first-draw");
        requestAnimationFrame(() => {
          performance.mark("plot:first-paint");
          if (container.current) container.current.dataset.drawn = "yes";
        });
      }
    },
    [throughSnapshot],
  );

  const drawOver = useCallback(
    (ctx: Ctx) => {
      const { props: p, palette: pal, size: sz, items: its } = live.current;
      if (!pal) return;
      const v = view.current;
      const pv = preview.current;
      // The selection's pools again, with their edges, so the ones being worked on stand out.
      if (p.layers.pools && p.selection.fixtures.size) {
        throughSnapshot(ctx, "chosen", [its, pal, p.selection, pv?.id ?? null], (g, gv) => {
          for (const it of its) if (p.selection.fixtures.has(it.id) && it.id !== pv?.id) drawPool(g, gv, it, pal, true);
        });
      }
      if (pv) {
        const stackIndex = its.find((i) => i.id === pv.id)?.stack.index ?? 0;
        const item = toRigItem(pv, stackIndex);
        if (p.layers.pools) drawPool(ctx, v, item, pal, true);
        drawMarks(ctx, v, [item], pal, new Set([pv.id]));
        drawFixtures(ctx, v, [item], pal, { labels: p.layers.labels, selected: new Set([pv.id]), visible: sz });
      }
      const badges = p.layers.fixtures ? drawNoteBadges(ctx, v, its, p.noteCounts, pal, sz) : 0;
      if (container.current) container.current.dataset.noteBadges = String(badges);
      const checked = p.layers.fixtures ? drawCheckBadges(ctx, v, its, flags.current, pal, sz) : 0;
      if (container.current) container.current.dataset.checkBadges = String(checked);
      placeCheckLinks(checkLinks.current, v, its, sz, p.layers.fixtures);
      drawOverlay(ctx, v, sz, pal, {
        gesture: gesture.current,
        draft: draft.current,
        tool: p.tool,
        units: p.production.displayUnits,
      });
    },
    [throughSnapshot],
  );

  return (
    // biome-ignore lint/a11y/noNoninteractiveTabindex: the plan is the editor's surface and takes the keyboard (arrows nudge, Delete, Space pans)
    <div
      ref={container}
      data-testid="plot-canvas"
      role="application"
      tabIndex={0}
      className="relative h-full w-full touch-none select-none overflow-hidden outline-none"
      aria-label="Plot: plan view of the stage"
      aria-describedby={PLOT_CANVAS_DESCRIPTION_ID}
    >
      <Stage ref={stage} width={size.width} height={size.height} listening={false}>
        {/* Underlay and plan share a layer: both are cheap, and every layer is a canvas to allocate and composite. */}
        <Layer listening={false}>
          <PlanShape draw={drawUnderlayLayer} />
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
      <PlotCheckLinks productionId={production.id} flags={checkFlags} layerRef={checkLinks} />
    </div>
  );
}

/** The view that shows the whole stage and every position. */
function fittedView(p: Pick<PlotCanvasProps, "data" | "production">, size: { width: number; height: number }): View {
  const pts = p.data.positions.flatMap((q) => [
    { x: q.x1, y: q.y1 },
    ...(q.x2 != null && q.y2 != null ? [{ x: q.x2, y: q.y2 }] : []),
  ]);
  return fitBounds(extendBounds(stageBounds(p.production), pts), size, 32);
}

"use client";

import dynamic from "next/dynamic";
import { useCallback, useEffect, useRef, useState } from "react";
import { usePlot, type PlotWirePayload } from "@/hooks/use-plot";
import { useNoteCounts } from "@/hooks/use-note-counts";
import { SpotTool } from "@/components/notes/spot-tool";
import type { ProductionDto } from "@/lib/dto/production";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { NumberingDirection } from "@/lib/plot/along-position";
import { screenToPlan } from "@/lib/plot/view";
import {
  EMPTY_SELECTION,
  LAYERS,
  type CanvasHandle,
  type LayerVisibility,
  type Selection,
  type Tool,
} from "./canvas-types";
import { useCommands } from "./use-commands";
import { useCanvasEvents, type Draft } from "./use-plot-events";
import { placeFixture } from "./plot-commands";
import { usePlotKeys } from "./use-plot-keys";
import { Toolbar } from "./toolbar";
import { TypeShelf } from "./type-shelf";
import { SidePanel } from "./side-panel";
import { GoToUnit } from "./go-to-unit";
import { PLOT_CANVAS_DESCRIPTION_ID } from "./canvas-types";

// Konva needs the browser's canvas: load the canvas only on the client. Its code is requested as soon
// as this module runs in the browser, not after hydration reaches the canvas (one round trip less).
const loadCanvas = () => import("./plot-canvas");
if (typeof window !== "undefined") void loadCanvas();
const PlotCanvas = dynamic(loadCanvas, {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-muted">Drawing the plot…</p>,
});

const ALL_ON = Object.fromEntries(LAYERS.map((l) => [l, true])) as LayerVisibility;

export function PlotEditor({
  production,
  initial,
  canEdit,
}: {
  production: ProductionDto;
  initial: PlotWirePayload;
  canEdit: boolean;
}) {
  const [dragging, setDragging] = useState(false);
  const data = usePlot(production.id, initial, production.headHeight, { paused: dragging });
  const cmd = useCommands(production.id);
  const noteCounts = useNoteCounts(production.id).data;
  const [tool, setTool] = useState<Tool>("select");
  const [layers, setLayers] = useState<LayerVisibility>(ALL_ON);
  const [selection, setSelection] = useState<Selection>(EMPTY_SELECTION);
  const [draft, setDraft] = useState<Draft>(null);
  const [preview, setPreviewState] = useState<PlotFixture | null>(null);
  const [armedTypeId, setArmedTypeId] = useState<number | null>(null);
  const [direction, setDirection] = useState<NumberingDirection>(production.numberingRule);
  const handle = useRef<CanvasHandle | null>(null);
  const canvasBox = useRef<HTMLDivElement>(null);

  // The panel follows a drag at most once a frame.
  const pending = useRef<{ f: PlotFixture | null; frame: number }>({ f: null, frame: 0 });
  const setPreview = useCallback((f: PlotFixture | null) => {
    pending.current.f = f;
    setDragging(f !== null);
    if (pending.current.frame) return;
    pending.current.frame = requestAnimationFrame(() => {
      pending.current.frame = 0;
      setPreviewState(pending.current.f);
    });
  }, []);

  const chooseTool = useCallback((t: Tool) => {
    setTool(t);
    if (t !== "place") setArmedTypeId(null);
  }, []);
  const events = useCanvasEvents({
    cmd,
    selection,
    setSelection,
    setDraft,
    setTool: chooseTool,
    setPreview,
    armedTypeId,
    direction,
  });
  usePlotKeys({
    cmd,
    canEdit,
    selection,
    setSelection,
    handle,
    setTool: chooseTool,
    headHeight: production.headHeight,
  });

  useEffect(() => {
    if (!canEdit && tool !== "select") setTool("select");
  }, [canEdit, tool]);

  function onDrop(e: React.DragEvent) {
    e.preventDefault();
    const typeId = Number(e.dataTransfer.getData("text/x-throwline-type"));
    const view = handle.current?.view();
    if (!canEdit || !typeId || !view || !canvasBox.current) return;
    const r = canvasBox.current.getBoundingClientRect();
    void placeFixture(
      cmd,
      typeId,
      screenToPlan(view, { x: e.clientX - r.left, y: e.clientY - r.top }),
      direction,
      30 / view.scale,
    );
  }

  return (
    <div
      className="flex h-[calc(100dvh-8.25rem)] min-h-[520px] flex-col"
      data-testid="plot-editor"
      data-can-edit={canEdit ? "yes" : "no"}
    >
      <Toolbar
        canEdit={canEdit}
        tool={tool}
        setTool={chooseTool}
        layers={layers}
        setLayers={setLayers}
        handle={handle}
        undoLabel={cmd.undoLabel}
        onUndo={() => void cmd.undoLast()}
        busy={cmd.busy}
        productionId={production.id}
        productionName={production.name}
      />
      {cmd.notice ? (
        <div
          role={cmd.notice.tone === "info" ? "status" : "alert"}
          data-testid="plot-notice"
          className={`flex items-center gap-3 border-b border-line px-3 py-2 text-sm ${cmd.notice.tone === "info" ? "bg-raised" : "bg-surface text-danger"}`}
        >
          <span className="flex-1">{cmd.notice.text}</span>
          {cmd.notice.retry ? (
            <button
              type="button"
              className="rounded border border-line px-2 py-1 text-ink"
              onClick={() => cmd.notice?.retry?.()}
            >
              Apply mine again
            </button>
          ) : null}
          <button
            type="button"
            className="text-muted hover:text-ink"
            onClick={() => cmd.setNotice(null)}
            aria-label="Dismiss the message"
          >
            ✕
          </button>
        </div>
      ) : null}
      {/* Below 1280 px (a tablet) the canvas takes the full width on top and the lists sit under it;
          side by side they left the canvas a sliver at 800 px. */}
      <div className="flex min-h-0 flex-1 flex-wrap xl:flex-nowrap">
        {canEdit ? (
          <TypeShelf
            types={data.fixtureTypes}
            armedTypeId={armedTypeId}
            arm={(id) => {
              setArmedTypeId(id);
              setTool(id ? "place" : "select");
            }}
            direction={direction}
            setDirection={setDirection}
          />
        ) : null}
        <GoToUnit
          fixtures={data.fixtures}
          productionId={production.id}
          selection={selection}
          setSelection={setSelection}
          focusCanvas={() => canvasBox.current?.querySelector<HTMLElement>("[data-testid=plot-canvas]")?.focus()}
          descriptionId={PLOT_CANVAS_DESCRIPTION_ID}
        />
        <div
          ref={canvasBox}
          className="relative min-w-0 flex-1 max-xl:order-first max-xl:h-[60%] max-xl:basis-full"
          onDragOver={(e) => canEdit && e.preventDefault()}
          onDrop={onDrop}
        >
          <PlotCanvas
            data={data}
            production={production}
            layers={layers}
            selection={selection}
            tool={tool}
            canEdit={canEdit}
            events={events}
            handleRef={handle}
            noteCounts={noteCounts}
          />
          <p className="pointer-events-none absolute right-3 top-2 rounded bg-surface/80 px-2 py-0.5 text-xs text-muted">
            {hintFor(tool, canEdit)}
          </p>
          <SpotTool
            productionId={production.id}
            units={production.displayUnits}
            datumName={production.datumName}
            view={() => handle.current?.view()}
          />
        </div>
        <SidePanel
          data={data}
          production={production}
          canEdit={canEdit}
          selection={selection}
          setSelection={setSelection}
          preview={preview}
          draft={draft}
          setDraft={setDraft}
          cmd={cmd}
          setTool={chooseTool}
          tool={tool}
        />
      </div>
    </div>
  );
}

function hintFor(tool: Tool, canEdit: boolean): string {
  if (!canEdit) return "View only · drag to pan · wheel to zoom";
  switch (tool) {
    case "position-line":
      return "Drag to draw a pipe, bridge or rail · snaps to the grid (Alt: free)";
    case "position-point":
      return "Click where the boom or ladder stands · snaps to the grid (Alt: free)";
    case "area":
      return "Click the corners (snapped to the grid; Alt: free); double-click or Enter to close";
    case "landmark":
      return "Drag along the line to name (lip, leg, header)";
    case "cut":
      return "Drag a line across the pool to cut it";
    case "calibrate":
      return "Drag between two points whose real distance you know";
    case "align":
      return "Click where the centre line meets the datum on the groundplan";
    case "place":
      return "Click a position to hang the unit";
    case "underlay":
      return "Drag to move the groundplan";
    default:
      return "Drag to pan · shift-drag to box-select · wheel to zoom";
  }
}

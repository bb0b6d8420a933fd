"use client";

import Link from "next/link";
import { useState, type RefObject } from "react";
import { LAYERS, type CanvasHandle, type LayerName, type LayerVisibility, type Tool } from "./canvas-types";

const LAYER_LABELS: Record<LayerName, string> = {
  underlay: "Groundplan",
  positions: "Positions",
  fixtures: "Fixtures",
  pools: "Pools",
  marks: "Focus marks",
  labels: "Labels",
  areas: "Acting areas",
  landmarks: "Landmarks",
};

const DRAW_TOOLS: Array<[Tool, string]> = [
  ["select", "Select"],
  ["position-line", "Pipe"],
  ["position-point", "Boom"],
  ["area", "Area"],
  ["landmark", "Landmark"],
];

export function Toolbar(p: {
  canEdit: boolean;
  tool: Tool;
  setTool: (t: Tool) => void;
  layers: LayerVisibility;
  setLayers: (l: LayerVisibility) => void;
  handle: RefObject<CanvasHandle | null>;
  undoLabel: string | null;
  onUndo: () => void;
  busy: boolean;
  productionId: number;
  productionName: string;
}) {
  const [showLayers, setShowLayers] = useState(false);
  const btn = "rounded-md border border-line px-2.5 py-1 text-sm hover:bg-raised";
  function exportPng() {
    const url = p.handle.current?.toDataURL();
    if (!url) return;
    const a = document.createElement("a");
    a.href = url;
    a.download = `${p.productionName.replace(/[^\w-]+/g, "-")}-plot.png`;
    a.click();
  }
  return (
    <div
      className="no-print flex flex-wrap items-center gap-2 border-b border-line bg-surface px-3 py-2"
      role="toolbar"
      aria-label="Plot tools"
    >
      {p.canEdit ? (
        <div className="flex gap-1" role="group" aria-label="Drawing tools">
          {DRAW_TOOLS.map(([t, label]) => (
            <button
              key={t}
              type="button"
              aria-pressed={p.tool === t}
              onClick={() => p.setTool(t)}
              className={`${btn} aria-pressed:bg-accent aria-pressed:text-accent-ink`}
            >
              {label}
            </button>
          ))}
        </div>
      ) : (
        <span className="rounded-md bg-raised px-2 py-1 text-xs text-muted" data-testid="read-only-badge">
          View only — your role cannot change the plot
        </span>
      )}
      <div className="flex gap-1" role="group" aria-label="Zoom">
        <button type="button" className={btn} onClick={() => p.handle.current?.zoom(1 / 1.25)} aria-label="Zoom out">
          −
        </button>
        <button type="button" className={btn} onClick={() => p.handle.current?.zoom(1.25)} aria-label="Zoom in">
          +
        </button>
        <button type="button" className={btn} onClick={() => p.handle.current?.fit()}>
          Fit to stage
        </button>
      </div>
      <div className="relative">
        <button type="button" className={btn} aria-expanded={showLayers} onClick={() => setShowLayers(!showLayers)}>
          Layers
        </button>
        {showLayers ? (
          <div className="absolute left-0 top-full z-20 mt-1 w-48 rounded-md border border-line bg-surface p-2 shadow-lg">
            {LAYERS.map((l) => (
              <label key={l} className="flex items-center gap-2 py-0.5 text-sm">
                <input
                  type="checkbox"
                  checked={p.layers[l]}
                  onChange={(e) => p.setLayers({ ...p.layers, [l]: e.target.checked })}
                />
                {LAYER_LABELS[l]}
              </label>
            ))}
          </div>
        ) : null}
      </div>
      {p.canEdit ? (
        <button
          type="button"
          className={btn}
          disabled={!p.undoLabel}
          onClick={p.onUndo}
          title={p.undoLabel ? `Undo: ${p.undoLabel}` : "Nothing to undo"}
        >
          Undo{p.undoLabel ? `: ${p.undoLabel}` : ""}
        </button>
      ) : null}
      <span className="flex-1" />
      {p.busy ? (
        <span className="text-xs text-muted" aria-live="polite">
          Saving…
        </span>
      ) : null}
      <button type="button" className={btn} onClick={exportPng}>
        Save as PNG
      </button>
      <Link className={btn} href={`/productions/${p.productionId}/plot/print`} target="_blank">
        Print to scale
      </Link>
    </div>
  );
}

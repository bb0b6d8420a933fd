"use client";

import { useState } from "react";
import { formatLength } from "@/lib/optics";
import { PanelField, PanelSection } from "./panel-field";
import type { PanelProps } from "./panel-props";

/** The groundplan underlay: upload, two-point calibration, align to the datum, move, rotate, opacity, lock. */
export function UnderlayPanel(p: PanelProps) {
  const u = p.data.underlays[0] ?? null;
  const [file, setFile] = useState<File | null>(null);
  const ed = p.canEdit;
  const patch = (label: string, fields: Record<string, unknown>) =>
    p.cmd.run(label, async () => {
      const now = p.cmd.latest().underlays.find((x) => x.id === u!.id);
      if (now) await p.cmd.actions.patchUnderlay(now.id, { ...fields, version: now.version });
    });

  return (
    <PanelSection title="Groundplan underlay" testId="underlay-panel">
      {u ? (
        <p className="text-xs text-muted" data-testid="underlay-info">
          {u.fileName} · {u.widthPx ?? "?"}×{u.heightPx ?? "?"} px · 1 px ={" "}
          {formatLength(u.metresPerPixel, p.production.displayUnits)}
          {u.locked ? " · locked" : ""}
        </p>
      ) : (
        <p className="text-xs text-muted">No groundplan yet.</p>
      )}
      {ed ? (
        <form
          className="flex flex-col gap-1"
          onSubmit={(e) => {
            e.preventDefault();
            if (file) void p.cmd.run("Upload the groundplan", () => p.cmd.actions.uploadUnderlay(file));
          }}
        >
          <input
            type="file"
            aria-label="Groundplan image"
            accept="image/png,image/jpeg,image/webp"
            data-testid="underlay-file"
            onChange={(e) => setFile(e.target.files?.[0] ?? null)}
            className="text-xs"
          />
          <button type="submit" disabled={!file} className="self-start rounded-md border border-line px-2 py-1 text-sm">
            Upload
          </button>
          <span className="text-xs text-muted">PNG, JPEG or WebP, up to 15 MB.</span>
        </form>
      ) : null}
      {u && ed ? (
        <>
          <div className="flex flex-wrap gap-1">
            <ToolButton {...p} t="calibrate" disabled={u.locked}>
              Calibrate scale
            </ToolButton>
            <ToolButton {...p} t="align" disabled={u.locked}>
              Set datum point
            </ToolButton>
            <ToolButton {...p} t="underlay" disabled={u.locked}>
              Move
            </ToolButton>
          </div>
          <PanelField
            label="Rotation (°)"
            value={String(u.rotationDeg)}
            editable={!u.locked}
            testId="underlay-rotation"
            commit={async (t) => {
              const n = Number(t);
              if (!Number.isFinite(n)) return "Rotation must be a number of degrees.";
              await patch("Rotate the groundplan", { rotationDeg: n });
              return null;
            }}
          />
          <label className="flex flex-col gap-0.5 text-sm">
            <span className="text-muted">Opacity {Math.round(u.opacity * 100)} %</span>
            <input
              type="range"
              min="0"
              max="100"
              defaultValue={Math.round(u.opacity * 100)}
              key={u.version}
              data-testid="underlay-opacity"
              onPointerUp={(e) =>
                void patch("Change the opacity", { opacity: Number((e.target as HTMLInputElement).value) / 100 })
              }
              onKeyUp={(e) =>
                void patch("Change the opacity", { opacity: Number((e.target as HTMLInputElement).value) / 100 })
              }
            />
          </label>
          <label className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={u.locked}
              data-testid="underlay-lock"
              onChange={(e) =>
                void patch(e.target.checked ? "Lock the groundplan" : "Unlock the groundplan", {
                  locked: e.target.checked,
                })
              }
            />
            Locked (cannot be moved or rescaled)
          </label>
        </>
      ) : null}
    </PanelSection>
  );
}

function ToolButton(p: PanelProps & { t: PanelProps["tool"]; disabled: boolean; children: React.ReactNode }) {
  return (
    <button
      type="button"
      disabled={p.disabled}
      aria-pressed={p.tool === p.t}
      onClick={() => p.setTool(p.tool === p.t ? "select" : p.t)}
      className="rounded-md border border-line px-2 py-1 text-sm aria-pressed:bg-accent aria-pressed:text-accent-ink disabled:opacity-50"
    >
      {p.children}
    </button>
  );
}

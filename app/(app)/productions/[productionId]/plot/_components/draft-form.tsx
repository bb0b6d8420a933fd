"use client";

import { useState } from "react";
import { formatLength, parseLength } from "@/lib/optics";
import { calibrate } from "@/lib/plot/underlay";
import { POSITION_KINDS, POSITION_KIND_LABELS, POINT_HUNG_KINDS, type PositionKind } from "@/lib/rig/position-kinds";
import { PanelSection } from "./panel-field";
import { EMPTY_SELECTION } from "./canvas-types";
import type { PanelProps } from "./panel-props";
import { defaultTrimFor } from "@/lib/plot/stage-defaults";

const round = (n: number) => Math.round(n * 1000) / 1000;

/** Finishes what a drawing tool started: a new position, acting area, landmark, or the calibration distance. */
export function DraftForm(p: PanelProps) {
  const d = p.draft!;
  const units = p.production.displayUnits;
  const unit = units === "metric" ? "m" : "ft";
  const vertical = d.kind === "position" && d.vertical;
  const [name, setName] = useState(
    d.kind === "position"
      ? vertical
        ? "New boom"
        : "New pipe"
      : d.kind === "area"
        ? `Area ${p.data.areaZones.length + 1}`
        : d.kind === "landmark"
          ? "lip"
          : "",
  );
  const [kind, setKind] = useState<PositionKind>(
    vertical ? "boom" : d.points[0]?.y < 0 ? "foh-bridge" : "overhead-pipe",
  );
  const [trim, setTrim] = useState(formatLength(defaultTrimFor(units, vertical), units));
  const [load, setLoad] = useState("");
  const [distance, setDistance] = useState("");
  const [error, setError] = useState<string | null>(null);
  const done = () => {
    p.setDraft(null);
    p.setTool("select");
  };

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    try {
      if (d.kind === "position") {
        const [a, b] = d.points;
        const ends = POINT_HUNG_KINDS.has(kind) || !b ? { x2: null, y2: null } : { x2: round(b.x), y2: round(b.y) };
        const rated = load.trim() === "" ? null : Number(load);
        if (rated !== null && !Number.isFinite(rated))
          throw new RangeError("Rated load must be a number of kilograms.");
        const r = await p.cmd.run("Add the position", () =>
          p.cmd.actions.createPosition({
            name,
            kind,
            x1: round(a.x),
            y1: round(a.y),
            ...ends,
            trimHeight: parseLength(trim, unit),
            ratedLoadKg: rated,
          }),
        );
        if (r) {
          p.cmd.remember(`Add ${r.name}`, () =>
            p.cmd.run("Undo add position", () => p.cmd.actions.deletePosition(r.id)).then(() => undefined),
          );
          p.setSelection({ ...EMPTY_SELECTION, positionId: r.id });
        }
      } else if (d.kind === "area") {
        await p.cmd.run("Add the acting area", () =>
          p.cmd.actions.createAreaZone({ name, polygon: d.points.map((q) => ({ x: round(q.x), y: round(q.y) })) }),
        );
      } else if (d.kind === "landmark") {
        const [a, b] = d.points;
        await p.cmd.run("Add the landmark", () =>
          p.cmd.actions.createLandmark({ name, x1: round(a.x), y1: round(a.y), x2: round(b.x), y2: round(b.y) }),
        );
      } else {
        const u = p.data.underlays[0];
        if (!u) throw new RangeError("Upload a groundplan first.");
        const next = calibrate(u, d.points[0], d.points[1], parseLength(distance, unit));
        const placement = {
          metresPerPixel: next.metresPerPixel,
          offsetX: round(next.offsetX),
          offsetY: round(next.offsetY),
        };
        await p.cmd.run("Calibrate the groundplan", () =>
          p.cmd.actions.patchUnderlay(u.id, { ...placement, version: u.version }),
        );
      }
      done();
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const title = {
    position: "New hanging position",
    area: "New acting area",
    landmark: "New landmark",
    calibrate: "Calibrate the groundplan",
  }[d.kind];
  const field = "min-h-9 rounded-md border border-line bg-surface px-2";
  return (
    <PanelSection title={title} testId="draft-form">
      <form onSubmit={submit} className="flex flex-col gap-2 text-sm">
        {d.kind !== "calibrate" ? (
          <label className="flex flex-col gap-0.5">
            <span className="text-muted">Name</span>
            <input className={field} value={name} onChange={(e) => setName(e.target.value)} data-testid="draft-name" />
          </label>
        ) : (
          <>
            <p className="text-xs text-muted">
              The two points are{" "}
              {formatLength(Math.hypot(d.points[1].x - d.points[0].x, d.points[1].y - d.points[0].y), units)} apart at
              the current scale.
            </p>
            <label className="flex flex-col gap-0.5">
              <span className="text-muted">Real distance between them</span>
              <input
                className={field}
                value={distance}
                onChange={(e) => setDistance(e.target.value)}
                placeholder={units === "metric" ? "e.g. 10 m" : `e.g. 32'6"`}
                data-testid="draft-distance"
                autoFocus
              />
            </label>
          </>
        )}
        {d.kind === "position" ? (
          <>
            <label className="flex flex-col gap-0.5">
              <span className="text-muted">Kind</span>
              <select
                className={field}
                value={kind}
                onChange={(e) => setKind(e.target.value as PositionKind)}
                data-testid="draft-kind"
              >
                {POSITION_KINDS.filter((k) => POINT_HUNG_KINDS.has(k) === vertical).map((k) => (
                  <option key={k} value={k}>
                    {POSITION_KIND_LABELS[k]}
                  </option>
                ))}
              </select>
            </label>
            <label className="flex flex-col gap-0.5">
              <span className="text-muted">Trim height{vertical ? " (top of the boom)" : ""}</span>
              <input
                className={field}
                value={trim}
                onChange={(e) => setTrim(e.target.value)}
                data-testid="draft-trim"
              />
            </label>
            <label className="flex flex-col gap-0.5">
              <span className="text-muted">Rated load (kg, from the venue)</span>
              <input className={field} value={load} onChange={(e) => setLoad(e.target.value)} />
            </label>
          </>
        ) : null}
        <p role="alert" className="text-xs text-danger" data-testid="draft-error">
          {error ?? ""}
        </p>
        <div className="flex gap-2">
          <button type="submit" className="rounded-md bg-accent px-3 py-1.5 text-accent-ink">
            {d.kind === "calibrate" ? "Apply scale" : "Add"}
          </button>
          <button type="button" className="rounded-md border border-line px-3 py-1.5" onClick={done}>
            Cancel
          </button>
        </div>
      </form>
    </PanelSection>
  );
}

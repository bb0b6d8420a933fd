"use client";
// What the editor does when the canvas reports a finished gesture or a drawn shape.
import { useMemo } from "react";
import type { Point } from "@/lib/optics";
import type { NumberingDirection } from "@/lib/plot/along-position";
import { alignPoint } from "@/lib/plot/underlay";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import { EMPTY_SELECTION, type CanvasEvents, type Selection, type Tool } from "./canvas-types";
import type { Commands } from "./use-commands";
import { placeFixture } from "./plot-commands";

export type Draft =
  | { kind: "position"; points: Point[]; vertical: boolean }
  | { kind: "area"; points: Point[] }
  | { kind: "landmark"; points: Point[] }
  | { kind: "calibrate"; points: Point[] }
  | null;

const CUT_LABELS = ["top", "bottom", "left", "right"] as const;

type Args = {
  cmd: Commands;
  selection: Selection;
  setSelection: (s: Selection) => void;
  setDraft: (d: Draft) => void;
  setTool: (t: Tool) => void;
  setPreview: (f: PlotFixture | null) => void;
  armedTypeId: number | null;
  direction: NumberingDirection;
};

export function useCanvasEvents(a: Args): CanvasEvents {
  const { cmd, selection, setSelection, setDraft, setTool, setPreview, armedTypeId, direction } = a;
  return useMemo<CanvasEvents>(
    () => ({
      select(sel, additive) {
        if (additive && sel.fixtures) {
          const next = new Set(selection.fixtures);
          for (const id of sel.fixtures) {
            if (next.has(id)) next.delete(id);
            else next.add(id);
          }
          setSelection({ ...EMPTY_SELECTION, fixtures: next });
        } else
          setSelection({
            fixtures: sel.fixtures ?? EMPTY_SELECTION.fixtures,
            positionId: sel.positionId ?? null,
            focusPointId: sel.focusPointId ?? null,
          });
      },
      moveMark(f, to) {
        void cmd.patchFixture(f.id, `Focus unit ${f.unitNumber}`, () => ({
          focusX: round(to.x),
          focusY: round(to.y),
          focusPointId: null,
        }));
      },
      moveFixture(f, to) {
        void cmd.patchFixture(f.id, `Move unit ${f.unitNumber}`, () => ({ x: round(to.x), y: round(to.y) }));
      },
      moveFocusPoint(id, to) {
        const run = () =>
          cmd.run(
            "Move focus point",
            async () => {
              const p = cmd.latest().focusPoints.find((q) => q.id === id);
              if (!p) return;
              await cmd.actions.patchFocusPoint(id, { x: round(to.x), y: round(to.y), version: p.version });
              cmd.remember(`Move ${p.name}`, () =>
                cmd
                  .run("Undo move", async () => {
                    const now = cmd.latest().focusPoints.find((q) => q.id === id);
                    if (now) await cmd.actions.patchFocusPoint(id, { x: p.x, y: p.y, version: now.version });
                  })
                  .then(() => undefined),
              );
            },
            () => void run(),
          );
        void run();
      },
      moveVertex(target, to) {
        const at = roundPt(to);
        const label = target.kind === "area" ? "Move an area's corner" : "Move a landmark's end";
        // Applied to the row as it is now (a 409 shows the other person's shape and offers to apply ours again).
        const apply = (point: Point) => {
          const run = (): Promise<unknown> =>
            cmd.run(
              label,
              async () => {
                const d = cmd.latest();
                if (target.kind === "area") {
                  const z = d.areaZones.find((q) => q.id === target.id);
                  if (!z) return null;
                  const polygon = z.polygon.map((p, i) => (i === target.index ? point : p));
                  return {
                    before: z.polygon[target.index],
                    saved: await cmd.actions.patchAreaZone(z.id, { polygon, version: z.version }),
                  };
                }
                const l = d.landmarks.find((q) => q.id === target.id);
                if (!l) return null;
                const ends =
                  target.index === 0
                    ? { x1: point.x, y1: point.y, x2: l.x2, y2: l.y2 }
                    : { x1: l.x1, y1: l.y1, x2: point.x, y2: point.y };
                const before = target.index === 0 ? { x: l.x1, y: l.y1 } : { x: l.x2, y: l.y2 };
                return { before, saved: await cmd.actions.patchLandmark(l.id, { ...ends, version: l.version }) };
              },
              () => void run(),
            );
          return run();
        };
        void apply(at).then((r) => {
          const done = r as { before: Point } | null | undefined;
          if (done) cmd.remember(label, () => apply(done.before).then(() => undefined));
        });
      },
      moveUnderlay(by) {
        void cmd.run("Move the underlay", async () => {
          const u = cmd.latest().underlays[0];
          if (u)
            await cmd.actions.patchUnderlay(u.id, {
              offsetX: round(u.offsetX + by.x),
              offsetY: round(u.offsetY + by.y),
              version: u.version,
            });
        });
      },
      preview: setPreview,
      place(at) {
        if (armedTypeId) void placeFixture(cmd, armedTypeId, at, direction, 0.8);
      },
      drawn(tool, points) {
        if (tool === "position-line" || tool === "position-point")
          setDraft({ kind: "position", points, vertical: tool === "position-point" });
        else if (tool === "area") setDraft({ kind: "area", points });
        else if (tool === "landmark") setDraft({ kind: "landmark", points });
        else if (tool === "calibrate") setDraft({ kind: "calibrate", points });
        else if (tool === "place" && armedTypeId) void placeFixture(cmd, armedTypeId, points[0], direction, 0.8);
        else if (tool === "align") {
          void cmd.run("Align the underlay", async () => {
            const u = cmd.latest().underlays[0];
            if (!u) return;
            const next = alignPoint(u, points[0], { x: 0, y: 0 });
            await cmd.actions.patchUnderlay(u.id, { offsetX: next.offsetX, offsetY: next.offsetY, version: u.version });
          });
          setTool("select");
        } else if (tool === "cut") {
          const [id] = [...selection.fixtures];
          if (id == null) return;
          void cmd.patchFixture(id, "Add a shutter cut", (f) => {
            const cuts = f.shutterCuts ?? [];
            const label = CUT_LABELS.find((l) => !cuts.some((c) => c.label === l));
            if (!label) {
              cmd.setNotice({ tone: "info", text: "A fixture has at most four shutter cuts; remove one first." });
              return null;
            }
            return { shutterCuts: [...cuts, { label, a: roundPt(points[0]), b: roundPt(points[1]) }] };
          });
          setTool("select");
        }
      },
    }),
    [cmd, selection, setSelection, setDraft, setTool, setPreview, armedTypeId, direction],
  );
}

const round = (n: number) => Math.round(n * 1000) / 1000;
const roundPt = (p: Point) => ({ x: round(p.x), y: round(p.y) });

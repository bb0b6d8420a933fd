"use client";
// The plot tools' presses: what a press of the select tool grabs (lib/plot/pick-target.ts decides),
// how a drag of a mark, unit, corner, line or groundplan follows the pointer, and what its release
// asks the editor to do. Presses the tools decline pan the view (components/plot/use-view-navigation).
// Drags live in refs and redraw only the layers they touch; the editor hears once, when a drag ends.
import { useEffect, useMemo, useRef, type RefObject } from "react";
import type { Point } from "@/lib/optics";
import { boundsOf, inBounds } from "@/lib/plot/pick";
import { pickTarget, type PickScene } from "@/lib/plot/pick-target";
import { projectOntoPosition } from "@/lib/plot/along-position";
import { gridStep } from "@/lib/plot/grid";
import { snapPoint } from "@/lib/plot/snap";
import { screenToPlan, type View } from "@/lib/plot/view";
import type { RigItem } from "@/components/plot/draw-rig";
import type { PressHandler } from "@/components/plot/use-view-navigation";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { PlotCanvasProps } from "./plot-canvas-props";
import { EMPTY_SELECTION, type Gesture } from "./canvas-types";
import { previewFixture } from "./rig-items";

type Args = {
  container: RefObject<HTMLDivElement | null>;
  view: RefObject<View>;
  gesture: RefObject<Gesture | null>;
  draft: RefObject<Point[]>;
  preview: RefObject<PlotFixture | null>;
  live: RefObject<{ props: PlotCanvasProps; items: RigItem[] }>;
  redraw: (which?: "all" | "overlay", now?: boolean) => void;
};

const TWO_POINT_TOOLS = new Set(["position-line", "landmark", "cut", "calibrate"]);
// Drawing tools whose points land on the visible grid (hold Alt to place freely).
const SNAP_TOOLS = new Set(["position-line", "position-point", "area", "landmark"]);

/** What the picker sees of the canvas's props: the plan as drawn now. */
function sceneOf(p: PlotCanvasProps, items: RigItem[], view: View): PickScene {
  const d = p.data;
  return {
    view,
    canEdit: p.canEdit,
    layers: p.layers,
    selectedFixtures: p.selection.fixtures,
    units: items,
    fixtures: d.fixtures,
    focusPoints: d.focusPoints,
    positions: d.positions,
    areaZones: d.areaZones,
    landmarks: d.landmarks,
  };
}

/** The tools' side of the canvas's pointer handling; pass it to useViewNavigation as `press`. */
export function useCanvasGestures({ container, view, gesture, draft, preview, live, redraw }: Args): PressHandler {
  // One redraw a frame, of the overlay alone unless something asked for everything.
  const frame = useRef({ id: 0, all: false });

  const press = useMemo<PressHandler>(() => {
    const schedule = (which: "all" | "overlay") => {
      const f = frame.current;
      f.all ||= which === "all";
      if (f.id) return;
      f.id = requestAnimationFrame(() => {
        f.id = 0;
        redraw(f.all ? "all" : "overlay", true);
        f.all = false;
      });
    };
    const fixtureOf = (id: number) => live.current.props.data.fixtures.find((f) => f.id === id)!;
    const snapFor = (tool: string, plan: Point, e: PointerEvent): Point => {
      if (!SNAP_TOOLS.has(tool) || e.altKey) return plan;
      return snapPoint(plan, gridStep(view.current.scale, live.current.props.production.displayUnits));
    };

    /** The select tool's press: selects what it lands on; returns the drag it starts, null for none, "pan" to let the view move. */
    function selectPress(s: Point, e: PointerEvent): Gesture | null | "pan" {
      const { props: p, items } = live.current;
      const plan = screenToPlan(view.current, s);
      const target = pickTarget(sceneOf(p, items, view.current), s, { shift: e.shiftKey });
      const select = p.events.select;
      switch (target.kind) {
        case "focusPoint":
          select({ ...EMPTY_SELECTION, focusPointId: target.id }, false);
          return { kind: "focusPoint", id: target.id, to: plan };
        case "selectedMark":
          return { kind: "mark", fixture: fixtureOf(target.fixtureId), to: plan };
        case "vertex":
          return { kind: "vertex", target: target.target, to: target.target.points[target.target.index] };
        case "unit":
          select({ ...EMPTY_SELECTION, fixtures: new Set([target.fixtureId]) }, e.shiftKey);
          return target.draggable ? { kind: "fixture", fixture: fixtureOf(target.fixtureId), to: plan } : null;
        case "mark":
          select({ ...EMPTY_SELECTION, fixtures: new Set([target.fixtureId]) }, false);
          return { kind: "mark", fixture: fixtureOf(target.fixtureId), to: plan };
        case "position":
          select({ ...EMPTY_SELECTION, positionId: target.id }, false);
          return null;
        case "none":
          return e.shiftKey ? { kind: "box", from: plan, to: plan } : "pan";
      }
    }

    /** A click (a press that did not move) with a tool that acts on one point, or on empty plan with the select tool. */
    function click(e: PointerEvent, s: Point) {
      const p = live.current.props;
      const plan = snapFor(p.tool, screenToPlan(view.current, s), e);
      if (p.tool === "select") p.events.select(EMPTY_SELECTION, false);
      else if (p.tool === "area") draft.current = [...draft.current, plan];
      else p.events.drawn(p.tool, [plan]);
    }

    function finish() {
      if (!preview.current) live.current.props.events.preview(null);
      redraw("all");
    }

    return {
      down(e, s) {
        const p = live.current.props;
        const plan = snapFor(p.tool, screenToPlan(view.current, s), e);
        let g: Gesture | null | "pan";
        if (p.tool === "select") g = selectPress(s, e);
        else if (p.tool === "underlay") g = { kind: "underlay", from: plan, to: plan };
        else if (TWO_POINT_TOOLS.has(p.tool)) g = { kind: "line", tool: p.tool, from: plan, to: plan };
        else g = "pan"; // point tools act on a click: a press that does not move
        gesture.current = g === "pan" ? null : g;
        if (g === "pan") return false;
        if (g?.kind === "mark" || g?.kind === "fixture") redraw("all");
        return true;
      },

      move(e, s) {
        const g = gesture.current;
        if (!g) return;
        const plan = screenToPlan(view.current, s);
        const p = live.current.props;
        const firstPreview = !preview.current && (g.kind === "mark" || g.kind === "fixture");
        switch (g.kind) {
          case "mark":
            g.to = plan;
            preview.current = previewFixture(p.data, g.fixture, { mark: plan }, p.production.headHeight);
            p.events.preview(preview.current);
            break;
          case "fixture": {
            const pos = p.data.positions.find((q) => q.id === g.fixture.positionId)!;
            g.to = projectOntoPosition(pos, plan).point;
            preview.current = previewFixture(p.data, g.fixture, { at: g.to }, p.production.headHeight);
            p.events.preview(preview.current);
            break;
          }
          case "line":
            g.to = snapFor(g.tool, plan, e);
            break;
          case "vertex":
            g.to = snapFor("area", plan, e);
            break;
          case "focusPoint":
          case "box":
          case "underlay":
            g.to = plan;
            break;
        }
        schedule(firstPreview ? "all" : "overlay"); // the first frame hides the unit's saved pool under the preview
      },

      up(e, _s, moved) {
        const g = gesture.current;
        gesture.current = null;
        if (!g) return redraw("all");
        const { props: p, items } = live.current;
        if (g.kind === "mark" && moved) p.events.moveMark(g.fixture, g.to);
        else if (g.kind === "mark" || g.kind === "fixture") preview.current = null;
        if (g.kind === "fixture" && moved) p.events.moveFixture(g.fixture, g.to);
        if (g.kind === "focusPoint" && moved) p.events.moveFocusPoint(g.id, g.to);
        if (g.kind === "vertex" && moved) p.events.moveVertex(g.target, g.to);
        if (g.kind === "underlay" && moved) p.events.moveUnderlay({ x: g.to.x - g.from.x, y: g.to.y - g.from.y });
        if (g.kind === "line" && moved) p.events.drawn(g.tool, [g.from, g.to]);
        if (g.kind === "box") {
          const b = boundsOf(g.from, g.to);
          const ids = items.filter((i) => inBounds(b, i)).map((i) => i.id);
          p.events.select(
            { ...EMPTY_SELECTION, fixtures: new Set([...(e.shiftKey ? p.selection.fixtures : []), ...ids]) },
            false,
          );
        }
        finish();
      },

      panEnded(e, s, moved) {
        if (!moved) click(e, s);
        finish();
      },

      cancel() {
        // A second finger made a pinch: the drag is dropped unsaved, and so is its preview.
        gesture.current = null;
        preview.current = null;
        finish();
      },
    };
  }, [view, gesture, draft, preview, live, redraw]);

  // Closing an area being drawn (double-click or Enter) and dropping it (Escape).
  useEffect(() => {
    const el = container.current!;
    const f = frame.current;
    function closeArea() {
      const p = live.current.props;
      if (p.tool === "area" && draft.current.length >= 3) {
        p.events.drawn("area", draft.current);
        draft.current = [];
        redraw("overlay");
      }
    }
    const onKey = (e: KeyboardEvent) => {
      const typing = (e.target as HTMLElement)?.closest?.("input, textarea, select");
      if (e.key === "Enter" && !typing) closeArea();
      if (e.key === "Escape") {
        draft.current = [];
        redraw("overlay");
      }
    };
    el.addEventListener("dblclick", closeArea);
    window.addEventListener("keydown", onKey);
    return () => {
      cancelAnimationFrame(f.id);
      f.id = 0;
      el.removeEventListener("dblclick", closeArea);
      window.removeEventListener("keydown", onKey);
    };
  }, [container, draft, live, redraw]);

  return press;
}

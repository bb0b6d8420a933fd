"use client";
// Pointer, wheel, pinch and keyboard-held pan on the plot canvas. Gestures live in refs and redraw
// only the layers they touch; the editor hears about a gesture once, when it ends.
import { useEffect, type RefObject } from "react";
import type { Point } from "@/lib/optics";
import { nearestOnScreen, boundsOf, inBounds, distanceToSegment } from "@/lib/plot/pick";
import { projectOntoPosition } from "@/lib/plot/along-position";
import { symbolPixels } from "@/lib/plot/symbol";
import { gridStep } from "@/lib/plot/grid";
import { snapPoint } from "@/lib/plot/snap";
import { panBy, planToScreen, screenToPlan, wheelZoomFactor, zoomAbout, type View } from "@/lib/plot/view";
import { symbolScreenPoint, type RigItem } from "@/components/plot/draw-rig";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { PlotCanvasProps } from "./plot-canvas";
import type { Gesture, VertexTarget } from "./canvas-types";
import { isVertical, previewFixture } from "./rig-items";

type Live = RefObject<{ props: PlotCanvasProps; items: RigItem[] }>;
type Args = {
  container: RefObject<HTMLDivElement | null>;
  view: RefObject<View>;
  gesture: RefObject<Gesture | null>;
  draft: RefObject<Point[]>;
  preview: RefObject<PlotFixture | null>;
  live: Live;
  redraw: (which?: "all" | "overlay", now?: boolean) => void;
  /** Set while the view moves; the costly layers then reuse their bitmaps until it rests. */
  moving: RefObject<boolean>;
};

/** How long the view must rest before the costly layers are drawn afresh at the new view. */
const REST_MS = 150;

const TWO_POINT_TOOLS = new Set(["position-line", "landmark", "cut", "calibrate"]);
// Drawing tools whose points land on the visible grid (hold Alt to place freely).
const SNAP_TOOLS = new Set(["position-line", "position-point", "area", "landmark"]);

/** The acting-area corner or landmark end within a few pixels of screen point `s`, if any. */
function pickVertex(p: PlotCanvasProps, toScreen: (q: Point) => Point, s: Point): VertexTarget | null {
  const candidates: VertexTarget[] = [];
  if (p.layers.areas) for (const z of p.data.areaZones) z.polygon.forEach((_, index) => candidates.push({ kind: "area", id: z.id, index, points: z.polygon }));
  if (p.layers.landmarks) {
    for (const l of p.data.landmarks) {
      const points = [{ x: l.x1, y: l.y1 }, { x: l.x2, y: l.y2 }];
      candidates.push({ kind: "landmark", id: l.id, index: 0, points }, { kind: "landmark", id: l.id, index: 1, points });
    }
  }
  return nearestOnScreen(candidates, (c) => toScreen(c.points[c.index]), s, 7);
}

export function useCanvasGestures({ container, view, gesture, draft, preview, live, redraw, moving }: Args) {
  useEffect(() => {
    const el = container.current!;
    let spaceDown = false;
    let frame = 0;
    let rest = 0;
    const viewMoved = () => {
      moving.current = true;
      clearTimeout(rest);
      rest = window.setTimeout(() => {
        moving.current = false;
        redraw("all");
      }, REST_MS);
    };
    let downAt: Point | null = null;
    const pointers = new Map<number, Point>();
    let pinch: { dist: number } | null = null;

    const local = (e: { clientX: number; clientY: number }): Point => {
      const r = el.getBoundingClientRect();
      return { x: e.clientX - r.left, y: e.clientY - r.top };
    };
    let wantAll = false;
    const schedule = (which: "all" | "overlay") => {
      wantAll ||= which === "all";
      if (frame) return;
      frame = requestAnimationFrame(() => {
        frame = 0;
        redraw(wantAll ? "all" : "overlay", true);
        wantAll = false;
      });
    };
    const fixtureOf = (id: number) => live.current.props.data.fixtures.find((f) => f.id === id) ?? null;

    function pick(s: Point, e: PointerEvent): Gesture | null {
      const { props: p, items } = live.current;
      const v = view.current;
      const plan = screenToPlan(v, s);
      const sel = p.selection.fixtures;
      if (p.canEdit && p.layers.marks) {
        const fp = nearestOnScreen(p.data.focusPoints, (q) => planToScreen(v, q), s, 9);
        if (fp) {
          p.events.select({ focusPointId: fp.id, fixtures: new Set(), positionId: null }, false);
          return { kind: "focusPoint", id: fp.id, to: plan };
        }
        const mark = nearestOnScreen(items.filter((i) => sel.has(i.id)), (i) => (i.mark ? planToScreen(v, i.mark) : null), s, 10);
        if (mark) return { kind: "mark", fixture: fixtureOf(mark.id)!, to: plan };
      }
      if (p.canEdit) {
        const vertex = pickVertex(p, (q) => planToScreen(v, q), s);
        if (vertex) return { kind: "vertex", target: vertex, to: vertex.points[vertex.index] };
      }
      if (p.layers.fixtures) {
        const hit = nearestOnScreen(items, (i) => symbolScreenPoint(v, i), s, symbolPixels(v.scale) * 0.6);
        if (hit) {
          p.events.select({ fixtures: new Set([hit.id]), positionId: null, focusPointId: null }, e.shiftKey);
          const f = fixtureOf(hit.id)!;
          const pos = p.data.positions.find((q) => q.id === f.positionId);
          if (p.canEdit && pos && !isVertical(pos.kind) && !e.shiftKey) return { kind: "fixture", fixture: f, to: plan };
          return null;
        }
      }
      if (p.canEdit && p.layers.marks) {
        const mark = nearestOnScreen(items, (i) => (i.mark ? planToScreen(v, i.mark) : null), s, 6);
        if (mark) {
          p.events.select({ fixtures: new Set([mark.id]), positionId: null, focusPointId: null }, false);
          return { kind: "mark", fixture: fixtureOf(mark.id)!, to: plan };
        }
      }
      if (p.layers.positions) {
        const pos = p.data.positions.find((q) => {
          const a = planToScreen(v, { x: q.x1, y: q.y1 });
          const b = q.x2 != null && q.y2 != null ? planToScreen(v, { x: q.x2, y: q.y2 }) : a;
          return distanceToSegment(s, a, b) <= 7;
        });
        if (pos) {
          p.events.select({ positionId: pos.id, fixtures: new Set(), focusPointId: null }, false);
          return null;
        }
      }
      if (e.shiftKey) return { kind: "box", from: plan, to: plan };
      return { kind: "pan", last: s };
    }

    function snapFor(tool: string, plan: Point, e: PointerEvent): Point {
      if (!SNAP_TOOLS.has(tool) || e.altKey) return plan;
      return snapPoint(plan, gridStep(view.current.scale, live.current.props.production.displayUnits));
    }

    function onDown(e: PointerEvent) {
      if (e.button !== 0 && e.button !== 1) return;
      const s = local(e);
      el.focus({ preventScroll: true }); // a scroll here would shift every later pointer position
      pointers.set(e.pointerId, s);
      el.setPointerCapture(e.pointerId);
      if (pointers.size === 2) {
        const [a, b] = [...pointers.values()];
        pinch = { dist: Math.hypot(a.x - b.x, a.y - b.y) };
        gesture.current = null;
        return;
      }
      downAt = s;
      const { props: p } = live.current;
      const plan = snapFor(p.tool, screenToPlan(view.current, s), e);
      if (spaceDown || e.button === 1) gesture.current = { kind: "pan", last: s };
      else if (p.tool === "select") gesture.current = pick(s, e);
      else if (p.tool === "underlay") gesture.current = { kind: "underlay", from: plan, to: plan };
      else if (TWO_POINT_TOOLS.has(p.tool)) gesture.current = { kind: "line", tool: p.tool, from: plan, to: plan };
      else gesture.current = { kind: "pan", last: s }; // point tools act on click (pointerup without movement)
      if (gesture.current?.kind === "mark" || gesture.current?.kind === "fixture") redraw("all");
    }

    function onMove(e: PointerEvent) {
      if (!pointers.has(e.pointerId)) return;
      const s = local(e);
      pointers.set(e.pointerId, s);
      if (pinch && pointers.size === 2) {
        const [a, b] = [...pointers.values()];
        const d = Math.hypot(a.x - b.x, a.y - b.y);
        view.current = zoomAbout(view.current, { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, d / pinch.dist);
        pinch.dist = d;
        viewMoved();
        schedule("all");
        return;
      }
      const g = gesture.current;
      if (!g) return;
      const v = view.current;
      const plan = screenToPlan(v, s);
      const p = live.current.props;
      const firstPreview = !preview.current && (g.kind === "mark" || g.kind === "fixture");
      switch (g.kind) {
        case "pan":
          view.current = panBy(v, s.x - g.last.x, s.y - g.last.y);
          g.last = s;
          viewMoved();
          schedule("all");
          return;
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
          g.to = plan;
          break;
        case "underlay":
          g.to = plan;
          break;
      }
      schedule(firstPreview ? "all" : "overlay"); // the first frame hides the unit's saved pool under the preview
    }

    function onUp(e: PointerEvent) {
      if (!pointers.has(e.pointerId)) return;
      pointers.delete(e.pointerId);
      if (pinch) {
        if (pointers.size < 2) pinch = null;
        return;
      }
      const g = gesture.current;
      gesture.current = null;
      const s = local(e);
      const moved = downAt ? Math.hypot(s.x - downAt.x, s.y - downAt.y) > 3 : true;
      const { props: p, items } = live.current;
      const plan = snapFor(p.tool, screenToPlan(view.current, s), e);
      if (!g) return redraw("all");
      if (g.kind === "pan" && !moved) {
        if (p.tool === "select") p.events.select({ fixtures: new Set(), positionId: null, focusPointId: null }, false);
        else if (p.tool === "area") {
          draft.current = [...draft.current, plan];
        } else p.events.drawn(p.tool, [plan]);
      }
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
        p.events.select({ fixtures: new Set([...(e.shiftKey ? p.selection.fixtures : []), ...ids]), positionId: null, focusPointId: null }, false);
      }
      if (!preview.current) p.events.preview(null);
      redraw("all");
    }

    function onWheel(e: WheelEvent) {
      e.preventDefault();
      view.current = zoomAbout(view.current, local(e), wheelZoomFactor(e.deltaY, e.ctrlKey));
      viewMoved();
      schedule("all");
    }

    function onDouble() {
      const p = live.current.props;
      if (p.tool === "area" && draft.current.length >= 3) {
        p.events.drawn("area", draft.current);
        draft.current = [];
        redraw("overlay");
      }
    }

    const onKey = (e: KeyboardEvent) => {
      const typing = (e.target as HTMLElement)?.closest?.("input, textarea, select");
      if (e.code === "Space" && !typing) {
        spaceDown = e.type === "keydown";
        el.style.cursor = spaceDown ? "grab" : "";
        if (e.type === "keydown" && document.activeElement === el) e.preventDefault();
      }
      if (e.type === "keydown" && e.key === "Enter" && !typing && live.current.props.tool === "area" && draft.current.length >= 3) onDouble();
      if (e.type === "keydown" && e.key === "Escape") {
        draft.current = [];
        redraw("overlay");
      }
    };

    el.addEventListener("pointerdown", onDown);
    el.addEventListener("pointermove", onMove);
    el.addEventListener("pointerup", onUp);
    el.addEventListener("pointercancel", onUp);
    el.addEventListener("wheel", onWheel, { passive: false });
    el.addEventListener("dblclick", onDouble);
    window.addEventListener("keydown", onKey);
    window.addEventListener("keyup", onKey);
    return () => {
      cancelAnimationFrame(frame);
      clearTimeout(rest);
      moving.current = false;
      el.removeEventListener("pointerdown", onDown);
      el.removeEventListener("pointermove", onMove);
      el.removeEventListener("pointerup", onUp);
      el.removeEventListener("pointercancel", onUp);
      el.removeEventListener("wheel", onWheel);
      el.removeEventListener("dblclick", onDouble);
      window.removeEventListener("keydown", onKey);
      window.removeEventListener("keyup", onKey);
    };
  }, [container, view, gesture, draft, preview, live, redraw, moving]);
}

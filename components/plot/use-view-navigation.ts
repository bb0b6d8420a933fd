"use client";
// Moving the view of a plan canvas: drag to pan, wheel to zoom about the pointer, two fingers to pinch
// (zoom and follow the hand), and, where asked, Space held to pan from any tool. Shared by the plot
// editor and the cue plan. The view lives in a ref and is drawn at most once a frame, so moving it
// never re-renders React. A canvas with tools of its own passes `press`: each one-finger press is
// offered to it first, and whatever it declines pans. The maths is pure, in lib/plot/view.ts.
import { useEffect, useRef, type RefObject } from "react";
import type { Point } from "@/lib/optics";
import { panBy, pinchStep, wheelZoomFactor, zoomAbout, type View } from "@/lib/plot/view";

/** How long the view must rest before `onRest` (costly layers drawn afresh at the new view). */
export const REST_MS = 150;
/** A press that travels no farther than this (screen pixels) is a click. */
export const CLICK_SLOP_PX = 3;

/** A canvas's own tools, offered each one-finger (or mouse) press before it pans. Points are element pixels. */
export type PressHandler = {
  /** Return true to take the press (its moves and release come here); false lets it pan the view. */
  down(e: PointerEvent, at: Point): boolean;
  move(e: PointerEvent, at: Point): void;
  up(e: PointerEvent, at: Point, moved: boolean): void;
  /** A press that panned has ended; `moved` false means it was a plain click on the plan. */
  panEnded?(e: PointerEvent, at: Point, moved: boolean): void;
  /** A second finger came down: the press became a pinch, drop what it was doing. */
  cancel?(): void;
};

export type ViewNavigationOptions = {
  element: RefObject<HTMLElement | null>;
  view: RefObject<View>;
  /** Draw at the new view (called from an animation frame, at most once a frame). */
  onFrame: () => void;
  /** The view has rested for REST_MS after its last move. */
  onRest?: () => void;
  press?: PressHandler;
  /** Zoom with the wheel only while Ctrl/⌘ is held, for a plan inside a scrolling page (a trackpad pinch sends ctrl+wheel). */
  wheelNeedsModifier?: boolean;
  /** Space held turns any press into a pan (for canvases whose tools take plain drags). */
  spacePans?: boolean;
};

/** Installs the listeners on `element`; returns `moving`, true while the view is under way (pan, pinch, wheel). */
export function useViewNavigation(options: ViewNavigationOptions): { moving: RefObject<boolean> } {
  const moving = useRef(false);
  // The latest options, read when an event arrives: the listeners are installed once.
  const latest = useRef(options);
  latest.current = options;
  const { element, view } = options;

  useEffect(() => {
    const el = element.current;
    if (!el) return;
    const pointers = new Map<number, Point>();
    let mode: "idle" | "pan" | "press" | "pinch" = "idle";
    let downAt: Point = { x: 0, y: 0 };
    let lastPan: Point = { x: 0, y: 0 };
    let spaceDown = false;
    let frame = 0;
    let rest = 0;

    const local = (e: { clientX: number; clientY: number }): Point => {
      const r = el.getBoundingClientRect();
      return { x: e.clientX - r.left, y: e.clientY - r.top };
    };
    const viewChanged = () => {
      moving.current = true;
      clearTimeout(rest);
      rest = window.setTimeout(() => {
        moving.current = false;
        latest.current.onRest?.();
      }, REST_MS);
      if (frame) return;
      frame = requestAnimationFrame(() => {
        frame = 0;
        latest.current.onFrame();
      });
    };

    function onDown(e: PointerEvent) {
      if (e.button !== 0 && e.button !== 1) return;
      const s = local(e);
      el!.focus({ preventScroll: true }); // a scroll here would shift every later pointer position
      pointers.set(e.pointerId, s);
      el!.setPointerCapture(e.pointerId);
      if (pointers.size === 2) {
        if (mode === "press") latest.current.press?.cancel?.();
        mode = "pinch";
        return;
      }
      if (pointers.size > 2) return;
      downAt = s;
      const press = latest.current.press;
      const wantsPan = (latest.current.spacePans && spaceDown) || e.button === 1;
      if (!wantsPan && press?.down(e, s)) mode = "press";
      else {
        mode = "pan";
        lastPan = s;
      }
    }

    function onMove(e: PointerEvent) {
      const before = pointers.get(e.pointerId);
      if (!before) return;
      const s = local(e);
      if (mode === "pinch") {
        const others = [...pointers.entries()].filter(([id]) => id !== e.pointerId);
        pointers.set(e.pointerId, s);
        if (others.length !== 1) return;
        const other = others[0][1];
        view.current = pinchStep(view.current, [before, other], [s, other]);
        return viewChanged();
      }
      pointers.set(e.pointerId, s);
      if (mode === "pan") {
        view.current = panBy(view.current, s.x - lastPan.x, s.y - lastPan.y);
        lastPan = s;
        return viewChanged();
      }
      if (mode === "press") latest.current.press?.move(e, s);
    }

    function onUp(e: PointerEvent) {
      if (!pointers.delete(e.pointerId)) return;
      if (mode === "pinch") {
        // The finger left behind does nothing until it lifts too: no surprise pan after a pinch.
        if (pointers.size < 2) mode = "idle";
        return;
      }
      const s = local(e);
      const moved = Math.hypot(s.x - downAt.x, s.y - downAt.y) > CLICK_SLOP_PX;
      const was = mode;
      mode = "idle";
      if (was === "pan") latest.current.press?.panEnded?.(e, s, moved);
      else if (was === "press") latest.current.press?.up(e, s, moved);
    }

    function onWheel(e: WheelEvent) {
      if (latest.current.wheelNeedsModifier && !e.ctrlKey && !e.metaKey) return; // let the page scroll
      e.preventDefault();
      view.current = zoomAbout(view.current, local(e), wheelZoomFactor(e.deltaY, e.ctrlKey));
      viewChanged();
    }

    function onSpace(e: KeyboardEvent) {
      if (!latest.current.spacePans || e.code !== "Space") return;
      if ((e.target as HTMLElement)?.closest?.("input, textarea, select")) return;
      spaceDown = e.type === "keydown";
      el!.style.cursor = spaceDown ? "grab" : "";
      if (spaceDown && document.activeElement === el) e.preventDefault(); // no page scroll
    }

    el.addEventListener("pointerdown", onDown);
    el.addEventListener("pointermove", onMove);
    el.addEventListener("pointerup", onUp);
    el.addEventListener("pointercancel", onUp);
    el.addEventListener("wheel", onWheel, { passive: false });
    window.addEventListener("keydown", onSpace);
    window.addEventListener("keyup", onSpace);
    return () => {
      cancelAnimationFrame(frame);
      clearTimeout(rest);
      moving.current = false;
      el.removeEventListener("pointerdown", onDown);
      el.removeEventListener("pointermove", onMove);
      el.removeEventListener("pointerup", onUp);
      el.removeEventListener("pointercancel", onUp);
      el.removeEventListener("wheel", onWheel);
      window.removeEventListener("keydown", onSpace);
      window.removeEventListener("keyup", onSpace);
    };
  }, [element, view]);

  return { moving };
}

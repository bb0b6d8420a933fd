import type { Point } from "@/lib/optics";
import type { View } from "@/lib/plot/view";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { VertexTarget } from "@/lib/plot/pick-target";

export type { VertexTarget };

export type Tool =
  | "select"
  | "position-line"
  | "position-point"
  | "area"
  | "landmark"
  | "cut"
  | "calibrate"
  | "align"
  | "place"
  | "underlay";

export const LAYERS = ["underlay", "positions", "fixtures", "pools", "marks", "labels", "areas", "landmarks"] as const;
export type LayerName = (typeof LAYERS)[number];
export type LayerVisibility = Record<LayerName, boolean>;

export type Selection = { fixtures: ReadonlySet<number>; positionId: number | null; focusPointId: number | null };

/** The id of the canvas's text description (go-to-unit.tsx writes it; the canvas points at it). */
export const PLOT_CANVAS_DESCRIPTION_ID = "plot-canvas-description";

/** Nothing selected. One shared value: a selection is always replaced, never changed in place. */
export const EMPTY_SELECTION: Selection = Object.freeze({
  fixtures: new Set<number>(),
  positionId: null,
  focusPointId: null,
});

/** What the canvas asks the editor to do; the editor owns saving, undo and messages. */
export type CanvasEvents = {
  select(sel: Partial<Selection>, additive: boolean): void;
  moveFixture(f: PlotFixture, to: Point): void;
  moveMark(f: PlotFixture, to: Point): void;
  moveFocusPoint(id: number, to: Point): void;
  moveUnderlay(by: Point): void;
  /** A corner of an acting area or an end of a landmark line was dragged to `to`. */
  moveVertex(target: VertexTarget, to: Point): void;
  drawn(tool: Tool, points: Point[]): void;
  preview(f: PlotFixture | null): void;
  place(at: Point): void;
};

/** Imperative handle for the toolbar. */
export type CanvasHandle = {
  fit(): void;
  zoom(factor: number): void;
  toDataURL(): string;
  view(): View;
};

/** Mutable state of a tool's drag in progress (kept out of React so a drag never re-renders the page). Panning is the view's, not a gesture. */
export type Gesture =
  | { kind: "box"; from: Point; to: Point }
  | { kind: "mark"; fixture: PlotFixture; to: Point }
  | { kind: "fixture"; fixture: PlotFixture; to: Point }
  | { kind: "focusPoint"; id: number; to: Point }
  | { kind: "vertex"; target: VertexTarget; to: Point }
  | { kind: "underlay"; from: Point; to: Point }
  | { kind: "line"; tool: Tool; from: Point; to: Point };

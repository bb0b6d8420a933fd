// What a press of the select tool lands on. Several things can sit under one pointer (a unit on its
// own focus mark, a focus point on an area's corner), so the answer follows one written-down order:
//
//   focus point › selected unit's mark › area corner or landmark end › unit › any unit's mark › position
//
// Why this order: the small things that are only grabbed on purpose come first (a focus point or the
// mark of the unit being focused sits on top of everything it is dragged across); a unit beats an
// unselected mark, so clicking a crowded pipe selects units rather than re-aiming them; positions are
// long lines under everything and come last. Pure: screen pixels in, a target out; no React, no canvas.
import type { Point } from "@/lib/optics";
import { isPointHung } from "@/lib/rig/position-kinds";
import { distanceToSegment, nearestOnScreen } from "./pick";
import { symbolPixels, symbolScreenPoint } from "./symbol";
import { planToScreen, type View } from "./view";

/** One editable point of the plan: an acting area's corner or a landmark line's end (0 or 1). */
export type VertexTarget = { kind: "area" | "landmark"; id: number; index: number; points: Point[] };

export type PickTarget =
  | { kind: "focusPoint"; id: number }
  | { kind: "selectedMark"; fixtureId: number }
  | { kind: "vertex"; target: VertexTarget }
  /** `draggable`: the unit may be slid along its line position (never on a point-hung one, never with shift). */
  | { kind: "unit"; fixtureId: number; draggable: boolean }
  | { kind: "mark"; fixtureId: number }
  | { kind: "position"; id: number }
  | { kind: "none" };

/** The order above, as data (tests and readers check against it). */
export const PICK_PRIORITY = ["focusPoint", "selectedMark", "vertex", "unit", "mark", "position"] as const;

/** How close, in screen pixels, a press must be; a unit's reach grows with its symbol. */
export const PICK_RADIUS_PX = {
  focusPoint: 9,
  selectedMark: 10,
  vertex: 7,
  unitOfSymbol: 0.6,
  mark: 6,
  position: 7,
} as const;

export type PickLayers = { marks: boolean; fixtures: boolean; positions: boolean; areas: boolean; landmarks: boolean };

/** A unit as drawn: plan point, the fan-out of a boom, and its focus mark. */
export type PickUnit = { id: number; x: number; y: number; stack: { index: number; dir: number }; mark: Point | null };

export type PickScene = {
  view: View;
  canEdit: boolean;
  layers: PickLayers;
  selectedFixtures: ReadonlySet<number>;
  units: readonly PickUnit[];
  fixtures: ReadonlyArray<{ id: number; positionId: number }>;
  focusPoints: ReadonlyArray<{ id: number; x: number; y: number }>;
  positions: ReadonlyArray<{ id: number; kind: string; x1: number; y1: number; x2: number | null; y2: number | null }>;
  areaZones: ReadonlyArray<{ id: number; polygon: Point[] }>;
  landmarks: ReadonlyArray<{ id: number; x1: number; y1: number; x2: number; y2: number }>;
};

export function pickTarget(scene: PickScene, at: Point, o: { shift: boolean }): PickTarget {
  const { view: v, layers, canEdit } = scene;
  const toScreen = (q: Point) => planToScreen(v, q);
  const markOf = (u: PickUnit) => (u.mark ? toScreen(u.mark) : null);

  if (canEdit && layers.marks) {
    const fp = nearestOnScreen(scene.focusPoints, toScreen, at, PICK_RADIUS_PX.focusPoint);
    if (fp) return { kind: "focusPoint", id: fp.id };
    const selected = scene.units.filter((u) => scene.selectedFixtures.has(u.id));
    const own = nearestOnScreen(selected, markOf, at, PICK_RADIUS_PX.selectedMark);
    if (own) return { kind: "selectedMark", fixtureId: own.id };
  }
  if (canEdit) {
    const vertex = pickVertex(scene, toScreen, at);
    if (vertex) return { kind: "vertex", target: vertex };
  }
  if (layers.fixtures) {
    const reach = symbolPixels(v.scale) * PICK_RADIUS_PX.unitOfSymbol;
    const unit = nearestOnScreen(scene.units, (u) => symbolScreenPoint(v, u), at, reach);
    if (unit)
      return { kind: "unit", fixtureId: unit.id, draggable: canEdit && !o.shift && slidesAlongLine(scene, unit.id) };
  }
  if (canEdit && layers.marks) {
    const mark = nearestOnScreen(scene.units, markOf, at, PICK_RADIUS_PX.mark);
    if (mark) return { kind: "mark", fixtureId: mark.id };
  }
  if (layers.positions) {
    // The first position within reach, in list order (lines rarely cross on a plan).
    const pos = scene.positions.find((q) => {
      const a = toScreen({ x: q.x1, y: q.y1 });
      const b = q.x2 != null && q.y2 != null ? toScreen({ x: q.x2, y: q.y2 }) : a;
      return distanceToSegment(at, a, b) <= PICK_RADIUS_PX.position;
    });
    if (pos) return { kind: "position", id: pos.id };
  }
  return { kind: "none" };
}

/** The acting-area corner or landmark end nearest the pointer, among the layers shown. */
function pickVertex(scene: PickScene, toScreen: (q: Point) => Point, at: Point): VertexTarget | null {
  const candidates: VertexTarget[] = [];
  if (scene.layers.areas) {
    for (const z of scene.areaZones) {
      for (let index = 0; index < z.polygon.length; index++)
        candidates.push({ kind: "area", id: z.id, index, points: z.polygon });
    }
  }
  if (scene.layers.landmarks) {
    for (const l of scene.landmarks) {
      const points = [
        { x: l.x1, y: l.y1 },
        { x: l.x2, y: l.y2 },
      ];
      candidates.push(
        { kind: "landmark", id: l.id, index: 0, points },
        { kind: "landmark", id: l.id, index: 1, points },
      );
    }
  }
  return nearestOnScreen(candidates, (c) => toScreen(c.points[c.index]), at, PICK_RADIUS_PX.vertex);
}

/** Units on pipes, trusses and rails slide along them; on a boom or ladder they stay at its point. */
function slidesAlongLine(scene: PickScene, fixtureId: number): boolean {
  const f = scene.fixtures.find((x) => x.id === fixtureId);
  const pos = f && scene.positions.find((q) => q.id === f.positionId);
  return pos != null && !isPointHung(pos.kind);
}

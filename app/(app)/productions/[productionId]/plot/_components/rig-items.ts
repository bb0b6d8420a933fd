// Turns the server's fixtures into what the canvas draws, and recomputes one fixture's geometry
// for the live preview while its mark is dragged (the same module the server uses).
import { computeFixtureGeometry } from "@/lib/rig/fixture-geometry";
import { symbolShape } from "@/lib/plot/symbol";
import { POINT_HUNG_KINDS, type PositionKind } from "@/lib/rig/position-kinds";
import type { Point } from "@/lib/optics";
import type { RigItem } from "@/components/plot/draw-rig";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { PlotPayload } from "@/hooks/use-plot";

export function isVertical(kind: string) {
  return POINT_HUNG_KINDS.has(kind as PositionKind);
}

export function buildRigItems(data: PlotPayload): RigItem[] {
  const kinds = new Map(data.positions.map((p) => [p.id, p.kind]));
  // Units hanging at one point (a boom) fan out on screen, top unit nearest the boom.
  const stacks = new Map<number, PlotFixture[]>();
  for (const f of data.fixtures) {
    if (!isVertical(kinds.get(f.positionId) ?? "")) continue;
    const list = stacks.get(f.positionId) ?? [];
    list.push(f);
    stacks.set(f.positionId, list);
  }
  const stackIndex = new Map<number, number>();
  for (const list of stacks.values()) {
    list.sort((a, b) => b.computed.lensHeight - a.computed.lensHeight || a.id - b.id);
    for (const [i, f] of list.entries()) stackIndex.set(f.id, i);
  }
  return data.fixtures.map((f) => toRigItem(f, stackIndex.get(f.id) ?? 0));
}

export function toRigItem(f: PlotFixture, stackIndex = 0): RigItem {
  const c = f.computed;
  return {
    id: f.id,
    x: f.x,
    y: f.y,
    shape: symbolShape(f.family),
    channel: f.channel,
    unitNumber: f.unitNumber,
    panDeg: c.panDeg,
    mark: c.focus ? { x: c.focus.x, y: c.focus.y } : null,
    pool: f.aim === "head" ? c.head : c.deck,
    cuts: f.shutterCuts ?? [],
    stack: { index: stackIndex, dir: f.x >= 0 ? 1 : -1 },
  };
}

/** The fixture as it would be with a new mark (and/or a new plan point), computed in the browser. */
export function previewFixture(
  data: PlotPayload,
  f: PlotFixture,
  change: { mark?: Point; at?: Point },
  headHeight: number,
): PlotFixture {
  const position = data.positions.find((p) => p.id === f.positionId);
  const type = data.fixtureTypes.find((t) => t.id === f.fixtureTypeId);
  if (!position || !type) return f;
  const point = f.focusPointId ? (data.focusPoints.find((p) => p.id === f.focusPointId) ?? null) : null;
  const next = {
    ...f,
    ...(change.at ? { x: change.at.x, y: change.at.y } : {}),
    ...(change.mark ? { focusX: change.mark.x, focusY: change.mark.y, focusPointId: null } : {}),
  };
  const computed = computeFixtureGeometry(
    { ...next, focusPoint: change.mark ? null : point, position, type },
    headHeight,
  );
  return { ...next, computed };
}

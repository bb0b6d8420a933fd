// What a press of the select tool grabs when several things lie under the pointer.
import { describe, expect, it } from "vitest";
import { PICK_PRIORITY, PICK_RADIUS_PX, pickTarget, type PickScene, type PickTarget } from "@/lib/plot/pick-target";
import { planToScreen } from "@/lib/plot/view";

// The plot's agreed order, written out here on its own so a change to the module's list shows up as a failure.
// (Product rule, no outside source: focus point › selected mark › vertex › unit › any mark › position.)
const ORDER = ["focusPoint", "selectedMark", "vertex", "unit", "mark", "position"] as const;
type Kind = (typeof ORDER)[number];

const view = { scale: 50, ox: 400, oy: 300 };
const P = { x: 1, y: 2 }; // the plan point under the pointer
const at = planToScreen(view, P); // (450, 200)
const ALL_LAYERS = { marks: true, fixtures: true, positions: true, areas: true, landmarks: true };
const far = (dx: number, dy: number) => ({ x: P.x + dx, y: P.y + dy }); // metres away: ≥ 100 px at this scale

const PIPE_FAR = { id: 90, kind: "overhead-pipe", x1: -6, y1: 8, x2: -2, y2: 8 };
const BOOM_FAR = { id: 91, kind: "boom", x1: -7, y1: -4, x2: null, y2: null };
const unit = (id: number, p: { x: number; y: number }, mark: { x: number; y: number } | null, index = 0) => ({
  id,
  ...p,
  stack: { index, dir: 1 },
  mark,
});

/** One thing of each kind, each exactly under the pointer, the rest of it far away. */
function sceneWith(kinds: readonly Kind[], over: Partial<PickScene> = {}): PickScene {
  const s: PickScene = {
    view,
    canEdit: true,
    layers: ALL_LAYERS,
    selectedFixtures: new Set(),
    units: [],
    fixtures: [],
    focusPoints: [],
    positions: [PIPE_FAR, BOOM_FAR],
    areaZones: [],
    landmarks: [],
  };
  const units = [];
  const fixtures = [];
  if (kinds.includes("focusPoint")) s.focusPoints = [{ id: 1, ...P }];
  if (kinds.includes("selectedMark")) {
    units.push(unit(10, far(-4, -3), P)); // its symbol far off, its mark under the pointer
    fixtures.push({ id: 10, positionId: PIPE_FAR.id });
    s.selectedFixtures = new Set([10]);
  }
  if (kinds.includes("vertex")) s.areaZones = [{ id: 20, polygon: [P, far(3, 0), far(3, 3)] }];
  if (kinds.includes("unit")) {
    units.push(unit(30, P, far(0, -4)));
    fixtures.push({ id: 30, positionId: PIPE_FAR.id });
  }
  if (kinds.includes("mark")) {
    units.push(unit(31, far(4, -3), P));
    fixtures.push({ id: 31, positionId: PIPE_FAR.id });
  }
  if (kinds.includes("position"))
    s.positions = [...s.positions, { id: 40, kind: "overhead-pipe", x1: P.x - 2, y1: P.y, x2: P.x + 2, y2: P.y }];
  return { ...s, units, fixtures, ...over };
}

const pick = (s: PickScene, o = { shift: false }, where = at) => pickTarget(s, where, o);

describe("pickTarget: the written order", () => {
  it("is the order the module declares", () => {
    expect([...PICK_PRIORITY]).toEqual([...ORDER]);
  });

  it("finds each kind when it is alone under the pointer", () => {
    for (const k of ORDER) expect(pick(sceneWith([k])).kind).toBe(k);
    expect(pick(sceneWith([])).kind).toBe("none");
  });

  // Every pair of kinds under one pointer: 15 conflicts, each won by the one earlier in the order.
  for (const [i, hi] of ORDER.entries()) {
    for (const lo of ORDER.slice(i + 1)) {
      it(`${hi} wins over ${lo}`, () => {
        expect(pick(sceneWith([hi, lo])).kind).toBe(hi);
        expect(pick(sceneWith([lo, hi])).kind).toBe(hi); // the order the scene lists them in does not matter
      });
    }
  }

  it("peels the stack one kind at a time", () => {
    for (let i = 0; i < ORDER.length; i++) expect(pick(sceneWith(ORDER.slice(i))).kind).toBe(ORDER[i]);
  });

  it("names what it found", () => {
    const all = sceneWith(ORDER);
    expect(pick(all)).toEqual({ kind: "focusPoint", id: 1 });
    expect(pick(sceneWith(["selectedMark", "unit"]))).toEqual({ kind: "selectedMark", fixtureId: 10 });
    const v = pick(sceneWith(["vertex"])) as Extract<PickTarget, { kind: "vertex" }>;
    expect(v.target).toMatchObject({ kind: "area", id: 20, index: 0 });
    expect(pick(sceneWith(["unit"]))).toEqual({ kind: "unit", fixtureId: 30, draggable: true });
    expect(pick(sceneWith(["mark"]))).toEqual({ kind: "mark", fixtureId: 31 });
    expect(pick(sceneWith(["position"]))).toEqual({ kind: "position", id: 40 });
  });
});

describe("pickTarget: who may grab what", () => {
  it("gives a read-only member units and positions only (no focus point, mark or corner to drag)", () => {
    const s = sceneWith(ORDER, { canEdit: false });
    expect(pick(s)).toEqual({ kind: "unit", fixtureId: 30, draggable: false });
    expect(pick(sceneWith(["focusPoint", "selectedMark", "vertex", "mark", "position"], { canEdit: false })).kind).toBe(
      "position",
    );
    expect(pick(sceneWith(["focusPoint", "selectedMark", "vertex", "mark"], { canEdit: false })).kind).toBe("none");
  });

  it("skips what a hidden layer hides", () => {
    const noMarks = { ...ALL_LAYERS, marks: false };
    expect(pick(sceneWith(["focusPoint", "selectedMark", "vertex"], { layers: noMarks })).kind).toBe("vertex");
    expect(pick(sceneWith(["mark", "position"], { layers: noMarks })).kind).toBe("position");
    expect(pick(sceneWith(["unit", "mark"], { layers: { ...ALL_LAYERS, fixtures: false } })).kind).toBe("mark");
    expect(pick(sceneWith(["vertex", "position"], { layers: { ...ALL_LAYERS, areas: false } })).kind).toBe("position");
    expect(pick(sceneWith(["position"], { layers: { ...ALL_LAYERS, positions: false } })).kind).toBe("none");
  });

  it("finds a landmark's end as a vertex, either end", () => {
    const s = sceneWith([], { landmarks: [{ id: 50, x1: P.x - 3, y1: P.y, x2: P.x, y2: P.y }] });
    const v = pick(s) as Extract<PickTarget, { kind: "vertex" }>;
    expect(v.target).toMatchObject({ kind: "landmark", id: 50, index: 1 });
    expect(v.target.points).toEqual([{ x: P.x - 3, y: P.y }, P]);
  });

  it("lets a unit slide along a pipe, never along a boom, never while shift adds to the selection", () => {
    const onPipe = sceneWith(["unit"]);
    expect(pick(onPipe)).toMatchObject({ kind: "unit", draggable: true });
    expect(pick(onPipe, { shift: true })).toMatchObject({ kind: "unit", draggable: false });
    const onBoom = { ...onPipe, fixtures: [{ id: 30, positionId: BOOM_FAR.id }] };
    expect(pick(onBoom)).toMatchObject({ kind: "unit", draggable: false });
    const orphan = { ...onPipe, fixtures: [{ id: 30, positionId: 999 }] };
    expect(pick(orphan)).toMatchObject({ kind: "unit", draggable: false });
  });
});

describe("pickTarget: reach in screen pixels", () => {
  it("takes a focus point inside its radius and leaves it just outside", () => {
    const s = sceneWith(["focusPoint"]);
    const r = PICK_RADIUS_PX.focusPoint;
    expect(pick(s, { shift: false }, { x: at.x + r - 0.01, y: at.y }).kind).toBe("focusPoint");
    expect(pick(s, { shift: false }, { x: at.x + r + 0.01, y: at.y }).kind).toBe("none");
  });

  it("takes a position within its reach of the line, anywhere along it", () => {
    const s = sceneWith(["position"]);
    const r = PICK_RADIUS_PX.position;
    const along = planToScreen(view, { x: P.x + 1.5, y: P.y });
    expect(pick(s, { shift: false }, { x: along.x, y: along.y - (r - 0.01) }).kind).toBe("position");
    expect(pick(s, { shift: false }, { x: along.x, y: along.y - (r + 0.01) }).kind).toBe("none");
    const pastTheEnd = planToScreen(view, { x: P.x + 2, y: P.y }); // the line stops at its end
    expect(pick(s, { shift: false }, { x: pastTheEnd.x + r + 0.01, y: pastTheEnd.y }).kind).toBe("none");
  });

  it("reaches a unit as far as its symbol: 0.6 of the symbol's size", () => {
    // symbol: 0.45 m × 50 px/m = 22.5 px (lib/plot/symbol.ts), so the reach is 13.5 px
    const s = sceneWith(["unit"]);
    expect(pick(s, { shift: false }, { x: at.x + 13.4, y: at.y }).kind).toBe("unit");
    expect(pick(s, { shift: false }, { x: at.x + 13.6, y: at.y }).kind).toBe("none");
  });

  it("finds the second unit of a boom where it is drawn, fanned out beside the first", () => {
    // drawn 1.15 symbols (22.5 px) to the side per place in the stack: 25.875 px
    const s = sceneWith([], {
      units: [unit(60, P, null, 0), unit(61, P, null, 1)],
      fixtures: [
        { id: 60, positionId: BOOM_FAR.id },
        { id: 61, positionId: BOOM_FAR.id },
      ],
    });
    expect(pick(s)).toMatchObject({ kind: "unit", fixtureId: 60 });
    expect(pick(s, { shift: false }, { x: at.x + 25.875, y: at.y })).toMatchObject({ kind: "unit", fixtureId: 61 });
  });

  it("takes the nearest of two marks, not the first listed", () => {
    const s = sceneWith([], {
      units: [unit(70, far(-4, -3), { x: P.x + 0.1, y: P.y }), unit(71, far(4, -3), { x: P.x + 0.02, y: P.y })],
      fixtures: [
        { id: 70, positionId: PIPE_FAR.id },
        { id: 71, positionId: PIPE_FAR.id },
      ],
    });
    expect(pick(s)).toEqual({ kind: "mark", fixtureId: 71 }); // 1 px away beats 5 px away
  });
});

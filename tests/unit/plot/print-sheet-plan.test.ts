// The printed plot's sheet plan on an invented rig: the key counts every unit once under its type, a
// boom's units fan out instead of stacking, and the labels it places meet neither each other nor a unit.
// Checks are brute-force counts and pairwise box tests written here (common practice, no source).
import { describe, expect, it } from "vitest";
import type { PlotData } from "@/lib/dto/plot";
import {
  sheetLabels,
  sheetMap,
  sheetUnits,
  symbolKey,
  symbolMm,
} from "@/app/(app)/productions/[productionId]/plot/print/sheet-plan";
import { sheetLayout } from "@/app/(app)/productions/[productionId]/plot/print/paper";

type Box = { x: number; y: number; w: number; h: number };
const overlaps = (a: Box, b: Box) =>
  Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x) > 1e-6 &&
  Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y) > 1e-6;

const position = (
  id: number,
  name: string,
  kind: string,
  x1: number,
  y1: number,
  x2: number | null,
  y2: number | null,
) => ({ id, name, kind, x1, y1, x2, y2 }) as unknown as PlotData["positions"][number];
const type = (id: number, name: string, family: string, coneMinDeg: number, coneMaxDeg: number) =>
  ({ id, name, family, coneMinDeg, coneMaxDeg }) as unknown as PlotData["fixtureTypes"][number];
let nextId = 1;
const unit = (positionId: number, fixtureTypeId: number, family: string, x: number, y: number, lensHeight: number) =>
  ({
    id: nextId++,
    positionId,
    fixtureTypeId,
    family,
    x,
    y,
    channel: nextId,
    computed: { lensHeight, panDeg: 90 },
  }) as unknown as PlotData["fixtures"][number];

const data: PlotData = {
  positions: [
    position(1, "1st Electric", "overhead-pipe", -6, 2, 6, 2),
    position(2, "Boom SL", "boom", 7, 4, null, null),
  ],
  fixtureTypes: [
    type(10, "Profile 26°", "profile", 26, 26),
    type(11, "Zoom profile", "profile", 25, 50),
    type(12, "Wash", "led-wash", 15, 45),
    type(13, "Unused type", "fresnel", 15, 60),
  ],
  fixtures: [
    ...Array.from({ length: 12 }, (_, i) => unit(1, i % 2 ? 10 : 12, i % 2 ? "profile" : "led-wash", -5.5 + i, 2, 7)),
    ...[6, 4.5, 3, 1.5].map((h) => unit(2, 11, "profile", 7, 4, h)),
  ],
  focusPoints: [],
  areaZones: [],
  landmarks: [],
  underlays: [],
};

describe("the printed plot's sheet plan", () => {
  it("keys each type in use once, with its cone range and its count, and leaves unused types out", () => {
    const key = symbolKey(data);
    expect(key.map((k) => [k.name, k.cone, k.count]).sort()).toEqual(
      [
        ["Profile 26°", "26°", 6],
        ["Wash", "15°–45°", 6],
        ["Zoom profile", "25°–50°", 4],
      ].sort(),
    );
    expect(key.reduce((n, k) => n + k.count, 0)).toBe(data.fixtures.length);
  });

  it("fans a boom's units out beside it, highest nearest, never on one point", () => {
    const layout = sheetLayout("A3", "landscape", 4);
    const k = 1000 / 50;
    const toSheet = sheetMap(layout.drawing, { minX: -8, maxX: 8, minY: -2, maxY: 8 }, k);
    const sym = symbolMm(k);
    const units = sheetUnits(data, toSheet, sym);
    const boom = units.filter((u) => data.fixtures.find((f) => f.id === u.id)?.positionId === 2);
    const xs = boom.map((u) => u.at.x);
    expect(new Set(xs.map((x) => x.toFixed(3))).size).toBe(4);
    // stage left of centre: they step outward (to larger x), the highest unit nearest the boom
    expect([...xs].sort((a, b) => a - b)).toEqual(xs);
    for (let i = 1; i < xs.length; i++) expect(xs[i] - xs[i - 1]).toBeGreaterThanOrEqual(sym);
  });

  it("places every label clear of the others and of the units", () => {
    const layout = sheetLayout("A4", "portrait", 4);
    const k = 1000 / 100;
    const toSheet = sheetMap(layout.drawing, { minX: -8, maxX: 8, minY: -2, maxY: 8 }, k);
    const sym = symbolMm(k);
    const units = sheetUnits(data, toSheet, sym);
    const { labels, unplaced } = sheetLabels(data, toSheet, units, sym, layout.drawing, [
      { text: "CL", a: toSheet({ x: 0, y: 8 }), b: toSheet({ x: 0, y: -2 }) },
    ]);
    expect(unplaced).toEqual([]);
    expect(labels.map((l) => l.text).sort()).toEqual(["1st Electric", "Boom SL", "CL"]);
    for (let i = 0; i < labels.length; i++) {
      for (let j = i + 1; j < labels.length; j++) expect(overlaps(labels[i].box, labels[j].box)).toBe(false);
      for (const u of units)
        expect(overlaps(labels[i].box, { x: u.at.x - sym / 2, y: u.at.y - sym / 2, w: sym, h: sym })).toBe(false);
    }
  });
});

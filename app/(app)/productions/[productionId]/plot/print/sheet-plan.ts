// The printed plot's contents worked out on the sheet, in millimetres: where each unit's symbol goes
// (units on a boom fanned out beside it, as on screen), which labels go where (lib/plot/label-placement,
// so no label sits on another or on a unit), and the key of the symbols in use.
import type { Point } from "@/lib/optics";
import type { PlotData } from "@/lib/dto/plot";
import { type Box, type PlacedLabel, placeLabels, textBox } from "@/lib/plot/label-placement";
import { type SymbolShape, symbolShape } from "@/lib/plot/symbol";
import { isPointHung } from "@/lib/rig/position-kinds";
import type { Bounds } from "@/lib/plot/view";

export const LABEL_FONT_MM = 2.6;

export type SheetUnit = { id: number; at: Point; angleDeg: number; shape: SymbolShape; channel: number | null };
export type SheetLabel = PlacedLabel & { text: string; kind: "position" | "line" };
export type KeyEntry = { typeId: number; name: string; shape: SymbolShape; cone: string; count: number };

/** Maps plan metres to sheet millimetres: the plan's bounds centred in the drawing frame at k mm a metre. */
export function sheetMap(drawing: Box, bounds: Bounds, k: number) {
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  return (p: Point): Point => ({
    x: drawing.x + drawing.w / 2 + (p.x - cx) * k,
    y: drawing.y + drawing.h / 2 - (p.y - cy) * k,
  });
}

/** Symbol size on paper: about 0.45 m at scale, never under 2.5 mm (readable at 1:200). */
export const symbolMm = (k: number) => Math.max(2.5, 0.45 * k);

export function sheetUnits(data: PlotData, toSheet: (p: Point) => Point, sym: number): SheetUnit[] {
  const pointHung = new Set(data.positions.filter((p) => isPointHung(p.kind)).map((p) => p.id));
  // Units at one point fan out sideways, the highest nearest the boom, away from the centre line.
  const stacks = new Map<number, PlotData["fixtures"]>();
  for (const f of data.fixtures)
    if (pointHung.has(f.positionId)) stacks.set(f.positionId, [...(stacks.get(f.positionId) ?? []), f]);
  const index = new Map<number, number>();
  for (const list of stacks.values()) {
    list.sort((a, b) => b.computed.lensHeight - a.computed.lensHeight || a.id - b.id);
    for (const [i, f] of list.entries()) index.set(f.id, i);
  }
  return data.fixtures.map((f) => {
    const at = toSheet(f);
    const dir = f.x >= 0 ? 1 : -1;
    return {
      id: f.id,
      at: { x: at.x + dir * (index.get(f.id) ?? 0) * sym * 1.15, y: at.y },
      angleDeg: f.computed.panDeg == null ? 90 : -f.computed.panDeg,
      shape: symbolShape(f.family),
      channel: f.channel,
    };
  });
}

/** Boxes along a line every few millimetres, so labels keep off the pipes as well as the units. */
function lineBoxes(a: Point, b: Point, thickness: number): Box[] {
  const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / 3));
  return Array.from({ length: n + 1 }, (_, i) => {
    const x = a.x + ((b.x - a.x) * i) / n;
    const y = a.y + ((b.y - a.y) * i) / n;
    return { x: x - thickness / 2, y: y - thickness / 2, w: thickness, h: thickness };
  });
}

export function sheetLabels(
  data: PlotData,
  toSheet: (p: Point) => Point,
  units: SheetUnit[],
  sym: number,
  drawing: Box,
  lines: Array<{ text: string; a: Point; b: Point }>,
  /** Other drawn things labels should keep off (the proscenium walls). */
  walls: Box[] = [],
): { labels: SheetLabel[]; unplaced: string[] } {
  const obstacles: Box[] = [
    ...units.map((u) => ({ x: u.at.x - sym / 2, y: u.at.y - sym / 2, w: sym, h: sym })),
    ...walls,
  ];
  const texts = new Map<string, { text: string; kind: SheetLabel["kind"] }>();
  const requests = [];
  // Longer pipes first: they have the most room and anchor the reader; booms and the stage lines after.
  const positions = [...data.positions].sort(
    (p, q) =>
      Math.hypot((q.x2 ?? q.x1) - q.x1, (q.y2 ?? q.y1) - q.y1) -
      Math.hypot((p.x2 ?? p.x1) - p.x1, (p.y2 ?? p.y1) - p.y1),
  );
  for (const p of positions) {
    const a = toSheet({ x: p.x1, y: p.y1 });
    const b = p.x2 != null && p.y2 != null ? toSheet({ x: p.x2, y: p.y2 }) : null;
    if (b) obstacles.push(...lineBoxes(a, b, 0.8));
    const id = `position-${p.id}`;
    texts.set(id, { text: p.name, kind: "position" });
    // A pipe's label reads from its stage-right (left-hand) end first, then its other end.
    const anchors = b ? (a.x <= b.x ? [a, b] : [b, a]) : [a];
    requests.push({ id, ...textBox(p.name, LABEL_FONT_MM), anchors });
  }
  for (const [i, l] of lines.entries()) {
    const id = `line-${i}`;
    texts.set(id, { text: l.text, kind: "line" });
    requests.push({ id, ...textBox(l.text, LABEL_FONT_MM * 0.85), anchors: [l.a, l.b] });
  }
  const { placed, unplaced } = placeLabels(requests, obstacles, { bounds: drawing, gap: 1.2, rings: 8 });
  return {
    labels: placed.map((p) => ({ ...p, ...(texts.get(p.id) as { text: string; kind: SheetLabel["kind"] }) })),
    unplaced: unplaced.map((id) => texts.get(id)?.text ?? id),
  };
}

const deg = (n: number) => `${Number(n.toFixed(1))}°`;

/** One line for each fixture type hung in the production: its symbol, name, cone range and count. */
export function symbolKey(data: PlotData): KeyEntry[] {
  const counts = new Map<number, number>();
  for (const f of data.fixtures) counts.set(f.fixtureTypeId, (counts.get(f.fixtureTypeId) ?? 0) + 1);
  return data.fixtureTypes
    .filter((t) => counts.has(t.id))
    .map((t) => ({
      typeId: t.id,
      name: t.name,
      shape: symbolShape(t.family),
      cone: t.coneMinDeg === t.coneMaxDeg ? deg(t.coneMaxDeg) : `${deg(t.coneMinDeg)}–${deg(t.coneMaxDeg)}`,
      count: counts.get(t.id) ?? 0,
    }))
    .sort((a, b) => a.shape.localeCompare(b.shape) || a.name.localeCompare(b.name, undefined, { numeric: true }));
}

/** Cuts text to what fits a width on the sheet, judged from the font size (about 0.55 em a character). */
export function clipText(text: string, widthMm: number, fontMm: number): string {
  const max = Math.floor(widthMm / (fontMm * 0.55));
  return text.length <= max ? text : `${text.slice(0, Math.max(1, max - 1))}…`;
}

/** The sheet box around a drawn polygon. */
export function boxAround(points: Point[]): Box {
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const x = Math.min(...xs);
  const y = Math.min(...ys);
  return { x, y, w: Math.max(...xs) - x, h: Math.max(...ys) - y };
}

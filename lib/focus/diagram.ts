// The geometry of the chart's diagram, drawn to scale in plan (audience at the bottom): the view around the
// mark and pool, the stage lines cut to it, the scale bar's length, the pool to draw. The drawing itself is a
// React component (components/focus/pool-diagram.tsx), so every name on it is escaped by React; one component
// serves the screen, the browser's print and the server's PDF, so all three show the same drawing.
import { METRES_PER_FOOT, type Ellipse, type Point, type Units } from "@/lib/optics";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { Landmark } from "./landmarks";

export type DiagramInput = {
  fixture: Pick<FixtureDto, "computed" | "shutterCuts" | "focusPointName">;
  landmarks: Landmark[];
  units: Units;
  /** Shutter letters to print beside each cut, in the same order as fixture.shutterCuts. */
  cutLabels?: string[];
};

export type Box = { minX: number; minY: number; maxX: number; maxY: number };

const MIN_SPAN_M = 3;
/** Numbers as the SVG writes them: to the millimetre, no trailing zeros. */
export const fmt = (v: number) => (Math.round(v * 1000) / 1000).toString();
/** Plan to SVG: y upstage is up on the page. */
export const pt = (p: Point) => `${fmt(p.x)},${fmt(-p.y)}`;
export const svgPath = (poly: Point[]) => (poly.length ? `M${poly.map(pt).join("L")}Z` : "");
/** Points of a pool outline the shutters cut: fewer than the optics default, plenty at a chart's size. */
export const CUT_POINTS = 48;

/** A plan ellipse as <ellipse> attributes: the page's y runs down, so the plan's rotation turns the other way. */
export function ellipseAttrs(e: Ellipse): { cx: string; cy: string; rx: string; ry: string; transform?: string } {
  const cx = fmt(e.centre.x);
  const cy = fmt(-e.centre.y);
  const a = { cx, cy, rx: fmt(e.semiMajor), ry: fmt(e.semiMinor) };
  return e.rotationDeg ? { ...a, transform: `rotate(${fmt(-e.rotationDeg)} ${cx} ${cy})` } : a;
}

export function viewBox(mark: Point, outer: { minX: number; minY: number; maxX: number; maxY: number } | null): Box {
  const b = outer ?? { minX: mark.x, minY: mark.y, maxX: mark.x, maxY: mark.y };
  const box = {
    minX: Math.min(b.minX, mark.x),
    minY: Math.min(b.minY, mark.y),
    maxX: Math.max(b.maxX, mark.x),
    maxY: Math.max(b.maxY, mark.y),
  };
  const span = Math.max(MIN_SPAN_M, box.maxX - box.minX, box.maxY - box.minY) * 1.35;
  const cx = (box.minX + box.maxX) / 2;
  const cy = (box.minY + box.maxY) / 2;
  return { minX: cx - span / 2, maxX: cx + span / 2, minY: cy - span / 2, maxY: cy + span / 2 };
}

/** A round scale-bar length (1, 2, 5 × 10ⁿ metres, or whole feet) about a fifth of the view. */
export function scaleLength(span: number, units: Units): number {
  const unit = units === "imperial" ? METRES_PER_FOOT : 1;
  const target = span / 5 / unit;
  const pow = 10 ** Math.floor(Math.log10(target));
  const step = [1, 2, 5, 10].find((s) => s * pow >= target) ?? 10;
  return Math.max(step * pow, units === "imperial" ? 1 : 0) * unit;
}

/** The part of segment a–b inside the box (Liang–Barsky), or null: a stage line drawn past the view
 * would still be dashed all along its length in the PDF. */
export function clipSegment(a: Point, b: Point, box: Box): [Point, Point] | null {
  const d = { x: b.x - a.x, y: b.y - a.y };
  let t0 = 0;
  let t1 = 1;
  const edges: Array<[number, number]> = [
    [-d.x, a.x - box.minX],
    [d.x, box.maxX - a.x],
    [-d.y, a.y - box.minY],
    [d.y, box.maxY - a.y],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return null;
  }
  return [
    { x: a.x + d.x * t0, y: a.y + d.y * t0 },
    { x: a.x + d.x * t1, y: a.y + d.y * t1 },
  ];
}

export type LandmarkLine = { name: string; a: Point; b: Point; label: { at: Point; vertical: boolean } | null };

/** The stage lines inside the view, each with where its name goes (null when that falls outside). */
export function landmarkLines(landmarks: Landmark[], box: Box, text: number): LandmarkLine[] {
  return landmarks.flatMap((l) => {
    const seg = clipSegment(l.a, l.b, box);
    if (!seg) return [];
    const [a, b] = seg;
    const mid = {
      x: Math.min(Math.max((a.x + b.x) / 2, box.minX + text * 3), box.maxX - text * 3),
      y: (a.y + b.y) / 2,
    };
    const vertical = Math.abs(b.x - a.x) < Math.abs(b.y - a.y);
    const at = vertical ? { x: a.x, y: Math.min(Math.max(mid.y, box.minY + text), box.maxY - text * 4) } : mid;
    const inside = at.x > box.minX && at.x < box.maxX && at.y > box.minY && at.y < box.maxY;
    return [{ name: l.name, a, b, label: inside ? { at, vertical } : null }];
  });
}

/** The pool the chart draws: at the aim height the designer chose, else the other plane; null if both are open. */
export function drawnPool(
  g: FixtureDto["computed"],
): { pool: NonNullable<FixtureDto["computed"]["deck"]>; plane: "the deck" | "head height" } | null {
  const deck = g.deck?.status === "ok" && g.deck.outer ? { pool: g.deck, plane: "the deck" as const } : null;
  const head = g.head?.status === "ok" && g.head.outer ? { pool: g.head, plane: "head height" as const } : null;
  return g.focus && g.focus.z > 0 ? (head ?? deck) : (deck ?? head);
}

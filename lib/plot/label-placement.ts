// Where the printed plot's text labels go (position names, boom names): a greedy pass that puts each
// label in the first free spot around its anchors, so no two labels overlap and none hides a unit's
// symbol when a free spot exists. Pure geometry on axis-aligned boxes in any one unit (the print uses
// millimetres on the sheet); no I/O, no React.
//
// Why greedy: a sheet holds tens of labels, not thousands, and the order is the caller's priority
// (longer pipes first); an optimal placement is NP-hard and gains little on a plot this sparse.
import type { Point } from "@/lib/optics";

/** An axis-aligned box: (x, y) is its top-left corner, y grows downward as on the sheet. */
export type Box = { x: number; y: number; w: number; h: number };

export type LabelRequest = {
  id: string;
  w: number;
  h: number;
  /** Points the label should sit next to, best first (a pipe's ends, a boom's foot). */
  anchors: Point[];
};

export type PlacedLabel = {
  id: string;
  box: Box;
  /** The anchor the box sits beside. */
  anchor: Point;
  /** True when the box is away from its anchor (an outer ring): draw a leader line to it. */
  leader: boolean;
  /** True when every candidate spot covered a symbol, so the label covers one (least covered spot chosen). */
  coversSymbol: boolean;
};

export type PlacementOptions = {
  /** The area labels must stay inside (the drawing frame). */
  bounds: Box;
  /** Clear space between a label and its anchor. */
  gap?: number;
  /** How many rings further out to try once the spots next to an anchor are taken. */
  rings?: number;
};

const EPS = 1e-9;

/** True when two boxes share interior area; boxes that only touch along an edge do not intersect. */
export function boxesIntersect(a: Box, b: Box): boolean {
  return a.x < b.x + b.w - EPS && b.x < a.x + a.w - EPS && a.y < b.y + b.h - EPS && b.y < a.y + a.h - EPS;
}

function overlapArea(a: Box, b: Box): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

function inside(b: Box, outer: Box): boolean {
  return (
    b.x >= outer.x - EPS &&
    b.y >= outer.y - EPS &&
    b.x + b.w <= outer.x + outer.w + EPS &&
    b.y + b.h <= outer.y + outer.h + EPS
  );
}

// Directions around an anchor, in order of preference: beside it (text reads from it), then above and
// below, then the corners. Each places the box so its nearest edge or corner is `d` from the anchor.
const SIDES: Array<(a: Point, w: number, h: number, d: number) => Box> = [
  (a, w, h, d) => ({ x: a.x + d, y: a.y - h / 2, w, h }), // right
  (a, w, h, d) => ({ x: a.x - d - w, y: a.y - h / 2, w, h }), // left
  (a, w, h, d) => ({ x: a.x - w / 2, y: a.y - d - h, w, h }), // above
  (a, w, h, d) => ({ x: a.x - w / 2, y: a.y + d, w, h }), // below
  (a, w, h, d) => ({ x: a.x + d, y: a.y - d - h, w, h }), // above right
  (a, w, h, d) => ({ x: a.x - d - w, y: a.y - d - h, w, h }), // above left
  (a, w, h, d) => ({ x: a.x + d, y: a.y + d, w, h }), // below right
  (a, w, h, d) => ({ x: a.x - d - w, y: a.y + d, w, h }), // below left
];

export type Candidate = { box: Box; anchor: Point; ring: number };

/** Every spot tried for a label, in the order tried: ring by ring outward, each anchor's sides in turn. */
export function candidateSpots(label: LabelRequest, opts: PlacementOptions): Candidate[] {
  const gap = opts.gap ?? 1;
  const rings = opts.rings ?? 6;
  const step = Math.max(label.h, gap);
  const out: Candidate[] = [];
  for (let ring = 0; ring <= rings; ring++)
    for (const anchor of label.anchors)
      for (const side of SIDES) out.push({ box: side(anchor, label.w, label.h, gap + ring * step), anchor, ring });
  return out;
}

/**
 * Places labels in the order given. Each goes to the first spot inside the bounds that meets no placed
 * label and no obstacle; failing that, to the spot meeting no label that covers the least obstacle area;
 * failing that, it is left out (listed in `unplaced`) rather than drawn over another label.
 */
export function placeLabels(
  labels: LabelRequest[],
  obstacles: Box[],
  opts: PlacementOptions,
): { placed: PlacedLabel[]; unplaced: string[] } {
  const placed: PlacedLabel[] = [];
  const unplaced: string[] = [];
  for (const label of labels) {
    const spots = candidateSpots(label, opts).filter(
      (c) => inside(c.box, opts.bounds) && !placed.some((p) => boxesIntersect(p.box, c.box)),
    );
    const free = spots.find((c) => !obstacles.some((o) => boxesIntersect(o, c.box)));
    let chosen = free;
    if (!chosen) {
      let least = Number.POSITIVE_INFINITY;
      for (const c of spots) {
        const covered = obstacles.reduce((sum, o) => sum + overlapArea(o, c.box), 0);
        if (covered < least - EPS) {
          least = covered;
          chosen = c;
        }
      }
    }
    if (!chosen) {
      unplaced.push(label.id);
      continue;
    }
    placed.push({
      id: label.id,
      box: chosen.box,
      anchor: chosen.anchor,
      leader: chosen.ring > 0,
      coversSymbol: !free,
    });
  }
  return { placed, unplaced };
}

/** A label's box for a line of text: a width estimate from the character count (no font metrics on the server). */
export function textBox(text: string, fontSize: number): { w: number; h: number } {
  // IBM Plex Sans averages about 0.55 em a character; 0.6 leaves room for wide capitals.
  return { w: Math.max(1, text.length) * fontSize * 0.6, h: fontSize * 1.25 };
}

/** The point of a label's box nearest its anchor: where a leader line from the anchor ends. */
export function leaderEnd(box: Box, anchor: Point): Point {
  return {
    x: Math.min(Math.max(anchor.x, box.x), box.x + box.w),
    y: Math.min(Math.max(anchor.y, box.y), box.y + box.h),
  };
}

// Shutter cuts in the crew's words, and which physical shutter (or barn door) makes each one.
//
// Why the swap: a profile spot's lens forms an image of its gate, and a simple lens turns that image
// half a turn (upside down and left for right). A shutter pushed in from the TOP of the gate therefore
// cuts the BOTTOM of the beam — on a unit hung above and tilted down, the bottom of the beam is the edge
// nearest the fixture, so the top shutter cuts the near edge and the bottom shutter the far edge. Left
// and right swap the same way: seen from behind the unit looking along the beam, the left shutter cuts
// the right-hand side of the pool. Barn doors sit in front of the lens, outside the image, so they cut
// their own side with no swap (top door: far edge, left door: left side).
import { formatLength, type Point, type Units } from "@/lib/optics";
import { cutPreposition, withArticle, type Landmark } from "./landmarks";

export type CutSide = "top" | "bottom" | "left" | "right";
export type DeckEdge = "downstage" | "upstage" | "stage-left" | "stage-right";
/** A side of the beam as the electrician behind the unit sees it: near and far along the beam, left and right across. */
export type BeamSide = "near" | "far" | "left" | "right";

/** Beam side removed → physical shutter that removes it, through a lens that inverts the image. */
export const SHUTTER_FOR_BEAM_SIDE: Record<BeamSide, CutSide> = {
  near: "top",
  far: "bottom",
  left: "right",
  right: "left",
};
/** Barn doors are outside the lens: no inversion. */
export const BARN_DOOR_FOR_BEAM_SIDE: Record<BeamSide, CutSide> = {
  near: "bottom",
  far: "top",
  left: "left",
  right: "right",
};

/** Families whose beam is shaped in the gate (shutters behind the lens); the rest carry barn doors. */
const GATE_FAMILIES = new Set(["profile", "followspot"]);

export type CutInput = { label: CutSide; a: Point; b: Point };

export type CutReading = {
  label: CutSide;
  deckEdge: DeckEdge;
  beamSide: BeamSide | null;
  cutter: "shutter" | "barn door";
  /** The physical shutter or door; null when the beam points straight down and the label is all we have. */
  physical: CutSide | null;
  landmark: string | null;
  /** "downstage edge off the lip" */
  words: string;
  /** "top shutter" or "bottom shutter (as labelled: the beam points straight down)" */
  cutterWords: string;
};

/** A tilt steeper than this leaves no "top" of the beam to speak of (common practice, no source). */
const STRAIGHT_DOWN_DEG = 88;
/** A cut counts as running along a landmark within this angle and distance (house tolerance). */
const PARALLEL_DEG = 15;
const NEAR_M = 0.3;

/** Unit normal of the cut line pointing to the side the cut removes (away from the mark). */
export function removedNormal(cut: { a: Point; b: Point }, mark: Point): Point {
  const dx = cut.b.x - cut.a.x;
  const dy = cut.b.y - cut.a.y;
  const len = Math.hypot(dx, dy);
  if (!(len > 1e-9)) throw new RangeError("A shutter cut needs two different points.");
  let n = { x: -dy / len, y: dx / len };
  const markSide = n.x * (mark.x - cut.a.x) + n.y * (mark.y - cut.a.y);
  if (Math.abs(markSide) < 1e-9)
    throw new RangeError("The focus mark lies on a shutter cut, so the side it removes is unclear.");
  if (markSide > 0) n = { x: -n.x, y: -n.y };
  return n;
}

export function deckEdgeOf(n: Point): DeckEdge {
  if (Math.abs(n.y) >= Math.abs(n.x)) return n.y < 0 ? "downstage" : "upstage";
  return n.x > 0 ? "stage-left" : "stage-right";
}

/** Which side of the beam a removed-side normal points to, for a beam travelling along panDeg in plan. */
export function beamSideOf(n: Point, panDeg: number): BeamSide {
  const r = (panDeg * Math.PI) / 180;
  const along = n.x * Math.cos(r) + n.y * Math.sin(r);
  // Left of the direction of travel, seen from above with x to stage left and y upstage.
  const left = -n.x * Math.sin(r) + n.y * Math.cos(r);
  if (Math.abs(along) >= Math.abs(left)) return along > 0 ? "far" : "near";
  return left > 0 ? "left" : "right";
}

function footOnLine(p: Point, a: Point, b: Point): Point {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy);
  return { x: a.x + t * dx, y: a.y + t * dy };
}

/** Nearest point of the segment a–b to p (a landmark is a drawn line with ends, not an endless one). */
function nearestOnSegment(p: Point, a: Point, b: Point): Point {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2)) : 0;
  return { x: a.x + t * dx, y: a.y + t * dy };
}

/**
 * How far from the mark a landmark may be and still be what a cut is worded against, when the chart does not
 * pass the pool's own reach (house tolerance: about the radius of a typical area pool).
 */
export const DEFAULT_POOL_REACH_M = 3;

/**
 * The landmark a cut runs along (nearly parallel, close to where the cut meets the pool), else one whose end it
 * meets. Only landmarks near the pool count: `reach` is the distance from the mark to the pool's farthest edge,
 * and the point where the cut meets the landmark must lie within it (plus the house tolerance), never somewhere
 * along the cut line's endless extension.
 */
export function matchLandmark(
  cut: { a: Point; b: Point },
  mark: Point,
  landmarks: Landmark[],
  reach = DEFAULT_POOL_REACH_M,
): Landmark | null {
  const foot = footOnLine(mark, cut.a, cut.b);
  const nearPool = (p: Point) => Math.hypot(p.x - mark.x, p.y - mark.y) <= reach + NEAR_M;
  const d = Math.atan2(cut.b.y - cut.a.y, cut.b.x - cut.a.x);
  let best: { l: Landmark; dist: number } | null = null;
  for (const l of landmarks) {
    const e = Math.atan2(l.b.y - l.a.y, l.b.x - l.a.x);
    const skew = Math.abs(Math.sin(d - e));
    if (!Number.isFinite(skew) || skew > Math.sin((PARALLEL_DEG * Math.PI) / 180)) continue;
    const onLine = nearestOnSegment(foot, l.a, l.b);
    const dist = Math.hypot(onLine.x - foot.x, onLine.y - foot.y);
    if (dist <= NEAR_M && nearPool(onLine) && (!best || dist < best.dist)) best = { l, dist };
  }
  if (best) return best.l;
  // A cut across a line's end: the onstage edge of a leg drawn as a short line across the stage. A line
  // parallel to the cut is not crossed by it (its end near the cut line is only the cut's extension).
  const len = Math.hypot(cut.b.x - cut.a.x, cut.b.y - cut.a.y);
  for (const l of landmarks) {
    if (Math.abs(Math.sin(d - Math.atan2(l.b.y - l.a.y, l.b.x - l.a.x))) <= Math.sin((PARALLEL_DEG * Math.PI) / 180))
      continue;
    for (const end of [l.a, l.b]) {
      if (!nearPool(end)) continue;
      const dist = Math.abs((cut.b.x - cut.a.x) * (cut.a.y - end.y) - (cut.a.x - end.x) * (cut.b.y - cut.a.y)) / len;
      if (dist <= NEAR_M && (!best || dist < best.dist)) best = { l, dist };
    }
  }
  return best?.l ?? null;
}

/** Where an unmatched cut line lies, with its own preposition: "at 3.20 m US of the setting line", "on the centre line". */
function lineWords(edge: DeckEdge, foot: Point, o: { units: Units; datumName: string }): string {
  if (edge === "downstage" || edge === "upstage") {
    const datum = withArticle(o.datumName || "setting line");
    const s = formatLength(Math.abs(foot.y), o.units);
    return Math.abs(foot.y) < 0.005 ? `on ${datum}` : `at ${s} ${foot.y > 0 ? "US" : "DS"} of ${datum}`;
  }
  const s = formatLength(Math.abs(foot.x), o.units);
  return Math.abs(foot.x) < 0.005 ? "on the centre line" : `at ${s} ${foot.x > 0 ? "SL" : "SR"} of CL`;
}

export function readCut(
  cut: CutInput,
  o: {
    mark: Point;
    panDeg: number | null;
    tiltDeg: number | null;
    family: string;
    landmarks: Landmark[];
    units: Units;
    datumName: string;
    /** Distance from the mark to the pool's farthest edge, so only landmarks near the pool are named. */
    poolReach?: number;
  },
): CutReading {
  const n = removedNormal(cut, o.mark);
  const deckEdge = deckEdgeOf(n);
  const landmark = matchLandmark(cut, o.mark, o.landmarks, o.poolReach);
  const words = landmark
    ? `${deckEdge} edge ${cutPreposition(landmark.name)} ${withArticle(landmark.name)}`
    : `${deckEdge} edge cut ${lineWords(deckEdge, footOnLine(o.mark, cut.a, cut.b), o)}`;
  const cutter = GATE_FAMILIES.has(o.family) ? "shutter" : "barn door";
  const straightDown = o.panDeg == null || o.tiltDeg == null || o.tiltDeg >= STRAIGHT_DOWN_DEG;
  const beamSide = straightDown ? null : beamSideOf(n, o.panDeg!);
  const physical = beamSide ? (cutter === "shutter" ? SHUTTER_FOR_BEAM_SIDE : BARN_DOOR_FOR_BEAM_SIDE)[beamSide] : null;
  const cutterWords = physical
    ? `${physical} ${cutter}`
    : `${cut.label} ${cutter} (as labelled: the beam points straight down)`;
  return {
    label: cut.label,
    deckEdge,
    beamSide,
    cutter,
    physical,
    landmark: landmark?.name ?? null,
    words,
    cutterWords,
  };
}

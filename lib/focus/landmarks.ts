// Named lines on the stage that shutter cuts are worded against ("off the lip", "to the leg").
// Landmarks drawn on the plot are stored with the production; in addition, the production's stage
// dimensions give the lines every venue has. Both arrive in the same plain shape.
import type { Point } from "@/lib/optics";
import { withArticle } from "@/lib/optics/beam-words";

// The article rule lives with the deck words in lib/optics; re-exported for the cut wording.
export { withArticle };

export type Landmark = { name: string; a: Point; b: Point };

/** The production's stage dimensions (plan metres) that the standard lines are derived from. */
export type StageDimensions = {
  datumName: string;
  prosceniumWidth: number;
  apronDepth: number;
  backWallY: number;
  stageWidth: number;
};

/** Lines derived from the stage outline: datum, lip, proscenium walls, centre line, back wall. */
export function outlineLandmarks(s: StageDimensions): Landmark[] {
  const half = s.prosceniumWidth / 2;
  const wide = Math.max(s.stageWidth, s.prosceniumWidth) / 2;
  return [
    { name: s.datumName || "setting line", a: { x: -wide, y: 0 }, b: { x: wide, y: 0 } },
    { name: "lip", a: { x: -wide, y: -s.apronDepth }, b: { x: wide, y: -s.apronDepth } },
    { name: "SR proscenium", a: { x: -half, y: -s.apronDepth }, b: { x: -half, y: s.backWallY } },
    { name: "SL proscenium", a: { x: half, y: -s.apronDepth }, b: { x: half, y: s.backWallY } },
    { name: "centre line", a: { x: 0, y: -s.apronDepth }, b: { x: 0, y: s.backWallY } },
    { name: "back wall", a: { x: -wide, y: s.backWallY }, b: { x: wide, y: s.backWallY } },
  ];
}

/**
 * Drawn landmarks first (they are more specific than the outline), then the outline's lines whose names
 * the drawn ones do not already use.
 */
export function mergeLandmarks(drawn: Landmark[] | null | undefined, outline: Landmark[]): Landmark[] {
  const list = (drawn ?? []).filter((l) => l && l.name && l.a && l.b);
  const taken = new Set(list.map((l) => l.name.trim().toLowerCase()));
  return [...list, ...outline.filter((l) => !taken.has(l.name.toLowerCase()))];
}

/**
 * "off" for lines light should stay off (a lip, a stage edge, a wall, a border), "to" for lines a cut
 * runs up to (a leg, the proscenium, the centre line). Crew usage, no published source.
 */
export function cutPreposition(name: string): "off" | "to" {
  return /\b(lip|edge|apron|wall|border|pit|cyc|drop|house)\b/i.test(name) ? "off" : "to";
}

/** The plot's stored landmarks (x1, y1, x2, y2 rows) in the shape cut wording uses. */
export function landmarksFromRows(
  rows: Array<{ name: string; x1: number; y1: number; x2: number; y2: number }>,
): Landmark[] {
  return rows.map((r) => ({ name: r.name, a: { x: r.x1, y: r.y1 }, b: { x: r.x2, y: r.y2 } }));
}

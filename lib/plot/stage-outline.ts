// The stage drawn from the production's settings, in plan metres. The datum line is y = 0; the
// proscenium opening sits on it, the apron runs downstage of it, the stage house upstage of it.
import type { Point } from "@/lib/optics";
import type { Bounds } from "./view";

export type StageSettings = {
  prosceniumWidth: number;
  stageWidth: number;
  stageDepth: number;
  apronDepth: number;
  backWallY: number;
  datumName: string;
};

export type StageOutline = {
  deck: Point[]; // the playing floor upstage of the datum
  apron: Point[]; // downstage of the datum, as wide as the opening
  prosceniumLeft: Point[]; // the wall each side of the opening, drawn as a thick band
  prosceniumRight: Point[];
  backWall: [Point, Point];
  centreLine: [Point, Point];
  datumLine: [Point, Point];
  datumName: string;
};

const WALL = 0.45; // drawn thickness of the proscenium wall, m (a typical masonry wall; only a drawing aid)

export function stageOutline(s: StageSettings): StageOutline {
  const hw = s.stageWidth / 2;
  const po = Math.min(s.prosceniumWidth, s.stageWidth) / 2;
  const back = Math.max(s.backWallY, 0.5);
  const deckBack = Math.min(s.stageDepth, back);
  return {
    deck: [
      { x: -hw, y: 0 },
      { x: hw, y: 0 },
      { x: hw, y: deckBack },
      { x: -hw, y: deckBack },
    ],
    apron:
      s.apronDepth > 0
        ? [
            { x: -po, y: 0 },
            { x: po, y: 0 },
            { x: po, y: -s.apronDepth },
            { x: -po, y: -s.apronDepth },
          ]
        : [],
    prosceniumLeft: [
      { x: po, y: 0 },
      { x: hw + WALL, y: 0 },
      { x: hw + WALL, y: -WALL },
      { x: po, y: -WALL },
    ],
    prosceniumRight: [
      { x: -po, y: 0 },
      { x: -hw - WALL, y: 0 },
      { x: -hw - WALL, y: -WALL },
      { x: -po, y: -WALL },
    ],
    backWall: [
      { x: -hw, y: back },
      { x: hw, y: back },
    ],
    centreLine: [
      { x: 0, y: -s.apronDepth - 1 },
      { x: 0, y: back },
    ],
    datumLine: [
      { x: -hw, y: 0 },
      { x: hw, y: 0 },
    ],
    datumName: s.datumName,
  };
}

/** What "fit to stage" frames: the stage house, apron and a little room for booms in the wings. */
export function stageBounds(s: StageSettings): Bounds {
  const hw = s.stageWidth / 2 + 1;
  return { minX: -hw, minY: -s.apronDepth - 1.5, maxX: hw, maxY: Math.max(s.backWallY, s.stageDepth) + 0.5 };
}

/** Bounds of everything: the stage plus any points given (positions out front, booms in the wings). */
export function extendBounds(b: Bounds, points: Point[]): Bounds {
  const out = { ...b };
  for (const p of points) {
    out.minX = Math.min(out.minX, p.x);
    out.maxX = Math.max(out.maxX, p.x);
    out.minY = Math.min(out.minY, p.y);
    out.maxY = Math.max(out.maxY, p.y);
  }
  return out;
}

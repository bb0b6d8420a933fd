import type { Ellipse } from "./pool";
import { clipHalfPlane } from "./polygon";
import { cross2, DEG, type Point } from "./vector";

export type CutLine = { a: Point; b: Point };

/** The design allows up to four shutter cuts per fixture (top, bottom, left, right). */
export const MAX_CUTS = 4;

/** Points around an ellipse, counter-clockwise; 96 looks smooth at any size a plot shows. */
export function ellipseToPolygon(e: Ellipse, n = 96): Point[] {
  if (!Number.isInteger(n) || n < 3) throw new RangeError(`An ellipse needs at least 3 points (got ${n}).`);
  const r = e.rotationDeg * DEG;
  const c = Math.cos(r);
  const s = Math.sin(r);
  const pts: Point[] = [];
  for (let k = 0; k < n; k++) {
    const t = (2 * Math.PI * k) / n;
    const u = e.semiMajor * Math.cos(t);
    const v = e.semiMinor * Math.sin(t);
    pts.push({ x: e.centre.x + u * c - v * s, y: e.centre.y + u * s + v * c });
  }
  return pts;
}

function isEllipse(s: Ellipse | Point[]): s is Ellipse {
  return !Array.isArray(s);
}

/**
 * The pool clipped by shutter cuts drawn in plan, keeping for each cut the side that holds keepPoint (the
 * focus mark). A mark lying on a cut line leaves the side undecidable, so that is an error, not a guess.
 * Returns [] when nothing of the pool is left.
 */
export function clipPoolByCuts(shape: Ellipse | Point[], cuts: CutLine[], keepPoint: Point): Point[] {
  if (cuts.length > MAX_CUTS) {
    throw new RangeError(`A fixture has at most ${MAX_CUTS} shutter cuts (got ${cuts.length}).`);
  }
  let poly = isEllipse(shape) ? ellipseToPolygon(shape) : shape.slice();
  cuts.forEach((cut, n) => {
    const len = Math.hypot(cut.b.x - cut.a.x, cut.b.y - cut.a.y);
    if (!(len > 1e-9)) throw new RangeError(`Shutter cut ${n + 1} needs two different points.`);
    const side = cross2(cut.a, cut.b, keepPoint) / len;
    if (!Number.isFinite(side)) throw new RangeError(`Shutter cut ${n + 1} has a point that is not a number.`);
    if (Math.abs(side) < 1e-9) {
      throw new RangeError(`The focus mark lies on shutter cut ${n + 1}, so the side to keep is unclear.`);
    }
    if (poly.length > 0) poly = clipHalfPlane(poly, cut.a, cut.b, Math.sign(side));
  });
  return poly.length >= 3 ? poly : [];
}

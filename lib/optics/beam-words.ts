import { axisOf } from "./aim";
import { beamAngles } from "./validate";
import { formatLength, type Units } from "./units";
import { DEG, type Point, type Vec3 } from "./vector";

/** Magnitude as displayed, or null when it displays as zero ("on" the line). */
function shown(v: number, units: Units): string | null {
  const s = formatLength(Math.abs(v), units);
  return /[1-9]/.test(s) ? s : null;
}

/**
 * A line's name with "the" in front ("the setting line"), unless it already starts with an article or a
 * number. One wording for the datum everywhere on a chart, as the design's example: "US of the setting line".
 */
export function withArticle(name: string): string {
  const n = name.trim();
  return /^(the|a|an)\s/i.test(n) || /^\d/.test(n) ? n : `the ${n}`;
}

/**
 * A plan point in deck words: "1.20 m SL of CL, 2.50 m US of the setting line". x > 0 is stage left, y > 0
 * upstage. The datum's name takes "the" unless it already has an article.
 */
export function describePoint(p: Point, o: { units: Units; datumName?: string }): string {
  if (!Number.isFinite(p.x) || !Number.isFinite(p.y)) throw new RangeError("A point needs finite x and y.");
  const datum = withArticle(o.datumName?.trim() || "setting line");
  const sx = shown(p.x, o.units);
  const sy = shown(p.y, o.units);
  const across = sx ? `${sx} ${p.x > 0 ? "SL" : "SR"} of CL` : "on CL";
  const depth = sy ? `${sy} ${p.y > 0 ? "US" : "DS"} of ${datum}` : `on ${datum}`;
  return `${across}, ${depth}`;
}

/** Below this angle off the centre line a beam reads as straight from the front or back (house convention). */
export const STRAIGHT_DEG = 15;
/** Above this, straight from the side. */
export const SIDE_DEG = 75;

/**
 * Where the light on a mark comes from: "from DSR, 25° off the centre line, 40° down". The words name the
 * lens's side of the mark: a lens downstage and stage right of the mark (smaller y, smaller x) is DSR.
 */
export function describeBeam(source: Vec3, focus: Vec3): string {
  const axis = axisOf(source, focus);
  const dx = source.x - focus.x;
  const dy = source.y - focus.y;
  const plan = Math.hypot(dx, dy);
  const elevation = Math.round(Math.abs(90 - axis.phi / DEG));
  const updown = axis.phi <= Math.PI / 2 ? "down" : "up";
  if (plan < 1e-9) return `from directly ${updown === "down" ? "above" : "below"}, ${elevation}° ${updown}`;
  // Classified on the rounded angle, so the words never disagree with the number printed beside them.
  const off = Math.round(Math.atan2(Math.abs(dx), Math.abs(dy)) / DEG);
  const fb = dy < 0 ? "DS" : "US";
  const side = dx < 0 ? "SR" : "SL";
  const where = off < STRAIGHT_DEG ? fb : off > SIDE_DEG ? side : `${fb[0]}${side}`;
  return `from ${where}, ${off}° off the centre line, ${elevation}° ${updown}`;
}

export type EdgeWord = "sharp" | "soft" | "very soft";

/**
 * The edge as a word, from softness as a share of the cone: under 10 % sharp, under 30 % soft, else very soft.
 * The thresholds are a house convention, not from a published source.
 */
export function edgeWord(coneDeg: number, softnessDeg: number): EdgeWord {
  const ratio = beamAngles(coneDeg, softnessDeg).softnessDeg / coneDeg;
  return ratio < 0.1 ? "sharp" : ratio < 0.3 ? "soft" : "very soft";
}

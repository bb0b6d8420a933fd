// Defaults as a person working in the production's units would pick them. A metric default converted
// to feet lands on odd figures (10 m is 32' 9 1/2", 1.7 m is 5' 7"); an imperial production starts from
// round ones instead: whole feet from 10 ft up, half feet below (common practice, no source).
import { METRES_PER_FOOT, type Units } from "./units";

/** The round length nearest to `metres` in the production's units (metric defaults are already round). */
export function roundDefaultLength(metres: number, units: Units): number {
  if (units === "metric") return metres;
  const feet = metres / METRES_PER_FOOT;
  const step = feet >= 10 ? 1 : 0.5;
  return Math.round(feet / step) * step * METRES_PER_FOOT;
}

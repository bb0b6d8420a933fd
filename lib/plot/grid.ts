// Grid spacing and the scale bar in the production's units: round numbers of metres, or of feet.
import { METRES_PER_FOOT, type Units } from "@/lib/optics";

const METRIC_STEPS = [0.05, 0.1, 0.25, 0.5, 1, 2, 5, 10, 20, 50];
const IMPERIAL_STEPS_FT = [0.25, 0.5, 1, 2, 5, 10, 20, 50, 100];

/** The smallest round step (in metres) whose lines are at least `minPx` apart on screen. */
export function gridStep(pxPerMetre: number, units: Units, minPx = 28): number {
  const steps = units === "metric" ? METRIC_STEPS : IMPERIAL_STEPS_FT.map((f) => f * METRES_PER_FOOT);
  return steps.find((s) => s * pxPerMetre >= minPx) ?? steps[steps.length - 1];
}

/** Grid lines (plan coordinates) that cross [min, max], every `step`, anchored at the datum (0). */
export function gridLines(min: number, max: number, step: number, limit = 400): number[] {
  const first = Math.ceil(min / step);
  const last = Math.floor(max / step);
  if (last - first > limit) return [];
  const out: number[] = [];
  for (let i = first; i <= last; i++) out.push(i * step);
  return out;
}

/** A scale bar of a round length close to `targetPx` wide, labelled in the production's units. */
export function scaleBar(
  pxPerMetre: number,
  units: Units,
  targetPx = 120,
): { metres: number; px: number; label: string } {
  const candidates =
    units === "metric"
      ? [0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50, 100]
      : [1, 2, 5, 10, 20, 50, 100, 200].map((f) => f * METRES_PER_FOOT);
  let best = candidates[0];
  for (const c of candidates) if (c * pxPerMetre <= targetPx) best = c;
  const label =
    units === "metric"
      ? best < 1
        ? `${Math.round(best * 100)} cm`
        : `${best} m`
      : `${Math.round(best / METRES_PER_FOOT)} ft`;
  return { metres: best, px: best * pxPerMetre, label };
}

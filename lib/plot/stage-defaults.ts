// What a new production's stage looks like before anyone measures the venue, and the trims a new
// position starts at: one list of metric figures, rounded for an imperial production so its first
// screens read 33' 0" and 5' 6", not 32' 9 1/2" and 5' 7". The supply voltage is not here: it
// follows the electrical code chosen with the checks, never the display units.
import { roundDefaultLength } from "@/lib/optics/round-length";
import type { Units } from "@/lib/optics";

/** Metric defaults of the stage outline (the same figures as the productions table's column defaults). */
const STAGE_METRES = {
  headHeight: 1.7,
  faceHeight: 1.55,
  backWallY: 10,
  prosceniumWidth: 10,
  prosceniumHeight: 6,
  stageWidth: 16,
  stageDepth: 10,
  apronDepth: 1.5,
} as const;

export type StageDefaults = { [K in keyof typeof STAGE_METRES]: number };

export function stageDefaultsFor(units: Units): StageDefaults {
  return Object.fromEntries(
    Object.entries(STAGE_METRES).map(([k, m]) => [k, roundDefaultLength(m, units)]),
  ) as StageDefaults;
}

/** The trim a new position starts at: an overhead line, or the top of a boom or ladder. */
export function defaultTrimFor(units: Units, vertical: boolean): number {
  return roundDefaultLength(vertical ? 4 : 7, units);
}

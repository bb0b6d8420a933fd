// "What lights this spot?": each lit unit's share of the light on one point of the stage, largest first.
import { illuminanceAt, type LitBeam, type Vec3 } from "@/lib/optics";

export type SpotSource = { fixtureId: number; label: string; channel: number | null; beam: LitBeam };
export type SpotContribution = { fixtureId: number; label: string; channel: number | null; lux: number; share: number };

/** Below this a unit does not visibly reach the point (a thousandth of a lux). */
const REACHES_LUX = 1e-3;

/**
 * Lux each unit gives on a horizontal surface at `point` (lib/optics' beam model), units that reach it only,
 * ranked by their contribution; `share` is the fraction of the total. Ties keep the units' given order.
 */
export function rankSpotContributions(
  point: Vec3,
  sources: SpotSource[],
): { total: number; contributions: SpotContribution[] } {
  const lit = sources.map((s, i) => ({ s, i, lux: illuminanceAt(point, [s.beam]) })).filter((c) => c.lux > REACHES_LUX);
  const total = lit.reduce((sum, c) => sum + c.lux, 0);
  lit.sort((a, b) => b.lux - a.lux || a.i - b.i);
  return {
    total,
    contributions: lit.map(({ s, lux }) => ({
      fixtureId: s.fixtureId,
      label: s.label,
      channel: s.channel,
      lux,
      share: total > 0 ? lux / total : 0,
    })),
  };
}

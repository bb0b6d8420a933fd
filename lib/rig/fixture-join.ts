// A fixture joined to its position, type and focus point: their names, and its beam worked out from all
// four. One join for the API's fixtures (lib/data/fixtures.ts) and the plot's slim payload, which the
// browser expands (lib/plot/slim-fixtures.ts), so both show the same names and the same pools.
import type { FixtureJoined } from "@/lib/dto/fixture";
import { computeFixtureGeometry, type FixtureAim, type GeometryInput } from "./fixture-geometry";

type JoinPosition = GeometryInput["position"] & { id: number; name: string };
type JoinType = GeometryInput["type"] & { id: number; name: string; family: string };
type JoinPoint = { id: number; name: string; x: number; y: number };
export type JoinRecord = FixtureAim & { positionId: number; fixtureTypeId: number; focusPointId: number | null };

// The columns the join reads from each related row, for reads that fetch only these (the type's DMX
// modes and photometric data, for one, are not needed to name a unit or work out its pool).
export const JOIN_POSITION_KEYS = ["id", "name", "trimHeight"] as const satisfies ReadonlyArray<keyof JoinPosition>;
export const JOIN_TYPE_KEYS = [
  "id",
  "name",
  "family",
  "coneMinDeg",
  "coneMaxDeg",
  "defaultSoftnessDeg",
  "lensDropM",
  "mounting",
  "lensRiseM",
] as const satisfies ReadonlyArray<keyof JoinType>;
export const JOIN_POINT_KEYS = ["id", "name", "x", "y"] as const satisfies ReadonlyArray<keyof JoinPoint>;

/**
 * Builds the join for one production's rows; it answers null for a fixture whose position or type is
 * not among them (a row read while its position was being deleted), so callers leave it out.
 */
export function fixtureJoiner(
  rel: { positions: Iterable<JoinPosition>; types: Iterable<JoinType>; points: Iterable<JoinPoint> },
  headHeight: number,
) {
  const positions = new Map([...rel.positions].map((p) => [p.id, p]));
  const types = new Map([...rel.types].map((t) => [t.id, t]));
  const points = new Map([...rel.points].map((p) => [p.id, p]));
  return <R extends JoinRecord>(r: R): (R & FixtureJoined) | null => {
    const position = positions.get(r.positionId);
    const type = types.get(r.fixtureTypeId);
    if (!position || !type) return null;
    const point = r.focusPointId ? (points.get(r.focusPointId) ?? null) : null;
    return {
      ...r,
      positionName: position.name,
      typeName: type.name,
      family: type.family,
      focusPointName: point?.name ?? null,
      computed: computeFixtureGeometry({ ...r, focusPoint: point, position, type }, headHeight),
    };
  };
}

/** Every record that joins, in the order given. */
export function joinFixtures<R extends JoinRecord>(
  records: readonly R[],
  join: (r: R) => (R & FixtureJoined) | null,
): Array<R & FixtureJoined> {
  const out: Array<R & FixtureJoined> = [];
  for (const r of records) {
    const joined = join(r);
    if (joined) out.push(joined);
  }
  return out;
}

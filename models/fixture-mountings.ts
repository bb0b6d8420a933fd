/**
 * How a fixture type is mounted, which decides where its lens sits against its position's trim. The
 * database's enum and the model are built from this list; lib/rig/mounting.ts adds the words people see.
 */
export const FIXTURE_MOUNTINGS = ["under-hung", "over-hung", "side-arm", "floor"] as const;
export type FixtureMounting = (typeof FIXTURE_MOUNTINGS)[number];

export function isFixtureMounting(value: unknown): value is FixtureMounting {
  return typeof value === "string" && (FIXTURE_MOUNTINGS as readonly string[]).includes(value);
}

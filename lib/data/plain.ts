import "server-only";
// Model rows become plain objects before they leave the data layer: the same shape then serves a
// Server Component, a JSON reply and the change log, and dates travel as ISO strings.

export const iso = (d: Date | string | null | undefined) => (d == null ? null : new Date(d).toISOString());

/** A Date field becomes its ISO string (nullable stays nullable); everything else keeps its type. */
// Brackets keep the check from distributing over a union (number | null must stay number | null).
export type Plain<T> = [T] extends [Date]
  ? string
  : [T] extends [Date | null | undefined]
    ? [T] extends [Date | undefined]
      ? string
      : string | null
    : T;
export type PlainPick<T, K extends keyof T> = { [P in K]: Plain<T[P]> };

/** The listed fields of a row (a model instance or a raw row), dates as ISO strings. */
export function plain<T extends object, const K extends keyof T>(row: T, keys: readonly K[]): PlainPick<T, K> {
  const out = {} as Record<K, unknown>;
  for (const k of keys) {
    const v = row[k];
    out[k] = v instanceof Date ? v.toISOString() : v === undefined ? null : v;
  }
  return out as PlainPick<T, K>;
}

// Unit numbers are text sorted naturally (7, 7A, 8, 12A, 12B … 12D), so a unit added later
// never forces a position to be renumbered.

const PAD = 6;

/** A key that sorts like the unit numbers should when compared as plain strings (as the database does). */
export function unitSortKey(unit: string): string {
  return unit
    .trim()
    .toUpperCase()
    .replace(/\d+/g, (digits) => digits.replace(/^0+(?=\d)/, "").padStart(PAD, "0"));
}

export function compareUnitNumbers(a: string, b: string): number {
  const ka = unitSortKey(a);
  const kb = unitSortKey(b);
  return ka < kb ? -1 : ka > kb ? 1 : 0;
}

export const UNIT_NUMBER_PATTERN = /^[0-9]{1,4}[A-Za-z]{0,2}$/;

// The one rule for ids that arrive as text (URL segments, query strings, form fields): a plain
// positive decimal integer with no sign, spaces, leading zeros, exponent or "0x" prefix, small
// enough for the database. One spelling per row, so "007", "7.0" and "0x7" never alias row 7.
import { z } from "zod";

const PLAIN_DIGITS = /^[1-9]\d{0,9}$/;
/** The largest value the database's signed INT columns hold (ids and versions). */
export const MAX_ID = 2_147_483_647;

/** The id a text stands for, or null when it is not a plain positive decimal integer. */
export function toId(raw: unknown): number | null {
  if (typeof raw !== "string" || !PLAIN_DIGITS.test(raw)) return null;
  const id = Number(raw);
  return id <= MAX_ID ? id : null;
}

/** The same rule as a zod schema for text fields (query strings, form data); `missing` says what is wanted. */
export const plainCountText = (missing: string) =>
  z.string({ error: missing }).transform((raw, ctx) => {
    const n = toId(raw);
    if (n === null) {
      ctx.addIssue({ code: "custom", message: `${missing}: a whole number above 0, in plain digits` });
      return z.NEVER;
    }
    return n;
  });

// Cue numbers: positive decimals with up to three places (the database column is DECIMAL(10,3)).
// Inside the code a number is compared as integer thousandths ("milli") so that 12.1 + 0.2 style
// float noise can never make two cues collide or sort wrongly.

export const MAX_CUE_NUMBER = 9_999_999.999;

/** Integer thousandths of a cue number: the key used for equality and sorting. */
export function cueKey(n: number): number {
  return Math.round(n * 1000);
}

export function compareCueNumbers(a: number, b: number): number {
  return cueKey(a) - cueKey(b);
}

/** Reads a typed cue number such as `12`, `12.5` or `0.25`; throws a RangeError with a readable message. */
export function parseCueNumber(text: string): number {
  const t = String(text).trim();
  if (!/^\d{1,7}(\.\d{0,3})?$|^\.\d{1,3}$/.test(t)) {
    throw new RangeError(`"${t}" is not a cue number: use digits with up to three decimals, such as 12 or 12.5`);
  }
  const n = Number(t);
  if (!(n > 0)) throw new RangeError("A cue number must be more than 0");
  return cueKey(n) / 1000;
}

/** 12 → "12", 12.5 → "12.5", 12.250 → "12.25". */
export function formatCueNumber(n: number): string {
  const milli = cueKey(n);
  const whole = Math.trunc(milli / 1000);
  const frac = Math.abs(milli % 1000);
  return frac === 0 ? String(whole) : `${whole}.${String(frac).padStart(3, "0").replace(/0+$/, "")}`;
}

/**
 * The roundest number strictly between two cues, for inserting a point cue: between 5 and 8 it is 6,
 * between 5 and 6 it is 5.5, between 5.5 and 6 it is 5.6 … and null when there is no room left
 * (they differ by 0.001). With no cue after, the next whole number.
 */
export function numberBetween(before: number | null, after: number | null): number | null {
  const lo = before == null ? 0 : cueKey(before);
  const hi = after == null ? Infinity : cueKey(after);
  if (hi - lo <= 1) return null;
  for (const step of [1000, 500, 100, 50, 10, 5, 1]) {
    const candidate = Math.floor(lo / step) * step + step;
    if (candidate < hi && candidate > lo) return candidate / 1000;
  }
  return null;
}

export type RenumberPlan = { moves: Array<{ id: number; from: number; to: number }> };

/**
 * New numbers for the cues numbered from..to (inclusive): start, start+step, … in their present
 * order. Refuses (RangeError) when a new number would land on a cue outside the range or go past
 * the cue that follows the range, since that would change the running order.
 */
export function planRenumber(
  cues: ReadonlyArray<{ id: number; number: number }>,
  range: { from: number; to: number; start: number; step: number },
): RenumberPlan {
  const { from, to, start, step } = range;
  if (!(step > 0)) throw new RangeError("The step must be more than 0");
  if (compareCueNumbers(from, to) > 0) throw new RangeError("The first cue of the range comes after the last");
  const sorted = [...cues].sort((a, b) => compareCueNumbers(a.number, b.number));
  const inside = sorted.filter((c) => cueKey(c.number) >= cueKey(from) && cueKey(c.number) <= cueKey(to));
  if (!inside.length) throw new RangeError(`No cues between ${formatCueNumber(from)} and ${formatCueNumber(to)}`);
  const moves = inside.map((c, i) => ({ id: c.id, from: c.number, to: (cueKey(start) + i * cueKey(step)) / 1000 }));
  const last = moves[moves.length - 1].to;
  if (cueKey(moves[0].to) <= 0 || last > MAX_CUE_NUMBER)
    throw new RangeError("The new numbers must stay between 0.001 and 9999999.999");
  const prev = sorted.filter((c) => cueKey(c.number) < cueKey(from)).at(-1);
  const next = sorted.find((c) => cueKey(c.number) > cueKey(to));
  if (prev && cueKey(moves[0].to) <= cueKey(prev.number)) {
    throw new RangeError(
      `The new numbers would start at or before cue ${formatCueNumber(prev.number)}, which comes before the range`,
    );
  }
  if (next && cueKey(last) >= cueKey(next.number)) {
    throw new RangeError(
      `The new numbers would reach cue ${formatCueNumber(next.number)}, which follows the range (last new number ${formatCueNumber(last)})`,
    );
  }
  return { moves };
}

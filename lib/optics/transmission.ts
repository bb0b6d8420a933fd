import { assertFinite } from "./validate";

/**
 * A production's colour list: the colour text exactly as the team types it in the rig → transmission in
 * percent (0–100). The whole field is looked up first ("pale lavender + light frost" may have its own
 * measured figure); failing that, a field of filters joined by "+" is the product of its parts, as stacked
 * filters multiply (Beer–Lambert for thin filters, common practice, no source). Anything unknown counts at
 * 100 % and is reported, never silently.
 */
export type ColourList = ReadonlyMap<string, number>;

export type Transmission = {
  /** Multiplier 0..1 on the unit's output. */
  factor: number;
  /** Colour texts with no transmission set (counted at 100 %). Empty when all were found. */
  missing: string[];
};

/** Words for an empty frame: no filter, nothing to look up. */
const OPEN_FRAME = new Set(["", "n/c", "nc", "no colour", "no color", "open", "none", "o/w", "-", "clear"]);

export function percentToFactor(percent: number): number {
  assertFinite("Transmission", percent);
  if (percent < 0 || percent > 100) throw new RangeError(`Transmission must be between 0 and 100 % (got ${percent}).`);
  return percent / 100;
}

export function transmissionOf(colour: string | null | undefined, list: ColourList): Transmission {
  const text = (colour ?? "").trim();
  if (OPEN_FRAME.has(text.toLowerCase())) return { factor: 1, missing: [] };
  const whole = list.get(text);
  if (whole !== undefined) return { factor: percentToFactor(whole), missing: [] };
  const parts = text
    .split("+")
    .map((p) => p.trim())
    .filter((p) => !OPEN_FRAME.has(p.toLowerCase()));
  if (parts.length < 2) return { factor: 1, missing: [text] };
  let factor = 1;
  const missing: string[] = [];
  for (const part of parts) {
    const pct = list.get(part);
    if (pct === undefined) missing.push(part);
    else factor *= percentToFactor(pct);
  }
  return { factor, missing };
}

import type { Family } from "./profile";
import { assertFinite } from "./validate";

/**
 * How a channel's level (0..1) becomes light (0..1 of the unit's full output), per type family.
 *
 * - linear: LED sources and discharge units dimmed mechanically put out light in proportion to the level
 *   (their own firmware curve is taken as linear; common practice, no source).
 * - tungsten: light rises much faster than the level. From memory, not from a published table: with a
 *   dimmer whose output voltage follows the level, a tungsten-halogen lamp gives lumens ∝ V^3.4 (the classic
 *   lamp law), and the usual theatre dimmer curves soften that; Throwline uses light = level^2.3 as a middle
 *   value. The filament also warms as it dims: colour temperature ∝ V^0.42 (lamp law, from memory), so a
 *   3200 K lamp sits near 2700 K at a quarter of its light.
 */
export type DimmerCurve = "linear" | "tungsten";

/** Exponent of the tungsten curve (from memory, see above). */
export const TUNGSTEN_EXPONENT = 2.3;
/** Lamp-law exponents (from memory): lumens ∝ V^3.4, colour temperature ∝ V^0.42. */
export const LAMP_LUMEN_EXPONENT = 3.4;
export const LAMP_CCT_EXPONENT = 0.42;

const CURVE_OF: Record<Family, DimmerCurve> = {
  profile: "tungsten",
  fresnel: "tungsten",
  par: "tungsten",
  cyc: "tungsten",
  wash: "linear",
  "led-wash": "linear",
  followspot: "linear",
};

export const DIMMER_CURVE_WORDS: Record<DimmerCurve, string> = {
  linear: "linear: light follows the level (LED, discharge)",
  tungsten: `tungsten: light ∝ level^${TUNGSTEN_EXPONENT} (from memory), warming as it dims`,
};

export function dimmerCurveOf(family: Family): DimmerCurve {
  const curve = CURVE_OF[family];
  if (!curve) throw new RangeError(`Unknown fixture family "${String(family)}".`);
  return curve;
}

/** Fraction of full output at a level of 0..1. */
export function lightFromLevel(level: number, curve: DimmerCurve): number {
  assertFinite("Level", level);
  if (level < 0 || level > 1) throw new RangeError(`Level must be between 0 and 1 (got ${level}).`);
  return curve === "linear" ? level : level ** TUNGSTEN_EXPONENT;
}

/**
 * A tungsten lamp's colour temperature at a level, from its full-output temperature: the voltage that gives
 * this much light under the lamp law, then CCT ∝ V^0.42. From memory; a guide to the warming, not a measurement.
 */
export function tungstenColourTemperature(level: number, fullKelvin = 3200): number {
  const light = lightFromLevel(level, "tungsten");
  if (light === 0) return 0;
  const voltage = light ** (1 / LAMP_LUMEN_EXPONENT);
  return fullKelvin * voltage ** LAMP_CCT_EXPONENT;
}

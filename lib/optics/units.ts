/** 1 ft = 0.3048 m and 1 in = 25.4 mm exactly (international yard and pound, 1959; NIST SP 811). */
export const METRES_PER_FOOT = 0.3048;
export const METRES_PER_INCH = 0.0254;
/** 1 fc = 1 lm/ft² = 1/0.09290304 lx (derived from the foot). */
export const LUX_PER_FOOTCANDLE = 1 / 0.09290304;

export type Units = "metric" | "imperial";

const NUM = String.raw`(\d+(?:\.\d+)?|\.\d+)`;
const FEET = String.raw`(?:'|ft|foot|feet)`;
const INCH = String.raw`(?:"|in|inch|inches)`;
const METRIC: Record<string, number> = {
  m: 1,
  metre: 1,
  metres: 1,
  meter: 1,
  meters: 1,
  cm: 0.01,
  centimetre: 0.01,
  centimetres: 0.01,
  centimeter: 0.01,
  centimeters: 0.01,
  mm: 0.001,
  millimetre: 0.001,
  millimetres: 0.001,
  millimeter: 0.001,
  millimeters: 0.001,
};
// Inches: a whole or decimal number, optionally with a fraction ("6 1/2", or "6-1/2" as paperwork often
// writes it), or a fraction alone ("1/2").
const INCHES = String.raw`(?:${NUM}(?:(?:\s+|\s*-\s*)(\d+)\/(\d+))?|(\d+)\/(\d+))`;
const RE_PLAIN = new RegExp(String.raw`^${NUM}$`);
const RE_METRIC = new RegExp(String.raw`^${NUM}\s*([a-z]+)$`);
const RE_FEET = new RegExp(String.raw`^${NUM}\s*${FEET}$`);
const RE_FEET_INCHES = new RegExp(String.raw`^(\d+)\s*${FEET}\s*(?:-\s*)?${INCHES}\s*${INCH}?$`);
const RE_INCHES = new RegExp(String.raw`^${INCHES}\s*${INCH}$`);

const HINT = `Try 3.2, 3.2 m, 320 cm, 10' 6", 10' 6 1/2", 10ft 6in or 126".`;

function fail(text: string, why: string): never {
  throw new RangeError(`Cannot read "${text}" as a length: ${why}. ${HINT}`);
}

/** Inches from the INCHES groups: [whole, num, den, fracNum, fracDen]. */
function inchesOf(text: string, g: (string | undefined)[]): number {
  const [whole, n, d, fn, fd] = g;
  if (fn !== undefined && fd !== undefined) {
    if (Number(fd) === 0) fail(text, `the fraction ${fn}/${fd} divides by zero`);
    // 3/2" is most likely a slip for 1 1/2" or 3 1/2": refuse it rather than guess, as in a mixed number.
    if (Number(fn) >= Number(fd))
      fail(text, `the fraction ${fn}/${fd} of an inch must be less than one (write 1 1/2", not 3/2")`);
    return Number(fn) / Number(fd);
  }
  let v = Number(whole);
  if (n !== undefined && d !== undefined) {
    if (Number(d) === 0) fail(text, `the fraction ${n}/${d} divides by zero`);
    if (Number(n) >= Number(d)) fail(text, `the fraction ${n}/${d} in a mixed number must be less than one`);
    if (whole!.includes(".")) fail(text, "a decimal number cannot take a fraction too");
    v += Number(n) / Number(d);
  }
  return v;
}

/**
 * A length typed by a person, in metres. A bare number takes defaultUnit. Inches after feet must be under 12
 * (10' 13" is more likely a typo than a length); inches alone may be any size (126").
 */
export function parseLength(text: string, defaultUnit: "m" | "ft"): number {
  if (typeof text !== "string") throw new RangeError(`Cannot read ${String(text)} as a length: it is not text.`);
  const norm = text
    .trim()
    .toLowerCase()
    .replace(/[′’]/g, "'")
    .replace(/[″”]|''/g, '"')
    .replace(/−/g, "-");
  if (norm === "") fail(text, "it is empty");
  const sign = norm.startsWith("-") ? -1 : 1;
  const body = norm.replace(/^[-+]\s*/, "");
  let m: RegExpMatchArray | null;
  let metres: number;
  if ((m = body.match(RE_PLAIN))) {
    metres = Number(m[1]) * (defaultUnit === "ft" ? METRES_PER_FOOT : 1);
  } else if ((m = body.match(RE_FEET))) {
    metres = Number(m[1]) * METRES_PER_FOOT;
  } else if ((m = body.match(RE_FEET_INCHES))) {
    const inches = inchesOf(text, m.slice(2, 7));
    if (inches >= 12) fail(text, "inches after feet must be less than 12");
    metres = Number(m[1]) * METRES_PER_FOOT + inches * METRES_PER_INCH;
  } else if ((m = body.match(RE_INCHES))) {
    metres = inchesOf(text, m.slice(1, 6)) * METRES_PER_INCH;
  } else if ((m = body.match(RE_METRIC)) && METRIC[m[2]] !== undefined) {
    metres = Number(m[1]) * METRIC[m[2]];
  } else {
    fail(text, "it is not a number with a unit we know");
  }
  if (!Number.isFinite(metres)) fail(text, "it is too large");
  return sign * metres + 0; // + 0 turns -0 into 0
}

/** Metric to two decimals ("3.20 m"); imperial to the nearest half inch in the ASCII form 10' 6 1/2". */
export function formatLength(metres: number, units: Units, opts: { decimals?: 1 | 2 } = {}): string {
  if (!Number.isFinite(metres)) throw new RangeError(`Cannot show ${metres} as a length.`);
  if (units === "metric") {
    const s = metres.toFixed(opts.decimals ?? 2);
    return `${/^-0\.0+$/.test(s) ? s.slice(1) : s} m`;
  }
  const halves = Math.round((Math.abs(metres) / METRES_PER_INCH) * 2);
  if (halves === 0) return `0' 0"`;
  const feet = Math.floor(halves / 24);
  const rest = halves - feet * 24;
  const inches = Math.floor(rest / 2);
  return `${metres < 0 ? "-" : ""}${feet}' ${inches}${rest % 2 ? " 1/2" : ""}"`;
}

/** An angle typed by a person, in degrees: 25, 25°, 25 deg, -10 degrees. */
export function parseAngle(text: string): number {
  const norm = typeof text === "string" ? text.trim().toLowerCase().replace(/−/g, "-") : "";
  const m = norm.match(new RegExp(String.raw`^([-+])?\s*${NUM}\s*(?:°|º|deg|degs|degree|degrees)?$`));
  if (!m) throw new RangeError(`Cannot read "${String(text)}" as an angle. Try 25, 25° or 25 deg.`);
  return (m[1] === "-" ? -1 : 1) * Number(m[2]) + 0;
}

export function luxToFootcandles(lux: number): number {
  return lux * 0.09290304;
}

export function footcandlesToLux(fc: number): number {
  return fc / 0.09290304;
}

/** Whole numbers from 100 up, one decimal below: enough to compare two readings on a plot. */
function roundTo(v: number): string {
  return Math.abs(v) >= 100 ? Math.round(v).toString() : v.toFixed(1);
}

/** "400 lx" in metric; "400 lx (37.2 fc)" in imperial, as the design shows both there. */
export function formatIlluminance(lux: number, units: Units): string {
  if (!Number.isFinite(lux)) throw new RangeError(`Cannot show ${lux} as an illuminance.`);
  const lx = `${roundTo(lux)} lx`;
  return units === "imperial" ? `${lx} (${roundTo(luxToFootcandles(lux))} fc)` : lx;
}

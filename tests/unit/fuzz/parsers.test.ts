// Property tests over the text parsers people type into: whatever the text, each parser returns a
// finite number or throws its documented RangeError with a readable message (never a TypeError, never
// NaN); and what the formatter writes, the parser reads back.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatLength, METRES_PER_INCH, parseAngle, parseLength } from "@/lib/optics";
import { formatFadeTime, MAX_FADE_SECONDS, parseFadeTime, parseSplitTime } from "@/lib/cues/fade-time";
import { formatCueNumber, MAX_CUE_NUMBER, parseCueNumber } from "@/lib/cues/cue-number";

const RUNS = 3000;

// Text near the grammar: digits, units, feet/inch marks (ASCII and typographic), fractions, signs and spaces,
// so the generator reaches the parsers' branches instead of failing at the first character.
const PIECES = [
  "0",
  "1",
  "7",
  "12",
  "3.5",
  ".5",
  "1/2",
  "3/2",
  "0/0",
  "-",
  "+",
  " ",
  "  ",
  "'",
  '"',
  "′",
  "″",
  "’",
  "”",
  "''",
  "ft",
  "feet",
  "in",
  "inch",
  "m",
  "cm",
  "mm",
  "metres",
  "km",
  "°",
  "º",
  "deg",
  "degrees",
  ":",
  "::",
  "/",
  "e5",
  "1e400",
  "99999999999999999999",
  "−",
  "\t",
  "\u00a0",
  "x",
  "NaN",
  "Infinity",
];
const nearGrammar = fc.array(fc.constantFrom(...PIECES), { maxLength: 8 }).map((p) => p.join(""));
const anyText = fc.oneof(nearGrammar, fc.string({ maxLength: 30 }), fc.string({ unit: "grapheme", maxLength: 20 }));

/** Calls `parse`; a throw must be the documented RangeError with a message, a result a finite number. */
function returnsNumberOrRangeError(parse: (t: string) => number | { up: number; down: number | null }, text: string) {
  let out: ReturnType<typeof parse>;
  try {
    out = parse(text);
  } catch (err) {
    expect(err).toBeInstanceOf(RangeError);
    expect((err as Error).message.length).toBeGreaterThan(10);
    return;
  }
  for (const v of typeof out === "number" ? [out] : [out.up, out.down ?? 0]) expect(Number.isFinite(v)).toBe(true);
}

describe("length, angle, time and cue-number parsers on arbitrary text", () => {
  it("parseLength (metres and feet defaults)", () => {
    fc.assert(
      fc.property(anyText, fc.constantFrom("m" as const, "ft" as const), (t, unit) =>
        returnsNumberOrRangeError((x) => parseLength(x, unit), t),
      ),
      { numRuns: RUNS },
    );
  });
  it("parseAngle", () => {
    fc.assert(
      fc.property(anyText, (t) => returnsNumberOrRangeError(parseAngle, t)),
      { numRuns: RUNS },
    );
  });
  it("parseFadeTime and parseSplitTime stay within 0 … 24 h", () => {
    fc.assert(
      fc.property(anyText, (t) => {
        returnsNumberOrRangeError(parseSplitTime, t);
        try {
          const s = parseFadeTime(t);
          expect(s).toBeGreaterThanOrEqual(0);
          expect(s).toBeLessThanOrEqual(MAX_FADE_SECONDS);
        } catch (err) {
          expect(err).toBeInstanceOf(RangeError);
        }
      }),
      { numRuns: RUNS },
    );
  });
  it("parseCueNumber gives a positive number of at most three places", () => {
    fc.assert(
      fc.property(anyText, (t) => {
        try {
          const n = parseCueNumber(t);
          expect(n).toBeGreaterThan(0);
          expect(n).toBeLessThanOrEqual(MAX_CUE_NUMBER);
          expect(Math.abs(n * 1000 - Math.round(n * 1000))).toBeLessThan(1e-6);
        } catch (err) {
          expect(err).toBeInstanceOf(RangeError);
        }
      }),
      { numRuns: RUNS },
    );
  });
});

describe("what the formatters write, the parsers read back", () => {
  it("lengths: metric to the centimetre, imperial to the half inch", () => {
    fc.assert(
      fc.property(fc.double({ min: -200, max: 200, noNaN: true }), (m) => {
        // Metric is shown to 2 decimals: within half a centimetre (common practice, no source).
        expect(Math.abs(parseLength(formatLength(m, "metric"), "m") - m)).toBeLessThanOrEqual(0.005 + 1e-9);
        // Imperial is shown to the nearest 1/2 inch: within a quarter inch; 1 in = 25.4 mm exactly (NIST SP 811).
        expect(Math.abs(parseLength(formatLength(m, "imperial"), "ft") - m)).toBeLessThanOrEqual(
          METRES_PER_INCH / 4 + 1e-9,
        );
      }),
      { numRuns: RUNS },
    );
  });
  it("fade times to the hundredth of a second", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: MAX_FADE_SECONDS - 1, noNaN: true }), (s) => {
        expect(Math.abs(parseFadeTime(formatFadeTime(s)) - s)).toBeLessThanOrEqual(0.005 + 1e-6);
      }),
      { numRuns: RUNS },
    );
  });
  it("cue numbers exactly (thousandths)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 9_999_999_999 }), (milli) => {
        const n = milli / 1000;
        expect(parseCueNumber(formatCueNumber(n))).toBe(n);
      }),
      { numRuns: RUNS },
    );
  });
});

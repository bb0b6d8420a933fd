import { describe, expect, it } from "vitest";
import { formatFadeTime, formatSplitTime, parseFadeTime, parseSplitTime } from "@/lib/cues";

describe("fade times", () => {
  it("reads seconds, decimals and minutes:seconds", () => {
    expect(parseFadeTime("5")).toBe(5);
    expect(parseFadeTime("5.5")).toBe(5.5);
    expect(parseFadeTime("1:30")).toBe(90); // 1 min 30 s = 90 s (NIST SP 811: 1 min = 60 s)
    expect(parseFadeTime("0:07")).toBe(7);
    expect(parseFadeTime("1:02:30")).toBe(3750); // 1 h = 3600 s (NIST SP 811)
    expect(parseFadeTime(" 0 ")).toBe(0);
  });

  it("refuses what is not a time, naming the field", () => {
    expect(() => parseFadeTime("abc", "Up time")).toThrow(/Up time "abc" is not a time/);
    expect(() => parseFadeTime("1:75")).toThrow(/below 60/);
    expect(() => parseFadeTime("-3")).toThrow(/not a time/);
    expect(() => parseFadeTime("")).toThrow(/empty/);
    expect(() => parseFadeTime("25:00:00")).toThrow(/24 hours/);
  });

  it("reads split up/down times", () => {
    expect(parseSplitTime("3/8")).toEqual({ up: 3, down: 8 });
    expect(parseSplitTime("1:30/45")).toEqual({ up: 90, down: 45 });
    expect(parseSplitTime("4")).toEqual({ up: 4, down: null });
    expect(() => parseSplitTime("3/x")).toThrow(/Down time/);
    expect(() => parseSplitTime("1/2/3")).toThrow(/more than one/);
  });

  it("formats back the way people write them", () => {
    expect(formatFadeTime(5)).toBe("5");
    expect(formatFadeTime(5.5)).toBe("5.5");
    expect(formatFadeTime(90)).toBe("1:30");
    expect(formatFadeTime(65.5)).toBe("1:05.5");
    expect(formatFadeTime(3750)).toBe("1:02:30");
    expect(formatSplitTime(3, 8)).toBe("3/8");
    expect(formatSplitTime(3, null)).toBe("3");
    for (const s of [0, 2.5, 59, 61, 600.25, 7200]) expect(parseFadeTime(formatFadeTime(s))).toBe(s); // round trip
  });
});

import { describe, expect, it } from "vitest";
import { compareCueNumbers, formatCueNumber, numberBetween, parseCueNumber, planRenumber } from "@/lib/cues";

describe("cue numbers", () => {
  it("reads whole and point numbers", () => {
    expect(parseCueNumber("12")).toBe(12); // common practice, no source: whole-numbered cues
    expect(parseCueNumber("12.5")).toBe(12.5); // common practice, no source: point cues between whole numbers
    expect(parseCueNumber(" 0.25 ")).toBe(0.25);
    expect(parseCueNumber(".5")).toBe(0.5);
  });

  it("refuses what is not a cue number, saying why", () => {
    expect(() => parseCueNumber("abc")).toThrow(/not a cue number/);
    expect(() => parseCueNumber("0")).toThrow(/more than 0/);
    expect(() => parseCueNumber("1.2345")).toThrow(/three decimals/); // DECIMAL(10,3) column
    expect(() => parseCueNumber("-3")).toThrow(/not a cue number/);
  });

  it("sorts numerically, not as text", () => {
    const sorted = [10, 9.5, 1, 2.25, 2.3, 100].sort(compareCueNumbers);
    expect(sorted).toEqual([1, 2.25, 2.3, 9.5, 10, 100]); // numeric order, so 9.5 before 10 and 100 last
    expect(["10", "9.5", "2"].sort()).toEqual(["10", "2", "9.5"]); // what text sorting would do instead
  });

  it("treats float noise as the same number", () => {
    expect(compareCueNumbers(0.1 + 0.2, 0.3)).toBe(0);
    expect(formatCueNumber(0.1 + 0.2)).toBe("0.3");
  });

  it("formats without trailing zeros", () => {
    expect(formatCueNumber(12)).toBe("12");
    expect(formatCueNumber(12.5)).toBe("12.5");
    expect(formatCueNumber(12.25)).toBe("12.25");
    expect(formatCueNumber(7.005)).toBe("7.005");
  });

  it("finds the roundest number between two cues", () => {
    expect(numberBetween(5, 8)).toBe(6);
    expect(numberBetween(5, 6)).toBe(5.5);
    expect(numberBetween(5.5, 6)).toBe(5.6);
    expect(numberBetween(5.9, 6)).toBe(5.95);
    expect(numberBetween(5.99, 6)).toBe(5.995);
    expect(numberBetween(5.999, 6)).toBeNull(); // no room at three decimals
    expect(numberBetween(12.5, null)).toBe(13);
    expect(numberBetween(null, 1)).toBe(0.5);
  });

  it("plans a renumber and refuses one that would change the running order", () => {
    const cues = [1, 2, 2.5, 3, 10].map((n, i) => ({ id: i + 1, number: n }));
    const plan = planRenumber(cues, { from: 2, to: 3, start: 4, step: 1 });
    expect(plan.moves.map((m) => [m.id, m.to])).toEqual([
      [2, 4],
      [3, 5],
      [4, 6],
    ]);
    expect(() => planRenumber(cues, { from: 2, to: 3, start: 9, step: 1 })).toThrow(/reach cue 10/);
    expect(() => planRenumber(cues, { from: 2, to: 3, start: 1, step: 1 })).toThrow(/before the range/);
    expect(() => planRenumber(cues, { from: 4, to: 5, start: 1, step: 1 })).toThrow(/No cues/);
  });
});

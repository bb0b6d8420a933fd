import { describe, expect, it } from "vitest";
import { over } from "@/components/plot/palette";

// W3C Compositing and Blending Level 1, "source-over": αo = αs + αb·(1 − αs),
// co = (Cs·αs + Cb·αb·(1 − αs)) / αo. Hand-worked values below.
describe("over (one colour for a translucent fill painted on another)", () => {
  it("an opaque top hides the bottom", () => {
    expect(over("rgba(10, 20, 30, 1)", "rgba(200, 100, 50, 0.5)")).toBe("rgba(10, 20, 30, 1)");
  });

  it("a transparent top leaves the bottom", () => {
    expect(over("rgba(10, 20, 30, 0)", "rgba(200, 100, 50, 0.5)")).toBe("rgba(200, 100, 50, 0.5)");
  });

  it("two half-transparent fills: alpha 0.75, colours weighted 2 : 1 toward the top", () => {
    // αo = 0.5 + 0.5·0.5 = 0.75; red = (255·0.5 + 0·0.25) / 0.75 = 170
    expect(over("rgba(255, 0, 0, 0.5)", "rgba(0, 0, 255, 0.5)")).toBe("rgba(170, 0, 85, 0.75)");
  });

  it("matches painting the two fills on an opaque white ground", () => {
    const white = [255, 255, 255];
    const paint = (ground: number[], c: number[], a: number) => ground.map((g, i) => g * (1 - a) + c[i] * a);
    const twice = paint(paint(white, [230, 150, 30], 0.035), [240, 170, 40], 0.06);
    const m = /rgba\((\d+), (\d+), (\d+), ([\d.]+)\)/.exec(
      over("rgba(240, 170, 40, 0.06)", "rgba(230, 150, 30, 0.035)"),
    )!;
    const once = paint(white, [Number(m[1]), Number(m[2]), Number(m[3])], Number(m[4]));
    for (const [i, c] of once.entries()) expect(c).toBeCloseTo(twice[i], 0);
  });

  it("names a colour it cannot read", () => {
    expect(() => over("#fff", "rgba(0, 0, 0, 1)")).toThrow(/#fff/);
  });
});

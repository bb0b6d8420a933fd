// Plot labels over pools sit on a backing: the box covers the measured text, the text is drawn on top in its
// own colour, and with the backing every label colour keeps 4.5:1 (WCAG 2.2, 1.4.3) over a stack of the
// strongest pools, in the light theme and the low-glare dark one (tokens read from app/globals.css).
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { fillTextOnBacking } from "@/components/plot/label-backing";
import { over, readPalette } from "@/components/plot/palette";

const CSS = readFileSync(path.resolve(__dirname, "../../../app/globals.css"), "utf8");

function tokens(selector: string): Record<string, string> {
  const start = CSS.search(new RegExp(`^${selector.replace(".", "\\.")}\\s*\\{`, "m"));
  const body = CSS.slice(CSS.indexOf("{", start) + 1, CSS.indexOf("}", start));
  return Object.fromEntries([...body.matchAll(/--([\w-]+):\s*([^;]+);/g)].map((m) => [m[1], m[2].trim()]));
}

const rgbOf = (c: string): [number, number, number] => {
  const hex = /^#([0-9a-f]{6})$/i.exec(c);
  if (hex) {
    const n = Number.parseInt(hex[1], 16);
    return [n >> 16, (n >> 8) & 255, n & 255];
  }
  const m = /rgba?\(([\d.]+),\s*([\d.]+),\s*([\d.]+)/.exec(c);
  if (!m) throw new Error(`not a colour: ${c}`);
  return [Number(m[1]), Number(m[2]), Number(m[3])];
};
const rgba = (c: string, a = 1) => `rgba(${rgbOf(c).join(", ")}, ${a})`;

// WCAG 2.2, relative luminance and contrast ratio.
function luminance(c: string): number {
  const [r, g, b] = rgbOf(c).map((v) => {
    const s = v / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
};

type Call = [string, ...unknown[]];
function fakeContext() {
  const calls: Call[] = [];
  const ctx = {
    fillStyle: "#123456",
    globalAlpha: 1,
    // A 40 px wide text, 9 px above and 3 px below its anchor, centred on it.
    measureText: () => ({
      actualBoundingBoxLeft: 20,
      actualBoundingBoxRight: 20,
      actualBoundingBoxAscent: 9,
      actualBoundingBoxDescent: 3,
    }),
    fillRect: (...a: unknown[]) => calls.push(["fillRect", ctx.fillStyle, ctx.globalAlpha, ...a]),
    fillText: (...a: unknown[]) => calls.push(["fillText", ctx.fillStyle, ctx.globalAlpha, ...a]),
  };
  return { ctx: ctx as unknown as CanvasRenderingContext2D, calls };
}

describe("fillTextOnBacking", () => {
  it("paints a surface box around the measured text, then the text in its own colour", () => {
    const { ctx, calls } = fakeContext();
    fillTextOnBacking(ctx, "DSC", 100, 50, { surface: "#ffffff" });
    expect(calls[0][0]).toBe("fillRect");
    expect(calls[0][1]).toBe("#ffffff");
    const [x, y, w, h] = calls[0].slice(3) as number[];
    // The box covers the text's extent (80..120, 41..53) with a margin.
    expect(x).toBeLessThan(80);
    expect(x + w).toBeGreaterThan(120);
    expect(y).toBeLessThan(41);
    expect(y + h).toBeGreaterThan(53);
    expect(calls[1]).toEqual(["fillText", "#123456", 1, "DSC", 100, 50]);
  });
});

describe("label contrast over the strongest pools", () => {
  const saved = globalThis.getComputedStyle;
  let theme: Record<string, string> = {};
  beforeAll(() => {
    globalThis.getComputedStyle = (() => ({ getPropertyValue: (n: string) => theme[n.slice(2)] ?? "" })) as never;
  });
  afterAll(() => {
    globalThis.getComputedStyle = saved;
  });

  for (const name of ["light", "dark"] as const) {
    it(`keeps every label colour at 4.5:1 or more in the ${name} theme`, () => {
      theme = name === "light" ? tokens(":root") : { ...tokens(":root"), ...tokens(".dark") };
      const pal = readPalette({ classList: { contains: () => name === "dark" } } as unknown as Element);
      // Six chosen pools overlapping on one mark: each adds its outer wash and its core.
      let under = rgba(pal.deck);
      for (let i = 0; i < 6; i++) under = over(pal.poolCoreStrong, over(pal.poolOuterStrong, under));
      const backed = over(rgba(pal.surface, 0.88), under);
      for (const label of ["ink", "muted", "accent", "success", "caution"] as const) {
        const withBacking = contrast(pal[label], backed);
        expect(withBacking, `${name} ${label} on its backing`).toBeGreaterThanOrEqual(4.5);
        expect(withBacking).toBeGreaterThanOrEqual(contrast(pal[label], under));
      }
    });
  }
});

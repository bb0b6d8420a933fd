// The theme tokens in app/globals.css, read from the file and checked with the WCAG 2.x contrast
// formula: every text colour 4.5:1 on every background (1.4.3), text on the accent and danger buttons
// 4.5:1, field outlines 3:1 (1.4.11), and no pure white in the dark theme.
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const CSS = readFileSync(path.resolve(__dirname, "../../app/globals.css"), "utf8");

/** The custom properties declared in the first rule whose selector is exactly `selector`. */
function tokens(selector: string): Record<string, string> {
  const start = CSS.search(new RegExp(`^${selector.replace(".", "\\.")}\\s*\\{`, "m"));
  if (start < 0) throw new Error(`no ${selector} rule in globals.css`);
  const body = CSS.slice(CSS.indexOf("{", start) + 1, CSS.indexOf("}", start));
  return Object.fromEntries([...body.matchAll(/--([\w-]+):\s*([^;]+);/g)].map((m) => [m[1], m[2].trim()]));
}

function rgb(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{6})$/i.exec(hex);
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`);
  const n = Number.parseInt(m[1], 16);
  return [n >> 16, (n >> 8) & 255, n & 255];
}

// WCAG 2.2, definition of relative luminance (sRGB, threshold 0.04045 as in IEC 61966-2-1).
function luminance(hex: string): number {
  const [r, g, b] = rgb(hex).map((c) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

// WCAG 2.2, definition of contrast ratio: (L1 + 0.05) / (L2 + 0.05), L1 the lighter.
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

describe("the WCAG contrast formula itself", () => {
  it("gives the published values", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 6); // WCAG 2.2: ratios range from 1:1 to 21:1
    expect(contrast("#ffffff", "#ffffff")).toBeCloseTo(1, 6); // WCAG 2.2
    expect(contrast("#767676", "#ffffff")).toBeCloseTo(4.54, 2); // WebAIM contrast checker: the lightest grey passing AA on white
    expect(contrast("#777777", "#ffffff")).toBeLessThan(4.5); // WebAIM contrast checker: #777 fails AA on white (4.48)
  });
});

const TEXT = ["ink", "muted", "accent", "danger", "caution", "success"];
const BACKGROUNDS = ["canvas", "surface", "raised"];

for (const [name, selector] of [
  ["light", ":root"],
  ["dark", ".dark"],
] as const) {
  describe(`${name} theme tokens`, () => {
    const t = tokens(selector);

    it.each(TEXT.flatMap((fg) => BACKGROUNDS.map((bg) => [fg, bg])))("%s text on %s reaches 4.5:1", (fg, bg) => {
      expect(contrast(t[fg], t[bg])).toBeGreaterThanOrEqual(4.5); // WCAG 2.2 SC 1.4.3
    });

    it("text on the accent and danger buttons reaches 4.5:1", () => {
      expect(contrast(t["accent-ink"], t.accent)).toBeGreaterThanOrEqual(4.5); // WCAG 2.2 SC 1.4.3
      expect(contrast(t["danger-ink"], t.danger)).toBeGreaterThanOrEqual(4.5); // WCAG 2.2 SC 1.4.3
    });

    it.each(BACKGROUNDS)("field outlines reach 3:1 on %s", (bg) => {
      expect(contrast(t.field, t[bg])).toBeGreaterThanOrEqual(3); // WCAG 2.2 SC 1.4.11
    });
  });
}

describe("dark theme glare", () => {
  const t = tokens(".dark");
  it("uses no pure white", () => {
    const values = Object.values(t).join(" ").toLowerCase();
    expect(values).not.toMatch(/#fff\b|#ffffff|\bwhite\b|255,\s*255,\s*255/);
  });
  it("keeps its brightest text well under white (a dark house keeps its eyes adapted)", () => {
    // common practice, no source: low-glare themes hold body text near 10:1 rather than 15-21:1
    expect(contrast(t.ink, t.canvas)).toBeLessThan(12);
  });
  it("dims a focus chart's pool core to under 10x the background's luminance (it was ~43x)", () => {
    // The core's fill as lib/focus/chart-css.ts draws it, composited over the dark surface (source-over,
    // W3C Compositing Level 1) at the theme's --pool-dim.
    const chartCss = readFileSync(path.resolve(__dirname, "../../lib/focus/chart-css.ts"), "utf8");
    const fill = /\.fc-core\{fill:rgba\((\d+),(\d+),(\d+),([\d.]+)\)/.exec(chartCss)!.slice(1).map(Number);
    const core = { rgb: fill.slice(0, 3), alpha: fill[3] };
    const bg = rgb(t.surface);
    const composite = (dim: number) => {
      const a = core.alpha * dim;
      const hex = core.rgb
        .map((c, i) =>
          Math.round(c * a + bg[i] * (1 - a))
            .toString(16)
            .padStart(2, "0"),
        )
        .join("");
      return luminance(`#${hex}`) / luminance(t.surface);
    };
    expect(composite(1)).toBeGreaterThan(40); // as the issue measured, undimmed
    expect(composite(Number(t["pool-dim"]))).toBeLessThan(10); // common practice, no source: a wash, not a lamp
    expect(Number(tokens(":root")["pool-dim"])).toBe(1); // the light theme and paper keep full pools
  });
  it("puts labels over pools on a dark backing", () => {
    const backing = /rgba\((\d+),\s*(\d+),\s*(\d+)/.exec(t["pool-label-backing"])!.slice(1).map(Number);
    const hex = `#${backing.map((c) => c.toString(16).padStart(2, "0")).join("")}`;
    expect(contrast(t.ink, hex)).toBeGreaterThanOrEqual(4.5); // WCAG 2.2 SC 1.4.3
  });
});

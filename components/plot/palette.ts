// Colours for the canvas, read from the theme's CSS variables so the plot follows light and the
// low-glare dark theme. Pools are a warm light tone; nothing copies another program's colour code.
export type PlotPalette = {
  dark: boolean;
  /** Share of full strength pools are drawn at: --pool-dim in app/globals.css (dimmer in the dark theme). */
  poolDim: number;
  canvas: string;
  surface: string;
  line: string;
  ink: string;
  muted: string;
  accent: string;
  danger: string;
  caution: string;
  success: string;
  deck: string;
  grid: string;
  gridMajor: string;
  poolOuter: string;
  poolCore: string;
  poolEdge: string;
  poolOuterStrong: string;
  poolCoreStrong: string;
  area: string;
  selection: string;
};

export function readPalette(el: Element = document.documentElement): PlotPalette {
  const css = getComputedStyle(el);
  const v = (n: string, fallback: string) => css.getPropertyValue(`--${n}`).trim() || fallback;
  const dark = el.classList.contains("dark");
  // Canvases stop at half strength: their pools are already translucent washes that add up where they
  // overlap, so the focus chart's 0.3 would leave a single pool hard to find.
  const poolDim = Math.max(Number(v("pool-dim", "1")) || 1, 0.5);
  return {
    dark,
    poolDim,
    canvas: v("canvas", "#f4f2ee"),
    surface: v("surface", "#ffffff"),
    line: v("line", "#d6d0c4"),
    ink: v("ink", "#1f1d1a"),
    muted: v("muted", "#6b655c"),
    accent: v("accent", "#b4561c"),
    danger: v("danger", "#b3261e"),
    caution: v("caution", "#8a6100"),
    success: v("success", "#2f6b3a"),
    deck: dark ? "#1b1815" : "#fbfaf7",
    grid: dark ? "rgba(201,191,178,0.07)" : "rgba(31,29,26,0.06)",
    gridMajor: dark ? "rgba(201,191,178,0.14)" : "rgba(31,29,26,0.13)",
    // Faint on purpose: a hundred pools overlap on a real plot and must still read as a wash, not a blot.
    poolOuter: dark ? "rgba(222,170,90,0.035)" : "rgba(230,150,30,0.035)",
    poolCore: dark ? "rgba(232,186,110,0.06)" : "rgba(240,170,40,0.06)",
    poolEdge: dark ? "rgba(222,170,90,0.45)" : "rgba(170,100,10,0.45)",
    // The strong (chosen) pools are the bright ones on a dark plot: they take the theme's dimming; the
    // faint wash is already near the floor of what reads.
    poolOuterStrong: dark ? `rgba(222,170,90,${(0.16 * poolDim).toFixed(3)})` : "rgba(230,150,30,0.18)",
    poolCoreStrong: dark ? `rgba(232,186,110,${(0.22 * poolDim).toFixed(3)})` : "rgba(240,170,40,0.28)",
    area: dark ? "rgba(111,156,106,0.12)" : "rgba(47,107,58,0.08)",
    selection: dark ? "#d9a441" : "#1d6fb8",
  };
}

/**
 * The colour of `top` painted over `bottom` (both "rgba(r, g, b, a)"), as one colour: lets a layer fill a
 * pixel once where it would otherwise fill it twice. Source-over compositing (W3C Compositing Level 1).
 */
export function over(top: string, bottom: string): string {
  const [r1, g1, b1, a1] = rgba(top);
  const [r0, g0, b0, a0] = rgba(bottom);
  const a = a1 + a0 * (1 - a1);
  if (a === 0) return "rgba(0, 0, 0, 0)";
  const mix = (c1: number, c0: number) => Math.round((c1 * a1 + c0 * a0 * (1 - a1)) / a);
  return `rgba(${mix(r1, r0)}, ${mix(g1, g0)}, ${mix(b1, b0)}, ${+a.toFixed(4)})`;
}

function rgba(c: string): [number, number, number, number] {
  const m = /^rgba?\(\s*([\d.]+)\s*,\s*([\d.]+)\s*,\s*([\d.]+)\s*(?:,\s*([\d.]+)\s*)?\)$/.exec(c.trim());
  if (!m) throw new Error(`Not an rgb/rgba colour: ${c}`);
  return [Number(m[1]), Number(m[2]), Number(m[3]), m[4] === undefined ? 1 : Number(m[4])];
}

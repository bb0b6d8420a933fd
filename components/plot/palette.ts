// Colours for the canvas, read from the theme's CSS variables so the plot follows light and the
// low-glare dark theme. Pools are a warm light tone; nothing copies another program's colour code.
export type PlotPalette = {
  dark: boolean;
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
  area: string;
  selection: string;
};

export function readPalette(el: Element = document.documentElement): PlotPalette {
  const css = getComputedStyle(el);
  const v = (n: string, fallback: string) => css.getPropertyValue(`--${n}`).trim() || fallback;
  const dark = el.classList.contains("dark");
  return {
    dark,
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
    poolOuter: dark ? "rgba(222,170,90,0.10)" : "rgba(230,160,40,0.12)",
    poolCore: dark ? "rgba(232,186,110,0.16)" : "rgba(240,176,50,0.20)",
    poolEdge: dark ? "rgba(222,170,90,0.55)" : "rgba(190,120,20,0.6)",
    area: dark ? "rgba(111,156,106,0.12)" : "rgba(47,107,58,0.08)",
    selection: dark ? "#d9a441" : "#1d6fb8",
  };
}

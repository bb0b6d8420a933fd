// Throwline's own fixture symbol, described as data so the canvas and the printed plan agree:
// a body shape by family, a nose showing the beam direction, the channel in a tag.
import type { Point } from "@/lib/optics";
import { planToScreen, type View } from "./view";
export type SymbolShape = "lozenge" | "round" | "square" | "hexagon" | "wide" | "diamond";

const SHAPES: Record<string, SymbolShape> = {
  profile: "lozenge",
  fresnel: "round",
  par: "diamond",
  wash: "square",
  "led-wash": "hexagon",
  cyc: "wide",
  followspot: "lozenge",
};

export function symbolShape(family: string): SymbolShape {
  return SHAPES[family] ?? "square";
}

/** Symbol size in pixels: the real-world size (≈ 0.45 m) when zoomed in, never smaller than readable. */
export function symbolPixels(pxPerMetre: number, minPx = 14, maxPx = 64): number {
  return Math.min(maxPx, Math.max(minPx, 0.45 * pxPerMetre));
}

/** Where a unit's symbol is drawn on screen: its plan point plus the fan-out of a boom (±x, by stack index). */
export function symbolScreenPoint(v: View, f: { x: number; y: number; stack: { index: number; dir: number } }): Point {
  const s = planToScreen(v, f);
  const px = symbolPixels(v.scale);
  return { x: s.x + f.stack.dir * f.stack.index * px * 1.15, y: s.y };
}

/** Whether labels (channel numbers) fit inside the symbols at this zoom. */
export function labelsFit(symbolPx: number): boolean {
  return symbolPx >= 16;
}

/** Outline of a symbol in its own frame: unit size, nose along +x. Used by canvas drawing and print SVG. */
export function symbolOutline(shape: SymbolShape): Array<[number, number]> {
  switch (shape) {
    case "lozenge":
      return [
        [-0.5, -0.32],
        [0.22, -0.32],
        [0.5, 0],
        [0.22, 0.32],
        [-0.5, 0.32],
      ];
    case "square":
      return [
        [-0.42, -0.42],
        [0.42, -0.42],
        [0.42, 0.42],
        [-0.42, 0.42],
      ];
    case "hexagon":
      return Array.from(
        { length: 6 },
        (_, i) => [0.48 * Math.cos((i * Math.PI) / 3), 0.48 * Math.sin((i * Math.PI) / 3)] as [number, number],
      );
    case "wide":
      return [
        [-0.3, -0.55],
        [0.3, -0.55],
        [0.3, 0.55],
        [-0.3, 0.55],
      ];
    case "diamond":
      return [
        [-0.5, 0],
        [0, -0.4],
        [0.5, 0],
        [0, 0.4],
      ];
    case "round":
      return Array.from(
        { length: 16 },
        (_, i) => [0.44 * Math.cos((i * Math.PI) / 8), 0.44 * Math.sin((i * Math.PI) / 8)] as [number, number],
      );
  }
}

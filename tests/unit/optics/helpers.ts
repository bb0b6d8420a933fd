import type { Vec3 } from "@/lib/optics";

export const D2R = Math.PI / 180;

/** Lens at height h over the origin, aimed phiDeg from straight down toward plan bearing panDeg. */
export function aimed(h: number, phiDeg: number, panDeg = 0, planeZ = 0): { source: Vec3; focus: Vec3 } {
  const r = (h - planeZ) * Math.tan(phiDeg * D2R);
  return {
    source: { x: 0, y: 0, z: h },
    focus: { x: r * Math.cos(panDeg * D2R), y: r * Math.sin(panDeg * D2R), z: planeZ },
  };
}

export function relClose(actual: number, expected: number, rel: number, scale = Math.abs(expected)): boolean {
  return Math.abs(actual - expected) <= rel * Math.max(scale, Number.MIN_VALUE);
}

/** Every number anywhere in the value, for "never NaN or Infinity" checks. */
export function numbersIn(v: unknown, out: number[] = []): number[] {
  if (typeof v === "number") out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => numbersIn(x, out));
  else if (v && typeof v === "object") Object.values(v).forEach((x) => numbersIn(x, out));
  return out;
}

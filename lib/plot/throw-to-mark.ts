// Typing a throw: slide the focus mark along the beam's current bearing until the distance from the
// lens to the aim point (at deck or head height) is the throw asked for.
import type { Point, Vec3 } from "@/lib/optics";

export type ThrowResult = { ok: true; mark: Point } | { ok: false; reason: string };

export function markForThrow(i: {
  source: Vec3;
  mark: Point;
  aimZ: number;
  throwM: number;
  describe: (m: number) => string;
}): ThrowResult {
  const { source, mark, aimZ, throwM } = i;
  if (!(throwM > 0) || !Number.isFinite(throwM)) return { ok: false, reason: "Type a throw longer than zero." };
  const drop = source.z - aimZ;
  if (drop <= 0)
    return { ok: false, reason: "The lens is not above the aim height, so no throw reaches the aim point from above." };
  // Pythagoras: the horizontal run that, with the drop, makes the hypotenuse equal to the throw.
  if (throwM < drop - 1e-9)
    return {
      ok: false,
      reason: `A throw of ${i.describe(throwM)} is shorter than the drop from the lens to the aim height (${i.describe(drop)}).`,
    };
  const dx = mark.x - source.x;
  const dy = mark.y - source.y;
  const run = Math.hypot(dx, dy);
  const wanted = Math.sqrt(Math.max(0, throwM * throwM - drop * drop));
  if (run < 1e-6) {
    if (wanted < 1e-6) return { ok: true, mark: { x: source.x, y: source.y } };
    return {
      ok: false,
      reason:
        "The beam points straight down, so it has no bearing to move the mark along. Drag the mark off the lens first.",
    };
  }
  return { ok: true, mark: { x: source.x + (dx / run) * wanted, y: source.y + (dy / run) * wanted } };
}

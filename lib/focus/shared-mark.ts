// The units that share a mark with the one being focused, and the words for how many: the focus call's plan
// (components/focus/pool-plan.tsx) draws their pools faintly beside the current one.
import type { FixtureDto } from "@/lib/dto/fixture";

/** Fixtures sharing the focus point, or (without one) aimed within half a metre of the same mark. */
export function neighboursOf<F extends Pick<FixtureDto, "id" | "focusPointId" | "computed">>(
  current: F,
  all: F[],
): F[] {
  const mark = current.computed.focus;
  return all.filter((f) => {
    if (f.id === current.id || !f.computed.focus) return false;
    if (current.focusPointId != null) return f.focusPointId === current.focusPointId;
    return !!mark && Math.hypot(f.computed.focus.x - mark.x, f.computed.focus.y - mark.y) < 0.5;
  });
}

/** "unit 14 and 21 others on this mark": the count is of the other units, so it says so. */
export function sharedMarkWords(unitNumber: string, others: number): string {
  if (others === 0) return `unit ${unitNumber}, alone on this mark`;
  return `unit ${unitNumber} and ${others} ${others === 1 ? "other" : "others"} on this mark`;
}

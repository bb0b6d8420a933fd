"use client";
// A unit's checks badge in the rig table: a small link to the finding's row on the checks page, named with
// what is wrong, so it needs no hover or tap to be understood. Nothing when the checks say nothing.
import Link from "next/link";
import { unitFlagLabel, type UnitFlag } from "@/lib/checks/unit-flags";
import { useUnitChecks } from "./use-unit-checks";

export const UNIT_FLAG_TONE = {
  error: "border-danger text-danger",
  warning: "border-caution text-caution",
  info: "border-line text-muted",
} as const;
const SIGN = { error: "▲", warning: "△", info: "○" } as const;

export function UnitCheckBadge({ productionId, flag }: { productionId: number; flag: UnitFlag | undefined }) {
  if (!flag) return null;
  const label = unitFlagLabel(flag);
  return (
    <Link
      href={`/productions/${productionId}/checks#${flag.findingKey}`}
      aria-label={label}
      title={label}
      data-testid="unit-check-badge"
      data-severity={flag.severity}
      className={`inline-flex min-h-6 min-w-6 items-center justify-center rounded-full border bg-surface px-1 text-xs font-semibold print:hidden ${UNIT_FLAG_TONE[flag.severity]}`}
      onKeyDown={(e) => e.stopPropagation()}
      onClick={(e) => e.stopPropagation()}
    >
      <span aria-hidden>{SIGN[flag.severity]}</span>
    </Link>
  );
}

/** The badge for one unit, reading the page's one unit-checks query (a table cell, a panel). */
export function UnitCheckCell({ productionId, fixtureId }: { productionId: number; fixtureId: number }) {
  const { data } = useUnitChecks(productionId);
  return <UnitCheckBadge productionId={productionId} flag={data?.units[fixtureId]} />;
}

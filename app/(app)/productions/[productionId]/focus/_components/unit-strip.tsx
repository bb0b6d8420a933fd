"use client";

import { useEffect, useRef } from "react";
import { POINT_HUNG_KINDS, type PositionKind } from "@/lib/rig/position-kinds";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { OutboxEntry } from "@/lib/offline/outbox";

/**
 * The position as a strip of its units, in the order the crew meets them: booms and ladders top to
 * bottom (by lens height), pipes and trusses along their length as drawn on the plan (stage right first).
 */
export function orderForStrip(kind: PositionKind | undefined, units: FixtureDto[]): FixtureDto[] {
  const list = units.slice();
  if (kind && POINT_HUNG_KINDS.has(kind)) return list.sort((a, b) => b.computed.lensHeight - a.computed.lensHeight);
  return list.sort((a, b) => a.x - b.x);
}

export function UnitStrip({
  kind,
  units,
  currentId,
  waiting,
  onPick,
}: {
  kind: PositionKind | undefined;
  units: FixtureDto[];
  currentId: number | null;
  /** Units with edits on this device not yet sent (or sent back as a conflict). */
  waiting?: Map<number, OutboxEntry>;
  onPick: (id: number) => void;
}) {
  const vertical = !!kind && POINT_HUNG_KINDS.has(kind);
  const ref = useRef<HTMLElement>(null);
  // The strip scrolls inside itself (any number of units, any screen): keep the current unit in its view
  // by scrolling the strip alone (scrollIntoView would move the page as well).
  // biome-ignore lint/correctness/useExhaustiveDependencies: scroll when the current unit changes; the effect reads it from the page
  useEffect(() => {
    const nav = ref.current;
    const button = nav?.querySelector<HTMLElement>('[aria-current="true"]');
    if (!nav || !button) return;
    const n = nav.getBoundingClientRect();
    const b = button.getBoundingClientRect();
    if (b.top < n.top) nav.scrollTop -= n.top - b.top + 6;
    else if (b.bottom > n.bottom) nav.scrollTop += b.bottom - n.bottom + 6;
    if (b.left < n.left) nav.scrollLeft -= n.left - b.left + 6;
    else if (b.right > n.right) nav.scrollLeft += b.right - n.right + 6;
  }, [currentId]);
  return (
    <nav
      ref={ref}
      aria-label={vertical ? "Units, top to bottom" : "Units along the position, stage right to stage left"}
      className={`flex gap-1.5 rounded-md border border-line bg-raised p-1.5 overflow-auto ${vertical ? "max-h-[70vh] flex-col" : "max-h-[10.5rem] flex-wrap"}`}
      data-testid="unit-strip"
    >
      {units.map((f) => {
        const current = f.id === currentId;
        const entry = waiting?.get(f.id);
        return (
          <button
            key={f.id}
            type="button"
            onClick={() => onPick(f.id)}
            aria-current={current ? "true" : undefined}
            className={`flex min-h-12 min-w-12 flex-col items-center justify-center rounded px-2 text-sm ${
              current ? "bg-accent text-accent-ink" : f.focused ? "bg-surface text-success" : "bg-surface text-ink"
            } border ${current ? "border-accent" : "border-line"}`}
          >
            {/* The name is the text shown plus words only a screen reader needs: "Unit 11, channel 11, focused". */}
            <span className="font-semibold">
              <span className="sr-only">Unit </span>
              {f.unitNumber}
            </span>
            <span className="text-xs">
              <span className="sr-only">, </span>
              {f.focused ? <span aria-hidden="true">✓ </span> : null}
              {f.channel != null ? (
                <>
                  <span className="sr-only">channel </span>
                  {f.channel}
                </>
              ) : (
                <>
                  <span className="sr-only">no channel</span>
                  <span aria-hidden="true">—</span>
                </>
              )}
              {f.focused ? <span className="sr-only">, focused</span> : null}
            </span>
            {entry ? (
              <span className="text-xs font-medium" data-testid="strip-waiting">
                <span className="sr-only">, </span>
                {entry.state === "conflict" ? "conflict" : entry.state === "refused" ? "not saved" : "waiting"}
              </span>
            ) : null}
          </button>
        );
      })}
    </nav>
  );
}

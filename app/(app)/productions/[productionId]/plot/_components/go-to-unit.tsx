"use client";

import Link from "next/link";
import { useId, useMemo, useState } from "react";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import { compareUnitNumbers } from "@/lib/rig/unit-number";
import type { Selection } from "./canvas-types";

/** The list shows this many matches at most: enough to scan, few enough to tab through. */
const SHOWN = 40;

/**
 * The plot without a pointer: a searchable list of every unit beside the canvas. Choosing one selects
 * it as a click on the canvas would and gives the canvas the keyboard, so the arrow keys and the side
 * panel work as they do after a click. Also holds the canvas's description for assistive technology.
 */
export function GoToUnit({
  fixtures,
  productionId,
  selection,
  setSelection,
  focusCanvas,
  descriptionId,
}: {
  fixtures: PlotFixture[];
  productionId: number;
  selection: Selection;
  setSelection: (s: Selection) => void;
  focusCanvas: () => void;
  descriptionId: string;
}) {
  const [query, setQuery] = useState("");
  const searchId = useId();
  const sorted = useMemo(
    () =>
      [...fixtures].sort(
        (a, b) => a.positionName.localeCompare(b.positionName) || compareUnitNumbers(a.unitNumber, b.unitNumber),
      ),
    [fixtures],
  );
  const matches = useMemo(() => {
    const words = query.toLowerCase().split(/\s+/).filter(Boolean);
    return sorted.filter((f) => words.every((w) => describe(f).toLowerCase().includes(w)));
  }, [sorted, query]);
  const positions = new Set(fixtures.map((f) => f.positionId)).size;
  const chosen = selection.fixtures.size === 1 ? fixtures.find((f) => selection.fixtures.has(f.id)) : undefined;

  return (
    <aside
      aria-label="Go to unit"
      className="flex w-56 shrink-0 flex-col gap-2 max-xl:h-[40%] border-r border-line bg-surface p-2 text-sm"
      data-testid="go-to-unit"
    >
      <p id={descriptionId} className="sr-only">
        Plan view of the stage with {fixtures.length} units on {positions} positions. Choose a unit from the Go to unit
        list to select it without a pointer; then the arrow keys move it and the side panel shows its values.
      </p>
      <label htmlFor={searchId} className="font-medium">
        Go to unit
      </label>
      <input
        id={searchId}
        type="search"
        value={query}
        onChange={(e) => setQuery(e.target.value)}
        placeholder="unit, position, channel, purpose"
        className="min-h-10 rounded-md border border-line bg-surface px-2 text-ink pointer-coarse:min-h-11"
        aria-describedby={`${searchId}-count`}
        data-testid="go-to-unit-search"
      />
      <p id={`${searchId}-count`} aria-live="polite" className="text-xs text-muted">
        {matches.length === fixtures.length
          ? `${fixtures.length} units`
          : `${matches.length} of ${fixtures.length} units match`}
        {matches.length > SHOWN ? `, first ${SHOWN} shown` : ""}
      </p>
      <ul className="min-h-0 flex-1 overflow-y-auto">
        {matches.slice(0, SHOWN).map((f) => (
          <li key={f.id}>
            <button
              type="button"
              aria-pressed={selection.fixtures.has(f.id)}
              data-testid="go-to-unit-item"
              className={`min-h-10 w-full rounded px-2 text-left hover:bg-raised pointer-coarse:min-h-11 ${selection.fixtures.has(f.id) ? "bg-accent/15 font-medium" : ""}`}
              onClick={() => {
                setSelection({ fixtures: new Set([f.id]), positionId: null, focusPointId: null });
                focusCanvas();
              }}
            >
              {describe(f)}
            </button>
          </li>
        ))}
      </ul>
      <p className="sr-only" aria-live="polite" data-testid="plot-announce">
        {chosen
          ? `Selected ${describe(chosen)}`
          : selection.fixtures.size > 1
            ? `${selection.fixtures.size} units selected`
            : ""}
      </p>
      <Link
        href={`/productions/${productionId}/rig`}
        className="inline-flex min-h-10 items-center text-accent underline pointer-coarse:min-h-11"
      >
        Focus values in the rig table
      </Link>
    </aside>
  );
}

function describe(f: PlotFixture): string {
  const channel = f.channel != null ? `, channel ${f.channel}` : "";
  const purpose = f.purpose ? `, ${f.purpose}` : "";
  return `Unit ${f.unitNumber} on ${f.positionName}${channel}${purpose}`;
}

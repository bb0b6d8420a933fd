"use client";

import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo, useState } from "react";
import { useFocusFixtures } from "@/hooks/use-focus";
import { filterFixtures, focusFilterSchema, toQuery, type FocusFilter } from "@/lib/focus/filters";
import { FilterBar } from "./filter-bar";
import { PrintOptions } from "./print-options";
import { ChartCard } from "./chart-card";
import { useCharts, useInBrowser } from "./use-charts";
import type { FocusPageData } from "./types";

const CHART_WINDOW = 12;

export function FocusList({ data }: { data: FocusPageData }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const parsed = focusFilterSchema.safeParse(Object.fromEntries(params.entries()));
  const filter: Partial<FocusFilter> = parsed.success ? parsed.data : {};
  const { data: fixtures } = useFocusFixtures(data.production.id, data.fixtures);
  // biome-ignore lint/correctness/useExhaustiveDependencies: `filter` is parsed anew each render; its fields are what matter
  const shown = useMemo(
    () => filterFixtures(fixtures, filter),
    [fixtures, filter.position, filter.point, filter.chFrom, filter.chTo, filter.status],
  );
  // Charts are drawn a window at a time: all of a big rig at once is tens of thousands of pixels and seconds
  // of work on a tablet. The window resets when the filter changes.
  const filterKey = params.toString();
  const [windowed, setWindowed] = useState({ key: filterKey, size: CHART_WINDOW });
  const size = windowed.key === filterKey ? windowed.size : CHART_WINDOW;
  const visible = useMemo(() => shown.slice(0, size), [shown, size]);
  const { charts, landmarks } = useCharts(data, visible);
  const inBrowser = useInBrowser();
  const focusedCount = shown.filter((f) => f.focused).length;

  const setFilter = (f: Partial<FocusFilter>) => router.replace(`${pathname}?${toQuery(f)}`, { scroll: false });
  const callHref = `/productions/${data.production.id}/focus/call?${toQuery({ position: filter.position ?? shown[0]?.positionId })}`;

  return (
    <main className="mx-auto w-full max-w-7xl space-y-4 px-4 py-5">
      <div className="no-print flex flex-wrap items-end justify-between gap-4">
        <FilterBar data={data} filter={filter} onChange={setFilter} />
        <Link
          href={callHref}
          className="inline-flex min-h-10 items-center rounded-md bg-accent px-4 text-sm font-medium text-accent-ink hover:opacity-90"
          data-testid="open-focus-call"
        >
          Start the focus call
        </Link>
      </div>
      {!parsed.success && (
        <p className="text-sm text-danger">
          These filters cannot be read: {parsed.error.issues[0]?.message}. Showing every chart.
        </p>
      )}
      <div className="no-print flex flex-wrap items-end justify-between gap-4 border-y border-line py-3">
        <p className="text-sm text-muted" data-testid="chart-count" aria-live="polite">
          {shown.length} chart{shown.length === 1 ? "" : "s"} · {focusedCount} focused · in hanging order
        </p>
        <PrintOptions productionId={data.production.id} filter={filter} charts={shown} canExport={data.rights.export} />
      </div>
      {!inBrowser ? (
        <p className="text-sm text-muted">Drawing the charts…</p>
      ) : charts.length === 0 ? (
        <p className="rounded-md border border-line bg-surface p-6 text-sm text-muted">
          No fixtures match these filters.
        </p>
      ) : (
        <>
          <div className="grid gap-4 lg:grid-cols-2" data-testid="chart-list">
            {charts.map((c) => (
              <ChartCard
                key={c.id}
                chart={c}
                landmarks={landmarks}
                units={data.production.displayUnits}
                productionId={data.production.id}
              />
            ))}
          </div>
          {shown.length > charts.length && (
            <div
              className="no-print flex flex-wrap items-center gap-3 rounded-md border border-line bg-surface p-3 text-sm"
              data-testid="chart-window"
            >
              <span className="text-muted">
                Showing {charts.length} of {shown.length} charts.
                {filter.position == null ? " Choose a position above to see one position at a time, or" : ""}
              </span>
              <button
                type="button"
                className="min-h-10 rounded-md border border-line bg-raised px-3 text-ink"
                onClick={() => setWindowed({ key: filterKey, size: size + CHART_WINDOW })}
                data-testid="show-more-charts"
              >
                Show {Math.min(CHART_WINDOW, shown.length - charts.length)} more
              </button>
            </div>
          )}
        </>
      )}
    </main>
  );
}

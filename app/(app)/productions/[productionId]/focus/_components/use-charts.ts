"use client";

import { useMemo, useSyncExternalStore } from "react";
import type { FixtureDto } from "@/lib/dto/fixture";
import { buildFocusChart, type FocusChart } from "@/lib/focus/chart-model";
import { mergeLandmarks, outlineLandmarks } from "@/lib/focus/landmarks";
import type { FocusPageData } from "./types";

const noop = () => () => {};

/**
 * True once running in the browser. Charts are built there so times show in the reader's own time zone
 * (the server cannot know it), which also keeps the server's HTML and the first client render identical.
 */
export function useInBrowser(): boolean {
  return useSyncExternalStore(
    noop,
    () => true,
    () => false,
  );
}

export function browserTimeZone(): string | undefined {
  return typeof Intl !== "undefined" ? Intl.DateTimeFormat().resolvedOptions().timeZone : undefined;
}

export function useCharts(
  data: Pick<FocusPageData, "production" | "userNames" | "drawnLandmarks" | "extras">,
  fixtures: FixtureDto[],
) {
  const landmarks = useMemo(
    () => mergeLandmarks(data.drawnLandmarks, outlineLandmarks(data.production)),
    [data.production, data.drawnLandmarks],
  );
  const charts = useMemo<FocusChart[]>(
    () =>
      fixtures.map((f) =>
        buildFocusChart(f, data.production, {
          landmarks,
          userNames: data.userNames,
          timeZone: browserTimeZone(),
          extras: data.extras[f.id],
        }),
      ),
    [fixtures, data.production, data.userNames, data.extras, landmarks],
  );
  return { charts, landmarks };
}

"use client";

import { useState } from "react";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { productionKeys } from "./query-keys";
import type { PlotData, PlotWireData } from "@/lib/dto/plot";
import { expandPlotFixtures, fromPlotFixtureWire, type PlotFixture } from "@/lib/plot/slim-fixtures";

/** What the editor works with: fixtures with names and geometry rebuilt in the browser. */
export type PlotPayload = Omit<PlotData, "fixtures"> & { stamp: string; fixtures: PlotFixture[] };
/** What the page and `?shape=slim` send. */
export type PlotWirePayload = PlotWireData & { stamp: string };

/** Polling period of the change token: another user's edit shows up within this time. */
export const PLOT_POLL_MS = 3000;

export function expandPlot(wire: PlotWirePayload, headHeight: number): PlotPayload {
  return { ...wire, fixtures: expandPlotFixtures(wire.fixtures.map(fromPlotFixtureWire), wire, headHeight) };
}

/**
 * The plot's data, seeded by the server page in the slim shape. Live updates: a tiny change token is
 * polled every few seconds and the full (slim) read runs only when it moved.
 */
export function usePlot(
  productionId: number,
  initial: PlotWirePayload,
  headHeight: number,
  { paused = false }: { paused?: boolean } = {},
) {
  const qc = useQueryClient();
  const key = productionKeys.plot(productionId);
  // Expanded once on mount; later reads go through the query function.
  const [initialData] = useState(() => {
    // bench:plot reads these marks to split the first draw into its parts.
    performance.mark("plot:rebuild-start");
    const d = expandPlot(initial, headHeight);
    performance.mark("plot:rebuild-end");
    return d;
  });
  const plot = useQuery({
    queryKey: key,
    queryFn: async () =>
      expandPlot(await apiFetch<PlotWirePayload>(`/api/productions/${productionId}/plot?shape=slim`), headHeight),
    initialData,
    staleTime: Infinity,
  });
  useQuery({
    queryKey: productionKeys.plotStamp(productionId),
    queryFn: async () => {
      const { stamp } = await apiFetch<{ stamp: string }>(`/api/productions/${productionId}/plot?only=stamp`);
      if (stamp !== qc.getQueryData<PlotPayload>(key)?.stamp)
        await qc.invalidateQueries({ queryKey: key, exact: true });
      return stamp;
    },
    refetchInterval: paused ? false : PLOT_POLL_MS,
    refetchIntervalInBackground: false,
    enabled: !paused,
  });
  return plot.data;
}

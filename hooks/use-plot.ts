"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { productionKeys } from "./query-keys";
import type { PlotData } from "@/lib/data/plot";

export type PlotPayload = PlotData & { stamp: string };

/** Polling period of the change token: another user's edit shows up within this time. */
export const PLOT_POLL_MS = 3000;

/**
 * The plot's data, seeded by the server page. Live updates: a tiny change token is polled every few
 * seconds and the full read runs only when it moved (1,500 fixtures are ~2 MB of JSON; the token is bytes).
 */
export function usePlot(productionId: number, initial: PlotPayload, { paused = false }: { paused?: boolean } = {}) {
  const qc = useQueryClient();
  const key = productionKeys.plot(productionId);
  const plot = useQuery({
    queryKey: key,
    queryFn: () => apiFetch<PlotPayload>(`/api/productions/${productionId}/plot`),
    initialData: initial,
    staleTime: Infinity,
  });
  useQuery({
    queryKey: productionKeys.plotStamp(productionId),
    queryFn: async () => {
      const { stamp } = await apiFetch<{ stamp: string }>(`/api/productions/${productionId}/plot?only=stamp`);
      if (stamp !== qc.getQueryData<PlotPayload>(key)?.stamp) await qc.invalidateQueries({ queryKey: key, exact: true });
      return stamp;
    },
    refetchInterval: paused ? false : PLOT_POLL_MS,
    refetchIntervalInBackground: false,
    enabled: !paused,
  });
  return plot.data;
}

"use client";
// What the checks say about each unit, for every badge on a page in one request. The key sits under the
// checks page's key, so a write on the checks page refreshes the badges too; a change to the rig seen by
// any other query of the page (fixtures, types, accessories, the plot) refreshes them as well.
import { type QueryClient, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { ChecksSummary, UnitFlag } from "@/lib/checks";

export type UnitChecks = { units: Record<number, UnitFlag>; summary: ChecksSummary };

export const unitChecksKey = (productionId: number) => ["productions", productionId, "checks", "units"] as const;

/** The queries whose fresh data can change what the checks find (hooks/query-keys.ts names them). */
const RIG_DATA = new Set(["fixtures", "fixture-types", "accessories", "plot"]);
const watched = new WeakSet<QueryClient>();

/** One listener per query client, however many badges a page has: a rig change refetches the flags. */
function refetchOnRigChange(qc: QueryClient) {
  if (watched.has(qc)) return;
  watched.add(qc);
  const timers = new Map<number, ReturnType<typeof setTimeout>>();
  qc.getQueryCache().subscribe((event) => {
    if (event.type !== "updated" || event.action.type !== "success") return;
    const [root, id, what] = event.query.queryKey as unknown[];
    if (root !== "productions" || typeof id !== "number" || !RIG_DATA.has(String(what))) return;
    // A burst of updates (a bulk edit) asks once.
    clearTimeout(timers.get(id));
    timers.set(
      id,
      setTimeout(() => qc.invalidateQueries({ queryKey: unitChecksKey(id) }), 300),
    );
  });
}

export function useUnitChecks(productionId: number) {
  refetchOnRigChange(useQueryClient());
  return useQuery({
    queryKey: unitChecksKey(productionId),
    queryFn: () => apiFetch<UnitChecks>(`/api/productions/${productionId}/checks/units`),
    staleTime: 5_000,
    // Others edit the rig too: the badges catch up without a reload.
    refetchInterval: 20_000,
  });
}

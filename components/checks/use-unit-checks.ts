"use client";
// What the checks say about each unit, for every badge on a page in one request. The key sits under the
// checks page's key, so a write on the checks page refreshes the badges too.
import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { ChecksSummary, UnitFlag } from "@/lib/checks";

export type UnitChecks = { units: Record<number, UnitFlag>; summary: ChecksSummary };

export const unitChecksKey = (productionId: number) => ["productions", productionId, "checks", "units"] as const;

export function useUnitChecks(productionId: number) {
  return useQuery({
    queryKey: unitChecksKey(productionId),
    queryFn: () => apiFetch<UnitChecks>(`/api/productions/${productionId}/checks/units`),
    staleTime: 5_000,
    // Rig and plot edits change what the checks find: the badges catch up without a reload.
    refetchInterval: 20_000,
  });
}

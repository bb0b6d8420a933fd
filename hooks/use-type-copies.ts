"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import { productionKeys } from "./query-keys";

export type TypeSource = {
  productionId: number;
  name: string;
  archived: boolean;
  types: Array<{ name: string; family: string; coneMinDeg: number; coneMaxDeg: number }>;
};
export type AddedTypes = { fixtureTypes: FixtureTypeDto[]; skipped: string[] };

/** The designer's other productions that have types to copy; asked for only when the chooser opens. */
export function useTypeSources(productionId: number, enabled: boolean) {
  return useQuery({
    queryKey: [...productionKeys.fixtureTypes(productionId), "sources"] as const,
    queryFn: async () =>
      (await apiFetch<{ sources: TypeSource[] }>(`/api/productions/${productionId}/rig/copy-types`)).sources,
    enabled,
  });
}

function useAddTypes<V>(productionId: number, send: (v: V) => Promise<AddedTypes>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSettled: () => {
      void qc.invalidateQueries({ queryKey: productionKeys.fixtureTypes(productionId) });
      void qc.invalidateQueries({ queryKey: productionKeys.list() });
    },
  });
}

/** Starter types by name, or the whole shelf when no names are given. */
export function useAddStarterSet(productionId: number) {
  return useAddTypes(productionId, (names: string[] | undefined) =>
    apiFetch<AddedTypes>(`/api/productions/${productionId}/rig/starter-types`, {
      method: "POST",
      json: names ? { names } : {},
    }),
  );
}

export function useCopyTypes(productionId: number) {
  return useAddTypes(productionId, (v: { fromProductionId: number; names?: string[] }) =>
    apiFetch<AddedTypes>(`/api/productions/${productionId}/rig/copy-types`, { method: "POST", json: v }),
  );
}

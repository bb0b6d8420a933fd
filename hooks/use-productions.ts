"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { productionKeys } from "./query-keys";
import type { ProductionDto, ProductionListItem } from "@/lib/dto/production";

export function useProductions() {
  return useQuery({
    queryKey: productionKeys.list(),
    queryFn: async () => (await apiFetch<{ productions: ProductionListItem[] }>("/api/productions")).productions,
  });
}

export function useCreateProduction() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (input: { name: string; venue: string; displayUnits: "metric" | "imperial" }) =>
      (await apiFetch<{ production: ProductionDto }>("/api/productions", { method: "POST", json: input })).production,
    onSuccess: () => qc.invalidateQueries({ queryKey: productionKeys.list() }),
  });
}

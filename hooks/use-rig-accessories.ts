"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { AccessoryDto } from "@/lib/dto/accessory";
import { productionKeys } from "./query-keys";

/** Add, change and remove a fixture's accessories; the list (and so the stock counts) refreshes after each. */
export function useAccessoryMutations(productionId: number) {
  const qc = useQueryClient();
  const base = `/api/productions/${productionId}/accessories`;
  const refresh = () => qc.invalidateQueries({ queryKey: productionKeys.accessories(productionId) });
  return {
    create: useMutation({
      mutationFn: async (input: Record<string, unknown>) =>
        (await apiFetch<{ accessory: AccessoryDto }>(base, { method: "POST", json: input })).accessory,
      onSettled: refresh,
    }),
    update: useMutation({
      mutationFn: async ({ id, patch }: { id: number; patch: Record<string, unknown> }) =>
        (await apiFetch<{ accessory: AccessoryDto }>(`${base}/${id}`, { method: "PATCH", json: patch })).accessory,
      onSettled: refresh,
    }),
    remove: useMutation({
      mutationFn: (id: number) => apiFetch(`${base}/${id}`, { method: "DELETE" }),
      onSettled: refresh,
    }),
  };
}

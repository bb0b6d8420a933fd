"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { ProductionListItem } from "@/lib/dto/production";
import { productionKeys } from "./query-keys";

/** Archive (true) or restore (false); the list moves the card at once and settles on the server's answer. */
export function useArchiveProduction() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, archived }: { id: number; archived: boolean }) =>
      (
        await apiFetch<{ production: { id: number; archivedAt: string | null } }>(`/api/productions/${id}/archive`, {
          method: "PUT",
          json: { archived },
        })
      ).production,
    onSuccess: (p) =>
      qc.setQueryData<ProductionListItem[]>(productionKeys.list(), (all) =>
        all?.map((x) => (x.id === p.id ? { ...x, archivedAt: p.archivedAt } : x)),
      ),
    onSettled: () => qc.invalidateQueries({ queryKey: productionKeys.list() }),
  });
}

export function useDeleteProduction() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, confirmName }: { id: number; confirmName: string }) =>
      (
        await apiFetch<{ deleted: { id: number; name: string } }>(`/api/productions/${id}`, {
          method: "DELETE",
          json: { confirmName },
        })
      ).deleted,
    onSuccess: (d) =>
      qc.setQueryData<ProductionListItem[]>(productionKeys.list(), (all) => all?.filter((x) => x.id !== d.id)),
    onSettled: () => qc.invalidateQueries({ queryKey: productionKeys.list() }),
  });
}

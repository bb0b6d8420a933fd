"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch, ApiError } from "@/lib/http/api-client";
import type { FixtureDto } from "@/lib/dto/fixture";
import { productionKeys } from "./query-keys";

/**
 * Adds, replaces or removes a fixture's focus photo at the version on screen. The cache takes the
 * server's row on success; a 409 (someone changed the fixture first) refetches the rig.
 */
export function useFocusPhoto(productionId: number) {
  const qc = useQueryClient();
  const key = productionKeys.fixtures(productionId);
  const url = (id: number) => `/api/productions/${productionId}/fixtures/${id}/photo`;
  const handlers = {
    onSuccess: (fixture: FixtureDto) =>
      qc.setQueryData<FixtureDto[]>(key, (list) => list?.map((f) => (f.id === fixture.id ? fixture : f))),
    onError: (err: Error) => {
      if (err instanceof ApiError && err.status === 409) void qc.invalidateQueries({ queryKey: key });
    },
  };
  const upload = useMutation({
    mutationFn: async ({ id, version, file }: { id: number; version: number; file: File }) => {
      const form = new FormData();
      form.set("file", file);
      form.set("version", String(version));
      return (await apiFetch<{ fixture: FixtureDto }>(url(id), { method: "POST", body: form })).fixture;
    },
    ...handlers,
  });
  const remove = useMutation({
    mutationFn: async ({ id, version }: { id: number; version: number }) =>
      (await apiFetch<{ fixture: FixtureDto }>(url(id), { method: "DELETE", json: { version } })).fixture,
    ...handlers,
  });
  return { upload, remove };
}

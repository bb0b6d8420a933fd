"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch, ApiError } from "@/lib/http/api-client";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { FixturePatch } from "@/lib/validation/fixture";
import { productionKeys } from "./query-keys";

/** The production's fixtures for the focus screens, seeded from the server's render. */
export function useFocusFixtures(productionId: number, initial: FixtureDto[]) {
  return useQuery({
    queryKey: productionKeys.fixtures(productionId),
    queryFn: async () =>
      (await apiFetch<{ fixtures: FixtureDto[] }>(`/api/productions/${productionId}/fixtures`)).fixtures,
    initialData: initial,
  });
}

/** What the focus call edits: the API's own patch types for these fields. */
export type FocusPatch = Pick<
  FixturePatch,
  | "focused"
  | "focusNotes"
  | "notes"
  | "goboRotationDeg"
  | "barnDoorTop"
  | "barnDoorBottom"
  | "barnDoorLeft"
  | "barnDoorRight"
>;

/**
 * Marks a fixture focused or edits its notes. The cache takes the server's row on success; a 409 (someone
 * else changed the fixture first) refetches so the screen shows the current row, and the error says so.
 */
export function useUpdateFocus(productionId: number) {
  const qc = useQueryClient();
  const key = productionKeys.fixtures(productionId);
  return useMutation({
    mutationFn: async ({ id, version, patch }: { id: number; version: number; patch: FocusPatch }) =>
      (
        await apiFetch<{ fixture: FixtureDto }>(`/api/productions/${productionId}/fixtures/${id}`, {
          method: "PATCH",
          json: { version, ...patch },
        })
      ).fixture,
    onSuccess: (fixture) => {
      qc.setQueryData<FixtureDto[]>(key, (list) => list?.map((f) => (f.id === fixture.id ? fixture : f)));
    },
    onError: (err) => {
      if (err instanceof ApiError && err.status === 409) void qc.invalidateQueries({ queryKey: key });
    },
  });
}

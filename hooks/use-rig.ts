"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { AccessoryDto } from "@/lib/dto/accessory";
import type { FixturePatch } from "@/lib/validation/fixture";
import type { BulkEdit } from "@/lib/validation/rig-bulk";
import { productionKeys } from "./query-keys";

export function useRigFixtures(productionId: number, initialData?: FixtureDto[]) {
  return useQuery({
    queryKey: productionKeys.fixtures(productionId),
    queryFn: async () =>
      (await apiFetch<{ fixtures: FixtureDto[] }>(`/api/productions/${productionId}/fixtures`)).fixtures,
    initialData,
  });
}

export function useRigTypes(productionId: number, initialData?: FixtureTypeDto[]) {
  return useQuery({
    queryKey: productionKeys.fixtureTypes(productionId),
    queryFn: async () =>
      (await apiFetch<{ fixtureTypes: FixtureTypeDto[] }>(`/api/productions/${productionId}/fixture-types`))
        .fixtureTypes,
    initialData,
  });
}

export function useRigAccessories(productionId: number, initialData?: AccessoryDto[]) {
  return useQuery({
    queryKey: productionKeys.accessories(productionId),
    queryFn: async () =>
      (await apiFetch<{ accessories: AccessoryDto[] }>(`/api/productions/${productionId}/accessories`)).accessories,
    initialData,
  });
}

/** One field of one fixture; a 409 leaves the cache holding the server's current row (the caller shows the conflict). */
export function useUpdateRigFixture(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, patch }: { id: number; patch: FixturePatch }) =>
      (
        await apiFetch<{ fixture: FixtureDto }>(`/api/productions/${productionId}/fixtures/${id}`, {
          method: "PATCH",
          json: patch,
        })
      ).fixture,
    onSuccess: (fixture) =>
      qc.setQueryData<FixtureDto[]>(productionKeys.fixtures(productionId), (all) =>
        all?.map((f) => (f.id === fixture.id ? fixture : f)),
      ),
    onError: () => qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) }),
  });
}

export function useBulkEditRig(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (edit: BulkEdit) =>
      apiFetch<{ updated: number }>(`/api/productions/${productionId}/fixtures/bulk`, { method: "POST", json: edit }),
    onSettled: () => qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) }),
  });
}

export function useAddStarterTypes(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (names: string[]) =>
      apiFetch(`/api/productions/${productionId}/rig/starter-types`, { method: "POST", json: { names } }),
    onSettled: () => qc.invalidateQueries({ queryKey: productionKeys.fixtureTypes(productionId) }),
  });
}

/** One type's figures; every fixture's computed values depend on its type, so the fixtures refresh too. */
export function useUpdateFixtureType(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, patch }: { id: number; patch: Record<string, unknown> }) =>
      (
        await apiFetch<{ fixtureType: FixtureTypeDto }>(`/api/productions/${productionId}/fixture-types/${id}`, {
          method: "PATCH",
          json: patch,
        })
      ).fixtureType,
    onSuccess: (type) =>
      qc.setQueryData<FixtureTypeDto[]>(productionKeys.fixtureTypes(productionId), (all) =>
        all?.map((t) => (t.id === type.id ? type : t)),
      ),
    onError: () => qc.invalidateQueries({ queryKey: productionKeys.fixtureTypes(productionId) }),
    onSettled: () => qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) }),
  });
}

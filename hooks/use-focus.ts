"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
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

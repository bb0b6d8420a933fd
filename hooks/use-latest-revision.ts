"use client";
// The latest issued revision and what changed since it, for the "changed since" side bars and the print
// headers of the client-rendered views. Keyed under the fixtures' and the cues' keys, so the rig's and the
// cues' own invalidations after an edit bring the markers up to date too.
import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { RevisionStamp } from "@/lib/revisions/types";
import { latestRevisionKey } from "./latest-revision-key";

export type LatestRevision = { latest: RevisionStamp | null; fixtureIds: number[]; cueIds: number[] };

export function useLatestRevision(productionId: number, of: "fixtures" | "cues") {
  const query = useQuery({
    queryKey: latestRevisionKey(productionId, of),
    queryFn: () => apiFetch<LatestRevision>(`/api/productions/${productionId}/revisions/latest`),
    staleTime: 15_000,
  });
  const ids = new Set(query.data ? (of === "fixtures" ? query.data.fixtureIds : query.data.cueIds) : []);
  return { latest: query.data?.latest ?? null, changed: ids };
}

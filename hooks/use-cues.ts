"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch, ApiError } from "@/lib/http/api-client";
import { compareCueNumbers } from "@/lib/cues";
import type { ChannelLabel, CueDto, CueSheetRow, ImportOutcome } from "@/lib/dto/cue";
import type { StandbyGroup } from "@/lib/cues";
import { productionKeys } from "./query-keys";

export type CueList = { cues: CueDto[]; channels: ChannelLabel[] };
export type CueSheet = { rows: CueSheetRow[]; standbys: StandbyGroup[] };
export type CueChanges = Partial<Omit<CueDto, "id" | "version" | "updatedAt" | "levels">> & {
  levels?: Record<number, number | null>;
};

const base = (productionId: number) => `/api/productions/${productionId}/cues`;

export function useCueList(productionId: number) {
  return useQuery({
    queryKey: productionKeys.cues(productionId),
    queryFn: () => apiFetch<CueList>(base(productionId)),
  });
}

export function useCueSheet(productionId: number) {
  return useQuery({
    queryKey: productionKeys.cueSheet(productionId),
    queryFn: () => apiFetch<CueSheet>(`${base(productionId)}/summary`),
  });
}

/** Puts one cue into the cached list (replacing, inserting or removing it) and keeps running order. */
function patchList(list: CueList | undefined, cue: CueDto | null, removeId?: number): CueList | undefined {
  if (!list) return list;
  const others = list.cues.filter((c) => c.id !== (cue?.id ?? removeId));
  const cues = cue ? [...others, cue].sort((a, b) => compareCueNumbers(a.number, b.number)) : others;
  return { ...list, cues };
}

function useCueCache(productionId: number) {
  const qc = useQueryClient();
  return {
    put: (cue: CueDto | null, removeId?: number) => {
      qc.setQueryData<CueList>(productionKeys.cues(productionId), (old) => patchList(old, cue, removeId));
      void qc.invalidateQueries({ queryKey: productionKeys.cueSheet(productionId) });
    },
    refresh: () => qc.invalidateQueries({ queryKey: productionKeys.cues(productionId) }),
  };
}

export function useCreateCue(productionId: number) {
  const cache = useCueCache(productionId);
  return useMutation({
    mutationFn: async (input: CueChanges & { number: number | string }) =>
      (await apiFetch<{ cue: CueDto }>(base(productionId), { method: "POST", json: input })).cue,
    onSuccess: (cue) => cache.put(cue),
  });
}

/** A 409 puts the other person's values into the cache before the error reaches the screen. */
export function useUpdateCue(productionId: number) {
  const cache = useCueCache(productionId);
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, version, changes }: { id: number; version: number; changes: CueChanges }) =>
      (
        await apiFetch<{ cue: CueDto }>(`${base(productionId)}/${id}`, {
          method: "PATCH",
          json: { ...changes, version },
        })
      ).cue,
    onSuccess: (cue, vars) => {
      cache.put(cue);
      // Marking a block changes what earlier moves mean for later cues; a renumbered link too.
      if (vars.changes.block !== undefined || vars.changes.number !== undefined) void cache.refresh();
    },
    onError: (err) => {
      if (err instanceof ApiError && err.status === 409 && err.current) cache.put(err.current as CueDto);
      else void qc.invalidateQueries({ queryKey: productionKeys.cues(productionId) });
    },
  });
}

/** For the stage manager's sheet: page and call note, with the sheet's cache kept in step. */
export function useUpdateCallNote(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({
      id,
      version,
      changes,
    }: {
      id: number;
      version: number;
      changes: { page?: string | null; callNote?: string | null };
    }) =>
      (
        await apiFetch<{ cue: CueDto }>(`${base(productionId)}/${id}`, {
          method: "PATCH",
          json: { ...changes, version },
        })
      ).cue,
    onSuccess: (cue) =>
      qc.setQueryData<CueSheet>(productionKeys.cueSheet(productionId), (old) =>
        old
          ? {
              ...old,
              rows: old.rows.map((r) =>
                r.id === cue.id ? { ...r, page: cue.page, callNote: cue.callNote, version: cue.version } : r,
              ),
            }
          : old,
      ),
    onError: () => qc.invalidateQueries({ queryKey: productionKeys.cueSheet(productionId) }),
  });
}

export function useDeleteCue(productionId: number) {
  const cache = useCueCache(productionId);
  return useMutation({
    mutationFn: async ({ id, version }: { id: number; version: number }) => {
      await apiFetch(`${base(productionId)}/${id}?version=${version}`, { method: "DELETE" });
      return id;
    },
    onSuccess: (id) => cache.put(null, id),
  });
}

export function useRenumberCues(productionId: number) {
  const cache = useCueCache(productionId);
  return useMutation({
    mutationFn: (range: { from: string; to: string; start: string; step: string }) =>
      apiFetch<{ renumbered: number }>(`${base(productionId)}/renumber`, { method: "POST", json: range }),
    onSuccess: () => cache.refresh(),
  });
}

export function useImportCues(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { text: string; mode: "state" | "moves" }) =>
      apiFetch<ImportOutcome>(`${base(productionId)}/import`, { method: "POST", json: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: productionKeys.cues(productionId) }),
  });
}

"use client";
// The notes screens' reads and writes: one list per production, refreshed after every write.
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { CurrentCueDto, NoteDto } from "@/lib/notes/dto";
import type { WorkCallStop } from "@/lib/notes/work-call";

export const notesKey = (productionId: number) => ["productions", productionId, "notes"] as const;
const api = (productionId: number) => `/api/productions/${productionId}/notes`;

export function useNotes(productionId: number, initial: NoteDto[]) {
  return useQuery({
    queryKey: notesKey(productionId),
    queryFn: async () => (await apiFetch<{ notes: NoteDto[] }>(api(productionId))).notes,
    initialData: initial,
  });
}

export function useWorkCall(productionId: number, initial: WorkCallStop[]) {
  return useQuery({
    queryKey: [...notesKey(productionId), "work-call"],
    queryFn: async () => (await apiFetch<{ stops: WorkCallStop[] }>(`${api(productionId)}/work-call`)).stops,
    initialData: initial,
  });
}

export type NoteWrite = Partial<
  Omit<
    NoteDto,
    | "id"
    | "productionId"
    | "authorId"
    | "createdAt"
    | "updatedAt"
    | "closedBy"
    | "closedAt"
    | "origin"
    | "showReportId"
    | "runningCueId"
    | "runningCueNumber"
  >
>;

export function useNoteWrites(productionId: number) {
  const qc = useQueryClient();
  const refresh = () => qc.invalidateQueries({ queryKey: notesKey(productionId) });
  const create = useMutation({
    mutationFn: (note: NoteWrite) => apiFetch<{ note: NoteDto }>(api(productionId), { method: "POST", json: note }),
    onSettled: refresh,
  });
  const update = useMutation({
    mutationFn: ({ id, version, changes }: { id: number; version: number; changes: NoteWrite }) =>
      apiFetch<{ note: NoteDto }>(`${api(productionId)}/${id}`, { method: "PATCH", json: { version, ...changes } }),
    onSettled: refresh,
  });
  const remove = useMutation({
    mutationFn: (id: number) => apiFetch<{ ok: true }>(`${api(productionId)}/${id}`, { method: "DELETE" }),
    onSettled: refresh,
  });
  return { create, update, remove };
}

export function useCurrentCue(productionId: number, initial: CurrentCueDto) {
  const qc = useQueryClient();
  const key = [...notesKey(productionId), "current-cue"];
  const query = useQuery({
    queryKey: key,
    queryFn: async () => (await apiFetch<{ currentCue: CurrentCueDto }>(`${api(productionId)}/current-cue`)).currentCue,
    initialData: initial,
    refetchInterval: 15_000,
  });
  const set = useMutation({
    mutationFn: (cueId: number | null) =>
      apiFetch<{ currentCue: CurrentCueDto }>(`${api(productionId)}/current-cue`, { method: "PUT", json: { cueId } }),
    onSuccess: (r) => qc.setQueryData(key, r.currentCue),
  });
  return { current: query.data, set };
}

export { type SpotAnswer, useSpot } from "@/hooks/use-spot";

"use client";
// Open-note counts for a whole page in one request (every badge on the page shares this query), and the
// notes of one thing for the notes button's panel. The keys sit under the notes key, so any note write
// that refreshes the notes also refreshes the badges.
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { NoteCounts } from "@/lib/notes/counts";
import type { NoteDto } from "@/lib/notes/dto";
import type { NoteKind, NotePriority, NoteSubject } from "@/models/note-vocabulary";

export const notesQueryKey = (productionId: number) => ["productions", productionId, "notes"] as const;
export const noteCountsKey = (productionId: number) => [...notesQueryKey(productionId), "counts"] as const;
const api = (productionId: number) => `/api/productions/${productionId}/notes`;

export function useNoteCounts(productionId: number) {
  return useQuery({
    queryKey: noteCountsKey(productionId),
    queryFn: async () => (await apiFetch<{ counts: NoteCounts }>(`${api(productionId)}/counts`)).counts,
    staleTime: 10_000,
    // Notes come from others during a rehearsal: the badges catch up without a reload.
    refetchInterval: 30_000,
  });
}

/** Every note of the production (the same query as the Notes tab), read only while a notes panel is open. */
export function useProductionNotes(productionId: number, enabled: boolean) {
  return useQuery({
    queryKey: notesQueryKey(productionId),
    queryFn: async () => (await apiFetch<{ notes: NoteDto[] }>(api(productionId))).notes,
    enabled,
  });
}

export type QuickNote = {
  subject: NoteSubject;
  subjectId: number | null;
  body: string;
  kind: NoteKind;
  priority: NotePriority;
};

/** Writes one note and refreshes the notes and every badge. */
export function useAddNote(productionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ subject, subjectId, ...rest }: QuickNote) =>
      apiFetch<{ note: NoteDto }>(api(productionId), {
        method: "POST",
        json: subject === "production" ? { subject, ...rest } : { subject, subjectId, ...rest },
      }),
    onSettled: () => qc.invalidateQueries({ queryKey: notesQueryKey(productionId) }),
  });
}

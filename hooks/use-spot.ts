"use client";
// "What lights this spot?": the units reaching a point of the stage in a cue, ranked by lux (computed on
// the server from lib/optics). A mutation, not a query: each tap is a new question, asked once.
import { useMutation } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { SpotContribution } from "@/lib/notes/spot";

export type SpotAnswer = {
  cueId: number | null;
  stateLabel: string;
  total: number;
  contributions: SpotContribution[];
  warnings: string[];
};

export function useSpot(productionId: number) {
  return useMutation({
    mutationFn: (req: { x: number; y: number; cueId?: number }) =>
      apiFetch<SpotAnswer>(`/api/productions/${productionId}/notes/spot`, { method: "POST", json: req }),
  });
}

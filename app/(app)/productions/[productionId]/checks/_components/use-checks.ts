"use client";
// The checks page's server state: the computed report, circuits and data lines, and their writes.
// Every write refetches the report, since any of them can change what the checks find.
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { ChecksReport, CircuitDto, DataLineDto, ElectricalSettingsDto } from "@/lib/dto/checks";

export type ChecksData = { report: ChecksReport; circuits: CircuitDto[]; dataLines: DataLineDto[] };

const key = (id: number) => ["productions", id, "checks"] as const;

async function load(id: number): Promise<ChecksData> {
  const base = `/api/productions/${id}`;
  const [r, c, d] = await Promise.all([
    apiFetch<{ checks: ChecksReport }>(`${base}/checks`),
    apiFetch<{ circuits: CircuitDto[] }>(`${base}/circuits`),
    apiFetch<{ dataLines: DataLineDto[] }>(`${base}/data-lines`),
  ]);
  return { report: r.checks, circuits: c.circuits, dataLines: d.dataLines };
}

export function useChecks(productionId: number, initial: ChecksData) {
  return useQuery({
    queryKey: key(productionId),
    queryFn: () => load(productionId),
    initialData: initial,
    staleTime: 5_000,
  });
}

/** One write against the checks' data; on success (or a 409, which carries the current row) the page reloads its data. */
export function useChecksWrite<V>(productionId: number, send: (base: string, vars: V) => Promise<unknown>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (vars: V) => send(`/api/productions/${productionId}`, vars),
    onSettled: () => qc.invalidateQueries({ queryKey: key(productionId) }),
  });
}

export const sendSettings = (base: string, patch: Partial<ElectricalSettingsDto> & { version: number }) =>
  apiFetch(`${base}/checks/settings`, { method: "PATCH", json: patch });
export const sendNewCircuit = (
  base: string,
  c: { name: string; ratingA: number; phase: string | null; power: CircuitDto["power"] },
) => apiFetch(`${base}/circuits`, { method: "POST", json: c });
export const sendCircuit = (base: string, { id, ...patch }: Partial<CircuitDto> & { id: number; version: number }) =>
  apiFetch(`${base}/circuits/${id}`, { method: "PATCH", json: patch });
export const sendDeleteCircuit = (base: string, id: number) => apiFetch(`${base}/circuits/${id}`, { method: "DELETE" });
export const sendNewDataLine = (base: string, d: { name: string; universe: number | null; fixtureIds: number[] }) =>
  apiFetch(`${base}/data-lines`, { method: "POST", json: d });
export const sendDeleteDataLine = (base: string, id: number) =>
  apiFetch(`${base}/data-lines/${id}`, { method: "DELETE" });
export const sendLiftLines = (
  base: string,
  { positionId, ...patch }: { positionId: number; liftLines: number | null; version: number },
) => apiFetch(`${base}/checks/positions/${positionId}`, { method: "PATCH", json: patch });

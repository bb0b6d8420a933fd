"use client";

import { useMemo } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { productionKeys } from "./query-keys";
import type { PlotPayload } from "./use-plot";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { AreaZoneDto, FocusPointDto, LandmarkDto, PositionDto } from "@/lib/dto/plan";
import type { UploadDto } from "@/lib/dto/upload";

type Row = { id: number };
const replace = <T extends Row>(list: T[], row: T) => list.map((r) => (r.id === row.id ? row : r));
const upsert = <T extends Row>(list: T[], rows: T[]) => [
  ...list.filter((r) => !rows.some((n) => n.id === r.id)),
  ...rows,
];

/**
 * Every write the plot makes. Each answers with the server's row, which replaces the cached one at once
 * (so the panel shows the server's numbers); a 409 throws an ApiError carrying the current row.
 */
export function usePlotActions(productionId: number) {
  const qc = useQueryClient();
  return useMemo(() => {
    const base = `/api/productions/${productionId}`;
    const key = productionKeys.plot(productionId);
    const edit = (fn: (d: PlotPayload) => PlotPayload) => {
      qc.setQueryData<PlotPayload>(key, (d) => (d ? fn(d) : d));
      void qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) });
    };
    const refresh = () => qc.invalidateQueries({ queryKey: key, exact: true });
    return {
      refresh,
      /** Every field of some fixtures (the plot holds only what it draws): for copies and undo of a delete. */
      async fullFixtures(ids: number[]): Promise<FixtureDto[]> {
        if (ids.length <= 20) {
          const rows = await Promise.all(ids.map((id) => apiFetch<{ fixture: FixtureDto }>(`${base}/fixtures/${id}`)));
          return rows.map((r) => r.fixture);
        }
        const wanted = new Set(ids);
        const { fixtures } = await apiFetch<{ fixtures: FixtureDto[] }>(`${base}/fixtures`);
        return fixtures.filter((f) => wanted.has(f.id));
      },
      async patchFixture(id: number, patch: Record<string, unknown>) {
        const { fixture } = await apiFetch<{ fixture: PlotFixture }>(`${base}/fixtures/${id}`, {
          method: "PATCH",
          json: patch,
        });
        edit((d) => ({ ...d, fixtures: replace(d.fixtures, fixture) }));
        return fixture;
      },
      async createFixtures(fixtures: Array<Record<string, unknown>>) {
        const res = await apiFetch<{ fixtures: PlotFixture[] }>(`${base}/fixtures`, {
          method: "POST",
          json: { fixtures },
        });
        edit((d) => ({ ...d, fixtures: upsert(d.fixtures, res.fixtures) }));
        return res.fixtures;
      },
      async deleteFixtures(ids: number[]) {
        await apiFetch(`${base}/fixtures`, { method: "DELETE", json: { ids } });
        edit((d) => ({ ...d, fixtures: d.fixtures.filter((f) => !ids.includes(f.id)) }));
      },
      async createPosition(input: Record<string, unknown>) {
        const { position } = await apiFetch<{ position: PositionDto }>(`${base}/positions`, {
          method: "POST",
          json: input,
        });
        edit((d) => ({ ...d, positions: upsert(d.positions, [position]) }));
        return position;
      },
      async patchPosition(id: number, patch: Record<string, unknown>) {
        const { position } = await apiFetch<{ position: PositionDto }>(`${base}/positions/${id}`, {
          method: "PATCH",
          json: patch,
        });
        edit((d) => ({ ...d, positions: replace(d.positions, position) }));
        void refresh(); // lens heights and pools of its fixtures follow the trim
        return position;
      },
      async deletePosition(id: number) {
        await apiFetch(`${base}/positions/${id}`, { method: "DELETE" });
        edit((d) => ({
          ...d,
          positions: d.positions.filter((p) => p.id !== id),
          fixtures: d.fixtures.filter((f) => f.positionId !== id),
        }));
      },
      async patchFocusPoint(id: number, patch: Record<string, unknown>) {
        const { focusPoint } = await apiFetch<{ focusPoint: FocusPointDto }>(`${base}/focus-points/${id}`, {
          method: "PATCH",
          json: patch,
        });
        edit((d) => ({ ...d, focusPoints: replace(d.focusPoints, focusPoint) }));
        await refresh(); // every fixture aimed at it has new numbers
        return focusPoint;
      },
      async createFocusPoint(input: { name: string; x: number; y: number }) {
        const { focusPoint } = await apiFetch<{ focusPoint: FocusPointDto }>(`${base}/focus-points`, {
          method: "POST",
          json: input,
        });
        edit((d) => ({ ...d, focusPoints: upsert(d.focusPoints, [focusPoint]) }));
        return focusPoint;
      },
      async createAreaZone(input: { name: string; polygon: Array<{ x: number; y: number }> }) {
        const { areaZone } = await apiFetch<{ areaZone: AreaZoneDto }>(`${base}/area-zones`, {
          method: "POST",
          json: input,
        });
        edit((d) => ({ ...d, areaZones: upsert(d.areaZones, [areaZone]) }));
        return areaZone;
      },
      async patchAreaZone(id: number, patch: { polygon: Array<{ x: number; y: number }>; version: number }) {
        const { areaZone } = await apiFetch<{ areaZone: AreaZoneDto }>(`${base}/area-zones/${id}`, {
          method: "PATCH",
          json: patch,
        });
        edit((d) => ({ ...d, areaZones: replace(d.areaZones, areaZone) }));
        return areaZone;
      },
      async patchLandmark(id: number, patch: { x1: number; y1: number; x2: number; y2: number; version: number }) {
        const { landmark } = await apiFetch<{ landmark: LandmarkDto }>(`${base}/landmarks/${id}`, {
          method: "PATCH",
          json: patch,
        });
        edit((d) => ({ ...d, landmarks: replace(d.landmarks, landmark) }));
        return landmark;
      },
      async deleteAreaZone(id: number) {
        await apiFetch(`${base}/area-zones/${id}`, { method: "DELETE" });
        edit((d) => ({ ...d, areaZones: d.areaZones.filter((z) => z.id !== id) }));
      },
      async createLandmark(input: { name: string; x1: number; y1: number; x2: number; y2: number }) {
        const { landmark } = await apiFetch<{ landmark: LandmarkDto }>(`${base}/landmarks`, {
          method: "POST",
          json: input,
        });
        edit((d) => ({ ...d, landmarks: upsert(d.landmarks, [landmark]) }));
        return landmark;
      },
      async deleteLandmark(id: number) {
        await apiFetch(`${base}/landmarks/${id}`, { method: "DELETE" });
        edit((d) => ({ ...d, landmarks: d.landmarks.filter((l) => l.id !== id) }));
      },
      async uploadUnderlay(file: File) {
        const body = new FormData();
        body.set("file", file);
        const { upload } = await apiFetch<{ upload: UploadDto }>(`${base}/uploads`, { method: "POST", body });
        edit((d) => ({ ...d, underlays: [upload, ...d.underlays] }));
        return upload;
      },
      async patchUnderlay(id: number, patch: Record<string, unknown>) {
        const { upload } = await apiFetch<{ upload: UploadDto }>(`${base}/uploads/${id}`, {
          method: "PATCH",
          json: patch,
        });
        edit((d) => ({ ...d, underlays: replace(d.underlays, upload) }));
        return upload;
      },
    };
  }, [qc, productionId]);
}

export type PlotActions = ReturnType<typeof usePlotActions>;

"use client";

import dynamic from "next/dynamic";
import { useMemo } from "react";
import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { productionKeys } from "@/hooks/query-keys";
import { levelAt, type TrackedShow } from "@/lib/cues";
import type { FixtureDto } from "@/lib/data/fixtures";
import { Card } from "@/components/ui/card";
import type { PlanPool } from "./cue-plan-canvas";

// konva needs the browser's canvas: load it on the client only.
const CuePlanCanvas = dynamic(() => import("./cue-plan-canvas").then((m) => m.CuePlanCanvas), { ssr: false, loading: () => <div className="h-72 animate-pulse rounded bg-raised" /> });

/** The selected cue's look: every fixture's deck pool, filled in proportion to its channel's level. */
export function CuePlan({ productionId, show, index, cueLabel }: { productionId: number; show: TrackedShow; index: number; cueLabel: string }) {
  const { data } = useQuery({
    queryKey: [...productionKeys.fixtures(productionId), "cue-plan"],
    queryFn: async () => (await apiFetch<{ fixtures: FixtureDto[] }>(`/api/productions/${productionId}/fixtures`)).fixtures,
  });
  const pools = useMemo<PlanPool[]>(
    () =>
      (data ?? []).flatMap((f) => {
        const outer = f.computed.deck?.status === "ok" ? f.computed.deck.outer : null;
        if (!outer) return [];
        return [{ id: f.id, source: { x: f.computed.source.x, y: f.computed.source.y }, pool: outer, level: f.channel == null ? 0 : levelAt(show, index, f.channel) / 100, channel: f.channel }];
      }),
    [data, show, index],
  );
  const lit = pools.filter((p) => p.level > 0).length;
  return (
    <Card title="The look on the plan">
      <p className="mb-2 text-xs text-muted">{cueLabel ? `${cueLabel}: ` : ""}{lit} of {pools.length} pools lit. Brighter fill = higher level. Audience at the bottom.</p>
      <CuePlanCanvas pools={pools} />
    </Card>
  );
}

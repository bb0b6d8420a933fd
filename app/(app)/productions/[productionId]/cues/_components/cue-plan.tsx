"use client";

import dynamic from "next/dynamic";
import { useMemo } from "react";
import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { productionKeys } from "@/hooks/query-keys";
import { levelAt, type TrackedShow } from "@/lib/cues";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { StageSettings } from "@/lib/plot/stage-outline";
import { Card } from "@/components/ui/card";
import type { LookPool } from "./cue-plan-canvas";

// konva needs the browser's canvas: load it on the client only.
const CuePlanCanvas = dynamic(() => import("./cue-plan-canvas").then((m) => m.CuePlanCanvas), {
  ssr: false,
  loading: () => <div className="h-80 animate-pulse rounded bg-raised" />,
});

/** The selected cue's look: the stage, and every fixture's deck pool lit in proportion to its channel's level. */
export function CuePlan({
  productionId,
  stage,
  show,
  index,
  cueLabel,
}: {
  productionId: number;
  stage: StageSettings;
  show: TrackedShow;
  index: number;
  cueLabel: string;
}) {
  const { data } = useQuery({
    queryKey: [...productionKeys.fixtures(productionId), "cue-plan"],
    queryFn: async () =>
      (await apiFetch<{ fixtures: FixtureDto[] }>(`/api/productions/${productionId}/fixtures`)).fixtures,
  });
  const pools = useMemo<LookPool[]>(
    () =>
      (data ?? []).flatMap((f) => {
        const deck = f.computed.deck;
        if (deck?.status !== "ok" || !deck.outer) return [];
        const mark = f.computed.focus ? { x: f.computed.focus.x, y: f.computed.focus.y } : null;
        return [
          {
            id: f.id,
            pool: deck,
            mark,
            cuts: f.shutterCuts ?? [],
            level: f.channel == null ? 0 : levelAt(show, index, f.channel) / 100,
            channel: f.channel,
          },
        ];
      }),
    [data, show, index],
  );
  const lit = pools.filter((p) => p.level > 0).length;
  return (
    <Card title="The look on the plan">
      <p className="mb-2 text-xs text-muted">
        {cueLabel ? `${cueLabel}: ` : ""}
        {lit} of {pools.length} pools lit, labelled channel · level. Brighter = higher level and overlaps add up (scaled
        so the busiest spot stays short of white); dashed outlines are at 0. Audience at the bottom.
      </p>
      <CuePlanCanvas pools={pools} stage={stage} />
    </Card>
  );
}

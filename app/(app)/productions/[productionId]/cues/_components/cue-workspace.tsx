"use client";

import { useMemo, useState } from "react";
import Link from "next/link";
import { useCueList } from "@/hooks/use-cues";
import { computeTracking } from "@/lib/cues";
import { CueListTable } from "./cue-list-table";
import { CueForm } from "./cue-form";
import { CommandLine } from "./command-line";
import { LevelGrid } from "./level-grid";
import { ChannelMoves } from "./channel-moves";
import { CueTools } from "./cue-tools";
import { CuePlan } from "./cue-plan";
import type { StageSettings } from "@/lib/plot/stage-outline";

/** The designer's cue writing: list, selected cue, typed levels, the grid, what moves, and the look on the plan. */
export function CueWorkspace({ productionId, stage }: { productionId: number; stage: StageSettings }) {
  const { data, error } = useCueList(productionId);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  // A new object for every typed line, so typing the same channel again still brings it into view.
  const [typedChannel, setTypedChannel] = useState<{ channel: number } | null>(null);
  const cues = useMemo(() => data?.cues ?? [], [data]);
  const channels = useMemo(() => data?.channels ?? [], [data]);
  const rigChannels = useMemo(() => channels.map((c) => c.channel), [channels]);
  const show = useMemo(
    () =>
      computeTracking(
        cues,
        channels.map((c) => c.channel),
      ),
    [cues, channels],
  );
  const selectedIndex = Math.max(
    0,
    cues.findIndex((c) => c.id === selectedId),
  );
  const selected = cues.length ? cues[selectedIndex] : null;

  if (error)
    return (
      <p role="alert" className="text-danger">
        {(error as Error).message}
      </p>
    );
  return (
    <div className="grid gap-4 xl:grid-cols-[minmax(0,5fr)_minmax(0,4fr)]">
      <div className="flex min-w-0 flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 className="text-xl font-semibold">Cues</h2>
          <Link href="?view=sheet" className="text-sm text-accent underline">
            Open the stage manager&apos;s cue sheet
          </Link>
        </div>
        <CommandLine
          productionId={productionId}
          cues={cues}
          selected={selected}
          rigChannels={rigChannels}
          onSelect={setSelectedId}
          onTyped={(chs) => setTypedChannel(chs.length ? { channel: chs[0] } : null)}
        />
        <CueListTable
          productionId={productionId}
          cues={cues}
          selectedId={selected?.id ?? null}
          onSelect={setSelectedId}
        />
        <LevelGrid
          show={show}
          cues={cues}
          channels={channels}
          selectedIndex={selectedIndex}
          onSelect={setSelectedId}
          focusChannel={typedChannel}
        />
      </div>
      <div className="flex min-w-0 flex-col gap-4">
        {selected ? (
          <CueForm key={`${selected.id}:${selected.version}`} productionId={productionId} cue={selected} />
        ) : (
          <p className="text-muted">
            No cues yet: type <kbd>cue 1</kbd> in the line on the left and press Enter.
          </p>
        )}
        <CueTools
          productionId={productionId}
          cues={cues}
          show={show}
          selected={selected}
          selectedIndex={selectedIndex}
          onSelect={setSelectedId}
        />
        {selected ? <ChannelMoves show={show} index={selectedIndex} channels={channels} /> : null}
        {selected ? (
          <CuePlan
            productionId={productionId}
            stage={stage}
            show={show}
            index={selectedIndex}
            cueLabel={selected.label}
          />
        ) : null}
      </div>
    </div>
  );
}

"use client";

import { useMemo, useState } from "react";
import { useCueList } from "@/hooks/use-cues";
import { computeTracking, formatCueNumber, formatSplitTime } from "@/lib/cues";
import { LevelGrid } from "./level-grid";

/**
 * The cue list's levels for a role that may read but not write them (the crew checks a channel, the
 * board operator a state): the same tracked grid the designer writes in, with no entry line.
 */
export function CueLevelsView({ productionId }: { productionId: number }) {
  const { data, error, isPending } = useCueList(productionId);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const cues = useMemo(() => data?.cues ?? [], [data]);
  const channels = useMemo(() => data?.channels ?? [], [data]);
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
  const selected = cues[selectedIndex];

  if (error)
    return (
      <p role="alert" className="text-danger">
        {(error as Error).message}
      </p>
    );
  if (isPending) return <p className="text-muted">Loading the levels…</p>;
  if (!cues.length) return <p className="text-muted">No cues yet.</p>;
  return (
    <section aria-labelledby="levels-title" className="flex flex-col gap-2">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h2 id="levels-title" className="text-xl font-semibold">
          Levels
        </h2>
        <p className="text-sm text-muted">
          Read only · {cues.length} cues · {channels.length} channels with units
          {selected
            ? ` · cue ${formatCueNumber(selected.number)}${selected.label ? ` “${selected.label}”` : ""}, ${formatSplitTime(selected.upTime, selected.downTime)}`
            : ""}
        </p>
      </div>
      <LevelGrid
        show={show}
        cues={cues}
        channels={channels}
        selectedIndex={selectedIndex}
        onSelect={setSelectedId}
        focusChannel={null}
        readOnly
      />
    </section>
  );
}

"use client";

import { useState } from "react";
import type { CurrentCueDto } from "@/lib/notes/dto";
import type { SubjectOption } from "@/lib/notes/subjects";
import { useCurrentCue } from "./use-notes";

/** The cue running now; new notes pick it up. The stage manager or board operator moves it. */
export function CurrentCueBar({
  productionId,
  initial,
  cues,
  canSet,
}: {
  productionId: number;
  initial: CurrentCueDto;
  cues: SubjectOption[];
  canSet: boolean;
}) {
  const { current, set } = useCurrentCue(productionId, initial);
  const [error, setError] = useState<string | null>(null);
  const index = cues.findIndex((c) => c.id === current.cueId);
  const go = (cueId: number | null) => {
    setError(null);
    set.mutate(cueId, { onError: (e) => setError((e as Error).message) });
  };
  return (
    <section
      aria-label="Current cue"
      className="flex flex-wrap items-center gap-2 rounded-md border border-line bg-surface p-3 text-sm"
    >
      <span className="font-medium">Current cue:</span>
      <span data-testid="current-cue" className="tabular-nums">
        {current.cueId == null ? "none set" : `${current.number}${current.label ? ` ${current.label}` : ""}`}
      </span>
      {canSet ? (
        <>
          <label className="ml-2 flex items-center gap-1">
            <span className="sr-only">Set the current cue</span>
            <select
              className="rounded border border-line bg-raised px-2 py-1"
              value={current.cueId ?? ""}
              onChange={(e) => go(e.target.value ? Number(e.target.value) : null)}
              disabled={set.isPending}
            >
              <option value="">none</option>
              {cues.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.label}
                </option>
              ))}
            </select>
          </label>
          <button
            type="button"
            className="rounded border border-line px-3 py-1"
            disabled={set.isPending || index < 0 || index >= cues.length - 1}
            onClick={() => go(cues[index + 1].id)}
          >
            Next cue
          </button>
        </>
      ) : null}
      <span className="text-muted">New notes record the current cue.</span>
      {error ? (
        <span role="alert" className="text-danger">
          {error}
        </span>
      ) : null}
    </section>
  );
}

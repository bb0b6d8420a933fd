"use client";

import { useState } from "react";
import { parseLength } from "@/lib/optics";
import type { SpotContribution } from "@/lib/notes/spot";
import type { SubjectOption } from "@/lib/notes/subjects";
import { useSpot } from "./use-notes";

const input = "rounded border border-line bg-raised px-2 py-1";

/** "What lights this spot?": a point on the plan in a cue, the units reaching it ranked by lux; one tap writes a note on one. */
export function SpotPanel({
  productionId,
  cues,
  displayUnits,
  onNote,
}: {
  productionId: number;
  cues: SubjectOption[];
  displayUnits: "metric" | "imperial";
  onNote: (c: SpotContribution) => void;
}) {
  const spot = useSpot(productionId);
  const [x, setX] = useState("0");
  const [y, setY] = useState("2");
  const [cueId, setCueId] = useState<string>("");
  const [error, setError] = useState<string | null>(null);
  const unit = displayUnits === "metric" ? "m" : "ft";
  const ask = (e: React.FormEvent) => {
    e.preventDefault();
    setError(null);
    try {
      const px = parseLength(x, unit);
      const py = parseLength(y, unit);
      spot.mutate(
        { x: px, y: py, ...(cueId ? { cueId: Number(cueId) } : {}) },
        { onError: (err) => setError((err as Error).message) },
      );
    } catch (err) {
      setError((err as Error).message);
    }
  };
  const answer = spot.data;
  return (
    <details className="rounded-md border border-line bg-surface p-3 text-sm">
      <summary className="cursor-pointer font-medium">What lights this spot?</summary>
      <form onSubmit={ask} className="mt-2 flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1">
          Across (x, stage left +)
          <input className={input} value={x} onChange={(e) => setX(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1">
          Depth (y, upstage +)
          <input className={input} value={y} onChange={(e) => setY(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1">
          In cue
          <select className={input} value={cueId} onChange={(e) => setCueId(e.target.value)}>
            <option value="">the current cue</option>
            {cues.map((c) => (
              <option key={c.id} value={c.id}>
                {c.label}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" className="rounded border border-line px-3 py-1" disabled={spot.isPending}>
          Find
        </button>
      </form>
      {error ? (
        <p role="alert" className="mt-2 text-danger">
          {error}
        </p>
      ) : null}
      {answer ? (
        <div className="mt-2">
          <p>
            {answer.stateLabel}: {Math.round(answer.total)} lx in all on the show deck at that point
            {answer.contributions.length ? "" : " — no unit reaches it"}.
          </p>
          {answer.warnings.map((w) => (
            <p key={w} className="text-caution">
              {w}
            </p>
          ))}
          <ol className="mt-1 flex flex-col gap-1">
            {answer.contributions.map((c) => (
              <li key={c.fixtureId} className="flex flex-wrap items-center gap-2">
                <span className="tabular-nums">
                  {Math.round(c.lux)} lx ({Math.round(c.share * 100)} %)
                </span>
                <span>
                  {c.label}
                  {c.channel != null ? ` · ch ${c.channel}` : ""}
                </span>
                <button type="button" className="rounded border border-line px-2 py-0.5" onClick={() => onNote(c)}>
                  Note on this unit
                </button>
              </li>
            ))}
          </ol>
          <p className="mt-1 text-xs text-muted">
            Worked out from the beam model on the show deck; real output varies with lamps, lenses and colour.
          </p>
        </div>
      ) : null}
    </details>
  );
}

"use client";
// "What lights this spot?" on the plot: a mode in which a tap or click on the stage picks the point (a
// layer over the canvas takes the press, so no tool of the editor acts on it), a cue to ask about, and the
// units reaching that point ranked by lux; one tap on a row opens a note on that unit with the finding.
import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { useCueList } from "@/hooks/use-cues";
import { useSpot } from "@/hooks/use-spot";
import { formatCueNumber } from "@/lib/cues";
import { describePoint, formatIlluminance, parseLength, type Point, type Units } from "@/lib/optics";
import type { SpotContribution } from "@/lib/notes/spot";
import { planToScreen, screenToPlan, type View } from "@/lib/plot/view";
import { TargetNotesDialog } from "./target-notes-dialog";

const field = "rounded border border-line bg-raised px-2 py-1";

export function SpotTool({
  productionId,
  units,
  datumName,
  view,
}: {
  productionId: number;
  units: Units;
  datumName?: string;
  /** The canvas's current view, to turn a press into plan metres. */
  view: () => View | undefined;
}) {
  const [active, setActive] = useState(false);
  const [point, setPoint] = useState<Point | null>(null);
  const [cueId, setCueId] = useState("");
  const [noteOn, setNoteOn] = useState<SpotContribution | null>(null);
  const spot = useSpot(productionId);
  const cues = useCueList(productionId);
  const layer = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!active) return;
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && !noteOn && setActive(false);
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [active, noteOn]);

  const ask = (p: Point, cue = cueId) => {
    setPoint(p);
    spot.mutate({ x: p.x, y: p.y, ...(cue ? { cueId: Number(cue) } : {}) });
  };

  function pick(e: React.PointerEvent<HTMLDivElement>) {
    const v = view();
    const box = layer.current?.getBoundingClientRect();
    if (!v || !box) return;
    ask(screenToPlan(v, { x: e.clientX - box.left, y: e.clientY - box.top }));
  }

  if (!active)
    return (
      <Button
        type="button"
        variant="secondary"
        className="absolute bottom-3 left-3 z-10 shadow"
        onClick={() => setActive(true)}
        data-testid="spot-mode"
      >
        What lights this spot?
      </Button>
    );

  const v = view();
  const marker = point && v ? planToScreen(v, point) : null;
  const cueWords = (id: number | null) => {
    const c = cues.data?.cues.find((q) => q.id === id);
    return c ? `cue ${formatCueNumber(c.number)}` : "this cue";
  };
  return (
    <>
      {/* The tap surface: crosshair over the stage; the editor's tools wait until the mode is left. */}
      <div
        ref={layer}
        className="absolute inset-0 z-10 cursor-crosshair touch-none"
        data-testid="spot-layer"
        aria-hidden
        onPointerUp={pick}
      >
        {marker ? (
          <span
            className="pointer-events-none absolute h-5 w-5 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-accent bg-accent/20"
            style={{ left: marker.x, top: marker.y }}
          />
        ) : null}
      </div>
      <section
        aria-label="What lights this spot"
        data-testid="spot-panel"
        data-x={point?.x}
        data-y={point?.y}
        className="absolute right-3 top-10 z-20 flex max-h-[calc(100%-3.5rem)] w-[min(20rem,calc(100%-1.5rem))] flex-col gap-2 overflow-y-auto rounded-md border border-line bg-surface p-3 text-sm shadow-lg"
      >
        <div className="flex items-center justify-between gap-2">
          <h2 className="font-semibold">What lights this spot?</h2>
          <Button type="button" variant="quiet" onClick={() => setActive(false)}>
            Done
          </Button>
        </div>
        <label className="flex flex-col gap-1">
          In cue
          <select
            className={field}
            value={cueId}
            onChange={(e) => {
              setCueId(e.target.value);
              if (point) ask(point, e.target.value);
            }}
          >
            <option value="">the current cue</option>
            {(cues.data?.cues ?? []).map((c) => (
              <option key={c.id} value={c.id}>
                {formatCueNumber(c.number)}
                {c.label ? ` ${c.label}` : ""}
              </option>
            ))}
          </select>
        </label>
        <p className="text-muted">
          {point
            ? `Spot: ${describePoint(point, { units, datumName })}. Tap elsewhere to ask again.`
            : "Tap or click a point on the stage."}
        </p>
        <TypedPoint units={units} onPoint={(p) => ask(p)} />
        <SpotAnswerList answer={spot} units={units} onNote={(c) => setNoteOn(c)} stateWords={(id) => cueWords(id)} />
      </section>
      {noteOn && point ? (
        <TargetNotesDialog
          productionId={productionId}
          target={{ subject: "fixture", subjectId: noteOn.fixtureId, label: noteOn.label }}
          defaultKind="focus"
          presetBody={`At ${describePoint(point, { units, datumName })} in ${cueWords(spot.data?.cueId ?? null)}: ${noteOn.label} gives ${formatIlluminance(noteOn.lux, units)} (${Math.round(noteOn.share * 100)} % of the light there). `}
          onClose={() => setNoteOn(null)}
        />
      ) : null}
    </>
  );
}

/** The same question by typing a point, for a keyboard or a screen reader (and exact spots). */
function TypedPoint({ units, onPoint }: { units: Units; onPoint: (p: Point) => void }) {
  const [x, setX] = useState("");
  const [y, setY] = useState("");
  const [error, setError] = useState<string | null>(null);
  const unit = units === "metric" ? "m" : "ft";
  return (
    <details>
      <summary className="cursor-pointer text-muted">Type a point instead</summary>
      <form
        className="mt-1 flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          try {
            setError(null);
            onPoint({ x: parseLength(x, unit), y: parseLength(y, unit) });
          } catch (err) {
            setError((err as Error).message);
          }
        }}
      >
        <label className="flex flex-col gap-1">
          Across (stage left +)
          <input className={`${field} w-24`} value={x} onChange={(e) => setX(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1">
          Depth (upstage +)
          <input className={`${field} w-24`} value={y} onChange={(e) => setY(e.target.value)} />
        </label>
        <Button type="submit" variant="secondary">
          Find
        </Button>
      </form>
      {error ? (
        <p role="alert" className="text-danger">
          {error}
        </p>
      ) : null}
    </details>
  );
}

function SpotAnswerList({
  answer,
  units,
  onNote,
  stateWords,
}: {
  answer: ReturnType<typeof useSpot>;
  units: Units;
  onNote: (c: SpotContribution) => void;
  stateWords: (cueId: number | null) => string;
}) {
  if (answer.isPending) return <p aria-live="polite">Working it out…</p>;
  if (answer.isError)
    return (
      <p role="alert" className="text-danger">
        {(answer.error as Error).message}
      </p>
    );
  const a = answer.data;
  if (!a) return null;
  return (
    <div aria-live="polite" data-testid="spot-answer">
      <p>
        In {stateWords(a.cueId)}: {formatIlluminance(a.total, units)} in all on the show deck there
        {a.contributions.length ? "" : " — no unit reaches it"}.
      </p>
      {a.warnings.map((w) => (
        <p key={w} className="text-caution">
          {w}
        </p>
      ))}
      <ol className="mt-1 flex flex-col gap-1" aria-label="Units reaching the spot, most light first">
        {a.contributions.map((c, i) => (
          <li key={c.fixtureId} className="flex items-center gap-2" data-testid="spot-row">
            <span className="w-5 text-right text-muted">{i + 1}.</span>
            <span className="flex-1">
              {c.label}
              {c.channel != null ? ` · ch ${c.channel}` : ""}
              <span className="block text-xs tabular-nums text-muted">
                {formatIlluminance(c.lux, units)} · {Math.round(c.share * 100)} %
              </span>
            </span>
            <Button
              type="button"
              variant="secondary"
              className="min-h-8 px-2"
              onClick={() => onNote(c)}
              aria-label={`Note on ${c.label}`}
            >
              Note
            </Button>
          </li>
        ))}
      </ol>
      <p className="mt-1 text-xs text-muted">
        From the beam model on the show deck; real output varies with lamps, lenses and colour.
      </p>
    </div>
  );
}

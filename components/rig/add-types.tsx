"use client";

import { useState } from "react";
import { type AddedTypes, useAddStarterSet, useCopyTypes, useTypeSources } from "@/hooks/use-type-copies";
import { ApiError } from "@/lib/http/api-client";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import { Button } from "@/components/ui/button";

const lower = (s: string) => s.trim().toLowerCase();
const cone = (t: { coneMinDeg: number; coneMaxDeg: number }) =>
  t.coneMinDeg === t.coneMaxDeg ? `${t.coneMaxDeg}°` : `${t.coneMinDeg}–${t.coneMaxDeg}°`;

function outcome(r: AddedTypes): string {
  const added = r.fixtureTypes.length;
  const skipped = r.skipped.length ? ` Already here, so skipped: ${r.skipped.join(", ")}.` : "";
  return `${added ? `Added ${added} type${added === 1 ? "" : "s"}.` : "Nothing new to add."}${skipped}`;
}

/**
 * Ways to give a production fixture types: Throwline's generic starter shelf (all at once or one by one)
 * and a copy of another production's types. Names the production already has are skipped.
 */
export function AddTypes({ productionId, existingNames }: { productionId: number; existingNames: string[] }) {
  const have = new Set(existingNames.map(lower));
  const starter = useAddStarterSet(productionId);
  const missing = STARTER_TYPES.filter((t) => !have.has(lower(t.name)));
  const [message, setMessage] = useState<string | null>(null);
  const report = (p: Promise<AddedTypes>) =>
    p.then(
      (r) => setMessage(outcome(r)),
      (e) => setMessage(e instanceof ApiError ? e.message : "Could not add the types."),
    );
  return (
    <div className="flex flex-col gap-4" data-testid="add-types">
      <section aria-labelledby="starter-shelf-title">
        <h3 id="starter-shelf-title" className="text-sm font-semibold">
          Starter shelf
        </h3>
        <p className="text-xs text-muted">
          Generic types of Throwline&apos;s own with typical figures from memory — no brand and not a data sheet.
          Replace the figures with those of your own units.
        </p>
        {missing.length ? (
          <div className="mt-2 flex flex-wrap gap-2">
            <Button
              disabled={starter.isPending}
              onClick={() => report(starter.mutateAsync(missing.map((t) => t.name)))}
              data-testid="add-starter-set"
            >
              Add all {missing.length} starter type{missing.length === 1 ? "" : "s"}
            </Button>
            {missing.map((t) => (
              <Button
                key={t.name}
                variant="secondary"
                disabled={starter.isPending}
                title={`${t.family}, cone ${cone(t)}, ${t.wattage} W, ${t.weightKg} kg`}
                onClick={() => report(starter.mutateAsync([t.name]))}
              >
                + {t.name}
              </Button>
            ))}
          </div>
        ) : (
          <p className="mt-2 text-sm text-muted">Every starter type is in this production.</p>
        )}
      </section>
      <CopyFromProduction productionId={productionId} have={have} report={report} />
      {message ? (
        <p role="status" className="text-sm" data-testid="add-types-message">
          {message}
        </p>
      ) : null}
    </div>
  );
}

function CopyFromProduction({
  productionId,
  have,
  report,
}: {
  productionId: number;
  have: Set<string>;
  report: (p: Promise<AddedTypes>) => void;
}) {
  const [open, setOpen] = useState(false);
  const sources = useTypeSources(productionId, open);
  const copy = useCopyTypes(productionId);
  const [fromId, setFromId] = useState<number | null>(null);
  const [unticked, setUnticked] = useState<Set<string>>(new Set());
  const source = sources.data?.find((s) => s.productionId === fromId) ?? sources.data?.[0] ?? null;
  const copyable = source?.types.filter((t) => !have.has(lower(t.name))) ?? [];
  const chosen = copyable.filter((t) => !unticked.has(t.name));
  return (
    <details
      onToggle={(e) => setOpen((e.currentTarget as HTMLDetailsElement).open)}
      className="rounded-md border border-line p-2"
    >
      <summary className="cursor-pointer text-sm font-semibold">Copy types from another production</summary>
      {sources.isPending ? <p className="mt-2 text-sm text-muted">Looking at your other productions…</p> : null}
      {sources.error ? (
        <p role="alert" className="mt-2 text-sm text-danger">
          {sources.error.message}
        </p>
      ) : null}
      {sources.data && !sources.data.length ? (
        <p className="mt-2 text-sm text-muted">None of your other productions has fixture types yet.</p>
      ) : null}
      {source ? (
        <div className="mt-2 flex flex-col gap-2 text-sm">
          <label className="flex flex-col gap-1">
            <span>From</span>
            <select
              className="min-h-10 rounded-md border border-line bg-surface px-2"
              value={source.productionId}
              onChange={(e) => {
                setFromId(Number(e.target.value));
                setUnticked(new Set());
              }}
            >
              {sources.data?.map((s) => (
                <option key={s.productionId} value={s.productionId}>
                  {s.name}
                  {s.archived ? " (archived)" : ""} — {s.types.length} types
                </option>
              ))}
            </select>
          </label>
          <fieldset className="flex max-h-56 flex-col gap-1 overflow-y-auto">
            <legend className="sr-only">Types to copy</legend>
            {source.types.map((t) => {
              const here = have.has(lower(t.name));
              return (
                <label key={t.name} className={`flex items-center gap-2 ${here ? "text-muted" : ""}`}>
                  <input
                    type="checkbox"
                    disabled={here}
                    checked={!here && !unticked.has(t.name)}
                    onChange={(e) => {
                      const next = new Set(unticked);
                      if (e.target.checked) next.delete(t.name);
                      else next.add(t.name);
                      setUnticked(next);
                    }}
                  />
                  {t.name} <span className="text-xs text-muted">({cone(t)})</span>
                  {here ? <span className="text-xs">already here</span> : null}
                </label>
              );
            })}
          </fieldset>
          <div>
            <Button
              variant="secondary"
              disabled={!chosen.length || copy.isPending}
              onClick={() =>
                report(copy.mutateAsync({ fromProductionId: source.productionId, names: chosen.map((t) => t.name) }))
              }
              data-testid="copy-types"
            >
              Copy {chosen.length} type{chosen.length === 1 ? "" : "s"}
            </Button>
          </div>
        </div>
      ) : null}
    </details>
  );
}

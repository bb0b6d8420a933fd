"use client";

import Link from "next/link";
import { usePathname, useSearchParams } from "next/navigation";
import { useEffect, useMemo } from "react";
import { POINT_HUNG_KINDS } from "@/lib/rig/position-kinds";
import { useFocusFixtures } from "@/hooks/use-focus";
import { neighboursOf } from "@/lib/focus/shared-mark";
import { PoolPlan } from "@/components/focus/pool-plan";
import { toQuery } from "@/lib/focus/filters";
import { photoOf } from "@/lib/focus/chart-model";
import { keepFocusCallOffline } from "@/lib/offline/focus-worker";
import { rememberFocusProduction } from "@/lib/offline/last-focus";
import { withPending } from "@/lib/offline/outbox";
import { useOutbox } from "@/lib/offline/outbox-context";
import { ChartCard } from "./chart-card";
import { BeamFields } from "./beam-fields";
import { FocusControls } from "./focus-controls";
import { FocusPhoto } from "./focus-photo";
import { OutboxPanel } from "./outbox-panel";
import { orderForStrip, UnitStrip } from "./unit-strip";
import { browserTimeZone, useCharts, useInBrowser } from "./use-charts";
import type { FocusPageData } from "./types";

const idParam = (v: string | null) => (v && /^\d+$/.test(v) ? Number(v) : null);

/** The focus call on a tablet: follow one position unit by unit, mark each focused, keep notes. */
export function FocusCall({ data }: { data: FocusPageData }) {
  const pathname = usePathname();
  const params = useSearchParams();
  const { data: saved } = useFocusFixtures(data.production.id, data.fixtures);
  const outbox = useOutbox();
  // What the deck sees: the server's rows with this device's waiting edits on top.
  const fixtures = useMemo(
    () => saved.map((f) => withPending(f, outbox.byFixture.get(f.id))),
    [saved, outbox.byFixture],
  );
  const inBrowser = useInBrowser();

  const positionId = idParam(params.get("position")) ?? fixtures[0]?.positionId ?? null;
  const position = data.positions.find((p) => p.id === positionId);
  const units = useMemo(
    () =>
      orderForStrip(
        position?.kind,
        fixtures.filter((f) => f.positionId === positionId),
      ),
    [fixtures, positionId, position?.kind],
  );
  const current =
    units.find((f) => f.id === idParam(params.get("unit"))) ?? units.find((f) => !f.focused) ?? units[0] ?? null;
  const { charts, landmarks } = useCharts(data, current ? [current] : []);
  const chart = charts[0];

  // The page holds every position's units, so moving between units and positions asks nothing of the
  // server (the history API keeps Next's search params in step): it works the same with the network gone.
  const go = (next: { position?: number | null; unit?: number | null }) =>
    window.history.replaceState(
      null,
      "",
      `${pathname}?${toQuery({ position: next.position ?? positionId, unit: next.unit ?? undefined })}`,
    );
  const nextUnit = () => {
    const i = units.findIndex((f) => f.id === current?.id);
    const after = [...units.slice(i + 1), ...units.slice(0, i)].find((f) => !f.focused);
    if (after) go({ unit: after.id });
  };
  // A unit chosen for the user (the first not yet focused) is pinned in the address, so marking it focused
  // keeps it on screen for its notes instead of moving on to the next unfocused one.
  const unitInAddress = params.get("unit");
  // biome-ignore lint/correctness/useExhaustiveDependencies: pin once per unit chosen this way
  useEffect(() => {
    if (current && !unitInAddress) go({ unit: current.id });
  }, [current?.id, unitInAddress]);
  const step = (d: number) => {
    const i = units.findIndex((f) => f.id === current?.id);
    const target = units[i + d];
    if (target) go({ unit: target.id });
  };

  // Keep this position on the device (the page, its code, the fixtures read, its units' photos) while online.
  const photoUrls = units.flatMap((f) => {
    const photo = photoOf(f);
    return photo ? [photo.thumbSrc, photo.href] : [];
  });
  const keepKey = `${positionId}|${photoUrls.join(",")}`;
  // biome-ignore lint/correctness/useExhaustiveDependencies: keepKey stands for the position and its photos
  useEffect(() => {
    rememberFocusProduction(data.production.id);
    if (!navigator.onLine) return;
    void keepFocusCallOffline(data.production.id, [`/api/productions/${data.production.id}/fixtures`, ...photoUrls])
      .then((kept) => document.documentElement.setAttribute("data-focus-kept", kept ? "yes" : "no"))
      .catch(() => document.documentElement.setAttribute("data-focus-kept", "no"));
  }, [keepKey, data.production.id]);

  const vertical = !!position && POINT_HUNG_KINDS.has(position.kind);
  const done = units.filter((f) => f.focused).length;
  const neighbours = current ? neighboursOf(current, fixtures) : [];
  const pdf = `/api/productions/${data.production.id}/focus/pdf?${toQuery({ position: positionId, perPage: 4, paper: "A4", tz: inBrowser ? browserTimeZone() : undefined })}`;

  return (
    <main className="mx-auto flex w-full max-w-5xl flex-col gap-3 px-3 py-3" data-testid="focus-call">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col text-xs text-muted">
          Position
          <select
            className="min-h-12 rounded-md border border-line bg-surface px-2 text-base text-ink"
            value={positionId ?? ""}
            onChange={(e) => go({ position: Number(e.target.value), unit: null })}
            data-testid="call-position"
          >
            {data.positions.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <p className="text-sm text-muted" aria-live="polite" data-testid="call-progress">
          {done} of {units.length} focused
        </p>
        {/* Stays in the page so a screen reader hears each unit change (a region added with its text is not read). */}
        <p className="sr-only" aria-live="polite" data-testid="call-announce">
          {current
            ? `Unit ${current.unitNumber}${current.channel != null ? `, channel ${current.channel}` : ""}${current.focused ? ", focused" : ""}`
            : ""}
        </p>
        <div className="ml-auto flex gap-2">
          <Link
            href={`/productions/${data.production.id}/focus?${toQuery({ position: positionId })}`}
            className="inline-flex min-h-12 items-center rounded-md border border-line bg-surface px-3 text-sm text-ink"
          >
            All charts
          </Link>
          <a
            href={pdf}
            className="inline-flex min-h-12 items-center rounded-md border border-line bg-surface px-3 text-sm text-ink"
            data-testid="call-pdf"
          >
            PDF of this position
          </a>
        </div>
      </div>
      <OutboxPanel />
      {!current ? (
        <p className="rounded-md border border-line bg-surface p-6 text-sm text-muted">
          No units hang on this position.
        </p>
      ) : (
        <div className={vertical ? "grid grid-cols-[5.5rem_minmax(0,1fr)] gap-3" : "flex flex-col gap-3"}>
          <UnitStrip
            kind={position?.kind}
            units={units}
            currentId={current.id}
            waiting={outbox.byFixture}
            onPick={(id) => go({ unit: id })}
          />
          <div className="flex min-w-0 flex-col gap-3">
            <div className="flex gap-2">
              <button
                type="button"
                onClick={() => step(-1)}
                className="min-h-12 flex-1 rounded-md border border-line bg-surface text-sm text-ink"
                aria-label="Previous unit"
              >
                ← Previous
              </button>
              <button
                type="button"
                onClick={() => step(1)}
                className="min-h-12 flex-1 rounded-md border border-line bg-surface text-sm text-ink"
                aria-label="Next unit"
              >
                Next →
              </button>
            </div>
            {inBrowser && chart ? (
              <>
                <ChartCard
                  chart={chart}
                  landmarks={landmarks}
                  units={data.production.displayUnits}
                  productionId={data.production.id}
                />
                <div className="grid gap-3 sm:grid-cols-2">
                  <figure className="m-0" data-testid="pool-plan">
                    <div>
                      <PoolPlan
                        current={current}
                        neighbours={neighbours}
                        landmarks={landmarks}
                        stage={data.production}
                      />
                    </div>
                    <figcaption className="mt-1 text-xs text-muted">
                      {neighbours.length
                        ? `Also on this mark: ${neighbours.map((n) => `${n.positionName} unit ${n.unitNumber}`).join(", ")}`
                        : "No other unit aims at this mark."}
                    </figcaption>
                  </figure>
                  <FocusControls fixture={current} chart={chart} data={data} onNext={nextUnit} />
                </div>
                <div className="grid gap-3 sm:grid-cols-2">
                  <FocusPhoto fixture={current} chart={chart} data={data} />
                  <BeamFields fixture={current} data={data} />
                </div>
              </>
            ) : (
              <p className="text-sm text-muted">Drawing the chart…</p>
            )}
          </div>
        </div>
      )}
    </main>
  );
}

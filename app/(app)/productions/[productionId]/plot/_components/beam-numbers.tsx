"use client";

import { formatLength, type PlanePool, type Units } from "@/lib/optics";
import type { FixtureGeometry } from "@/lib/rig/fixture-geometry";

/** The server's numbers for one fixture (or, while a mark is dragged, the browser's preview of them). */
export function BeamNumbers({ g, units, isPreview }: { g: FixtureGeometry; units: Units; isPreview: boolean }) {
  const len = (m: number | null | undefined) => (m == null ? "—" : formatLength(m, units));
  const deg = (d: number | null) => (d == null ? "—" : `${d.toFixed(1)}°`);
  const rows: Array<[string, string, string]> = [
    ["Throw", len(g.throw), "throw"],
    ["Tilt (down from level)", deg(g.tiltDeg), "tilt"],
    ["Pan (plan bearing)", deg(g.panDeg), "pan"],
  ];
  return (
    <div data-testid="beam-numbers" data-preview={isPreview ? "yes" : "no"} className="text-sm">
      <p className="mb-1 text-xs text-muted">
        {isPreview ? "Preview while dragging — saved values follow on release." : "From the server."}
      </p>
      <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-0.5">
        {rows.map(([k, v, id]) => (
          <Row key={id} label={k} value={v} id={id} />
        ))}
      </dl>
      <PoolRows title="At the deck" pool={g.deck} units={units} id="deck" />
      <PoolRows title="At head height" pool={g.head} units={units} id="head" />
    </div>
  );
}

function Row({ label, value, id }: { label: string; value: string; id: string }) {
  return (
    <>
      <dt className="text-muted">{label}</dt>
      <dd className="text-right tabular-nums" data-testid={`num-${id}`}>
        {value}
      </dd>
    </>
  );
}

function PoolRows({ title, pool, units, id }: { title: string; pool: PlanePool | null; units: Units; id: string }) {
  const len = (m: number | null | undefined) => (m == null ? "—" : formatLength(m, units));
  return (
    <div className="mt-2">
      <h4 className="text-xs font-semibold text-muted">{title}</h4>
      {!pool ? (
        <p className="text-xs text-muted">No focus mark yet.</p>
      ) : pool.status !== "ok" ? (
        <p className="text-xs text-caution">{pool.reason}</p>
      ) : (
        <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-0.5">
          <Row label="Pool length (along the beam)" value={len(pool.lengthAlong)} id={`${id}-length`} />
          <Row label="Pool width (across)" value={len(pool.widthAcross)} id={`${id}-width`} />
          <Row label="Soft band, near side" value={len(pool.band?.near)} id={`${id}-near`} />
          <Row label="Soft band, far side" value={len(pool.band?.far)} id={`${id}-far`} />
          <Row label="Soft band, across" value={len(pool.band?.across)} id={`${id}-across`} />
        </dl>
      )}
    </div>
  );
}

"use client";

import {
  DIMMER_CURVE_WORDS,
  formatIlluminance,
  type AreaCoverage,
  type DimmerCurve,
  type LineSample,
} from "@/lib/optics";
import { flagWords } from "@/lib/studies/area-table";
import { heatColour, niceSteps } from "@/lib/studies/heat-colours";

type Units = "metric" | "imperial";

export function Legend({
  max,
  units,
  curves,
  mode,
  what,
}: {
  max: number;
  units: Units;
  curves: DimmerCurve[];
  mode: "light" | "difference";
  what: string;
}) {
  const ticks = niceSteps(max, 4);
  return (
    <div className="flex flex-col gap-1 text-xs text-muted" data-testid="heat-legend">
      <div className="font-medium text-ink">{what}</div>
      {mode === "light" ? (
        <div className="flex items-center gap-2">
          <div
            className="h-3 w-48 rounded"
            style={{
              background: `linear-gradient(to right, ${[0, 0.1, 0.25, 0.5, 0.75, 1].map((t) => heatColour(t)).join(", ")})`,
            }}
          />
          <span>0 – {formatIlluminance(max, units)}</span>
        </div>
      ) : (
        <div className="flex items-center gap-2">
          <div
            className="h-3 w-48 rounded"
            style={{ background: "linear-gradient(to right, rgb(40,110,220), transparent, rgb(230,150,30))" }}
          />
          <span>second darker ← → second brighter, up to ±{formatIlluminance(max, units)}</span>
        </div>
      )}
      {ticks.length > 0 && mode === "light" && (
        <div>Steps: {ticks.map((t) => formatIlluminance(t, units)).join(" · ")}</div>
      )}
      {curves.map((c) => (
        <div key={c}>Level to light: {DIMMER_CURVE_WORDS[c]}</div>
      ))}
    </div>
  );
}

const fmt = (v: number | null, units: Units) => (v === null ? "—" : formatIlluminance(v, units));
const num = (v: number | null, d: number) => (v === null ? "—" : Number.isFinite(v) ? v.toFixed(d) : "∞");

export function AreaTable({
  areas,
  units,
  selected,
  onSelect,
}: {
  areas: AreaCoverage[];
  units: Units;
  selected: number | null;
  onSelect: (id: number) => void;
}) {
  if (!areas.length)
    return <p className="text-sm text-muted">No acting areas yet: draw them on the plot to see their coverage here.</p>;
  return (
    <table className="w-full text-left text-sm" data-testid="area-table">
      <thead className="text-xs text-muted">
        <tr>
          <th className="py-1">Area</th>
          <th>Min</th>
          <th>Mean</th>
          <th>Max</th>
          <th title="Emin / Eavg (EN 12464-1, CIBSE)">Uniformity</th>
          <th title="Eavg : Emin, as IES publications often quote it">Avg : min</th>
          <th>Vs others</th>
          <th>Needs a look</th>
        </tr>
      </thead>
      <tbody>
        {areas.map((a) => (
          <tr
            key={a.id}
            onClick={() => onSelect(a.id)}
            aria-selected={selected === a.id}
            className={`cursor-pointer border-t border-line ${selected === a.id ? "bg-raised" : ""} ${a.flags.length ? "text-danger" : ""}`}
          >
            <td className="py-1">{a.name}</td>
            <td>{fmt(a.min, units)}</td>
            <td>{fmt(a.mean, units)}</td>
            <td>{fmt(a.max, units)}</td>
            <td>{num(a.uniformity, 2)}</td>
            <td>
              {a.averageToMinimum === null ? (a.count ? "∞ (dark spot)" : "—") : `${a.averageToMinimum.toFixed(1)} : 1`}
            </td>
            <td>{num(a.meanRatio, 2)}</td>
            <td>{flagWords(a.flags)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Light along the drawn line, one or two series, as a small SVG chart. */
export function LineChart({
  series,
  units,
}: {
  series: Array<{ name: string; samples: LineSample[]; colour: string }>;
  units: Units;
}) {
  const W = 560;
  const H = 160;
  const pad = 36;
  const length = Math.max(...series.map((s) => s.samples.at(-1)?.distance ?? 0), 0.01);
  const max = Math.max(1, ...series.flatMap((s) => s.samples.map((p) => p.value)));
  const x = (d: number) => pad + ((W - 2 * pad) * d) / length;
  const y = (v: number) => H - pad / 2 - ((H - pad) * v) / max;
  return (
    <figure className="text-xs text-muted" data-testid="line-profile">
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-xl" role="img" aria-label="Light along the line">
        <line x1={pad} x2={W - pad} y1={y(0)} y2={y(0)} stroke="currentColor" opacity={0.4} />
        <text x={2} y={y(max) + 4} fill="currentColor">
          {Math.round(max)} lx
        </text>
        <text x={2} y={y(0)} fill="currentColor">
          0
        </text>
        <text x={W - pad} y={H - 2} fill="currentColor" textAnchor="end">
          {length.toFixed(2)} m
        </text>
        {series.map((s) => (
          <polyline
            key={s.name}
            fill="none"
            stroke={s.colour}
            strokeWidth={2}
            points={s.samples.map((p) => `${x(p.distance)},${y(p.value)}`).join(" ")}
          />
        ))}
      </svg>
      <figcaption className="flex gap-4">
        {series.map((s) => {
          const low = s.samples.reduce((m, p) => (p.value < m.value ? p : m), s.samples[0]);
          return (
            <span key={s.name} style={{ color: s.colour }}>
              {s.name}: lowest {formatIlluminance(low?.value ?? 0, units)} at {low?.distance.toFixed(2)} m
            </span>
          );
        })}
      </figcaption>
    </figure>
  );
}

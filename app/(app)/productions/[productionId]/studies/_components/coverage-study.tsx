"use client";

import dynamic from "next/dynamic";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useMemo, useRef, useState } from "react";
import { apiFetch } from "@/lib/http/api-client";
import {
  differenceGrid,
  faceLightAt,
  formatIlluminance,
  illuminanceAt,
  lineProfile,
  type GridCells,
  type LitBeam,
  type Point,
} from "@/lib/optics";
import type { CoverageResult, GridWire, StudyLight } from "@/lib/dto/studies";
import { base64ToFloat32, base64ToInt32 } from "@/lib/studies/wire";
import { Button } from "@/components/ui/button";
import { AreaTable, Legend, LineChart } from "./coverage-views";
import { ColourList } from "./colour-list";
import { drawContours, drawDarkSpot, drawHeat, drawLine, drawUnits, heatImage } from "./heat-draw";
import { LightPicker } from "./light-picker";
import type { StudyCanvasHandle } from "./study-canvas";
import type { LightSource, StudiesProps } from "./types";

const StudyCanvas = dynamic(() => import("./study-canvas").then((m) => m.StudyCanvas), {
  ssr: false,
  loading: () => <div className="h-[520px] animate-pulse rounded-md bg-raised" />,
});

type Reply = CoverageResult & { stateLabel: string; displayUnits: "metric" | "imperial" };
type Decoded = GridCells & { min: number; max: number; mean: number; key?: Int32Array; keyLux?: Float32Array };
type MeasureKind = "deck" | "head" | "face";

function decode(w: GridWire): Decoded {
  return {
    ...w,
    values: base64ToFloat32(w.values),
    key: w.key ? base64ToInt32(w.key) : undefined,
    keyLux: w.keyLux ? base64ToFloat32(w.keyLux) : undefined,
  };
}

export function beamOf(l: StudyLight): LitBeam {
  return {
    source: l.source,
    focus: l.focus,
    coneDeg: l.coneDeg,
    softnessDeg: l.softnessDeg,
    peakCandela: l.peakCandela,
    level: l.output,
    family: l.family as LitBeam["family"],
  };
}

function useCoverage(
  productionId: number,
  source: LightSource,
  measure: MeasureKind,
  facingDeg: number,
  minUniformity: number,
  meanRatio: number,
  enabled = true,
) {
  const body = {
    source,
    measure: measure === "face" ? { kind: "face" as const, facingDeg } : { kind: measure },
    resolution: 0.1,
    minUniformity,
    meanRatio,
  };
  return {
    body,
    query: useQuery({
      queryKey: ["productions", productionId, "studies", "coverage", body],
      queryFn: () =>
        apiFetch<Reply>(`/api/productions/${productionId}/studies/coverage`, { method: "POST", json: body }),
      placeholderData: keepPreviousData,
      enabled,
    }),
  };
}

function download(href: string, name: string) {
  const a = document.createElement("a");
  a.href = href;
  a.download = name;
  a.click();
}

export function CoverageStudy(p: StudiesProps) {
  const first: LightSource = p.cues[0] ? { kind: "cue", cueId: p.cues[0].id } : { kind: "full" };
  const [source, setSource] = useState<LightSource>(first);
  const [sourceB, setSourceB] = useState<LightSource>({ kind: "full" });
  const [compare, setCompare] = useState<"none" | "side" | "difference">("none");
  const [measure, setMeasure] = useState<MeasureKind>("deck");
  const [facingDeg, setFacingDeg] = useState(-90);
  const [minU, setMinU] = useState(0.5);
  const [ratio, setRatio] = useState(2);
  const [contourText, setContourText] = useState("");
  const [drawingLine, setDrawingLine] = useState(false);
  const [line, setLine] = useState<{ a: Point; b: Point } | null>(null);
  const dragging = useRef(false);
  const [selectedArea, setSelectedArea] = useState<number | null>(null);
  const [probe, setProbe] = useState<Point | null>(null);
  const canvasA = useRef<StudyCanvasHandle>(null);

  const A = useCoverage(p.productionId, source, measure, facingDeg, minU, ratio);
  const B = useCoverage(p.productionId, sourceB, measure, facingDeg, minU, ratio, compare !== "none");
  const a = A.query.data;
  const b = compare !== "none" ? B.query.data : undefined;
  const gridA = useMemo(() => (a ? decode(a.grid) : null), [a]);
  const gridB = useMemo(() => (b ? decode(b.grid) : null), [b]);
  const diff = useMemo(
    () => (compare === "difference" && gridA && gridB ? differenceGrid(gridA, gridB) : null),
    [compare, gridA, gridB],
  );
  const scaleMax = Math.max(gridA?.max ?? 0, gridB?.max ?? 0, 1);
  const diffMax = useMemo(() => (diff ? Math.max(1, ...Array.from(diff, Math.abs)) : 1), [diff]);
  const imgA = useMemo(
    () =>
      gridA && !diff
        ? heatImage(gridA, gridA.values, scaleMax, "light")
        : gridA && diff
          ? heatImage(gridA, diff, diffMax, "difference")
          : null,
    [gridA, diff, scaleMax, diffMax],
  );
  const imgB = useMemo(
    () => (gridB && compare === "side" ? heatImage(gridB, gridB.values, scaleMax, "light") : null),
    [gridB, compare, scaleMax],
  );
  const contours = useMemo(
    () =>
      contourText
        .split(/[\s,;]+/)
        .map(Number)
        .filter((v) => Number.isFinite(v) && v > 0)
        .slice(0, 8),
    [contourText],
  );

  const selected = a?.areas.find((x) => x.id === selectedArea) ?? null;
  const planeZ = a ? a.deckHeight + a.measure.planeHeight : 0;
  const covering = useMemo(() => {
    if (!a || !selected?.minAt) return [];
    const at = { ...selected.minAt, z: planeZ };
    return a.lights
      .map((l, k) => ({
        k,
        light: l,
        lux: measure === "face" ? faceLightAt(at, facingDeg, [beamOf(l)]).total : illuminanceAt(at, [beamOf(l)]),
      }))
      .filter((c) => c.lux > 0.05)
      .sort((x, y) => y.lux - x.lux)
      .slice(0, 12);
  }, [a, selected, planeZ, measure, facingDeg]);

  const keyAtSpot = useMemo(() => {
    if (!gridA?.key || !a || !selected?.minAt) return null;
    const col = Math.round((selected.minAt.x - gridA.originX) / gridA.resolution);
    const row = Math.round((selected.minAt.y - gridA.originY) / gridA.resolution);
    const k = row * gridA.cols + col;
    const key = gridA.key[k];
    const total = gridA.values[k];
    const keyLux = gridA.keyLux![k];
    return key >= 0 ? { light: a.lights[key], ratio: total - keyLux > 0 ? keyLux / (total - keyLux) : null } : null;
  }, [gridA, a, selected]);

  // The reading under the pointer: the light there and, for faces, where the key comes from and key : fill.
  const reading = useMemo(() => {
    if (!probe || !gridA || !a) return null;
    const col = Math.round((probe.x - gridA.originX) / gridA.resolution);
    const row = Math.round((probe.y - gridA.originY) / gridA.resolution);
    if (col < 0 || row < 0 || col >= gridA.cols || row >= gridA.rows) return null;
    const k = row * gridA.cols + col;
    const total = gridA.values[k];
    const key = gridA.key ? gridA.key[k] : -1;
    const fill = total - (gridA.keyLux ? gridA.keyLux[k] : 0);
    return {
      at: probe,
      total,
      key: key >= 0 ? a.lights[key] : null,
      ratio: key >= 0 && fill > 0 ? gridA.keyLux![k] / fill : null,
    };
  }, [probe, gridA, a]);
  const readingText = !reading
    ? "Point at the stage for a reading."
    : `At ${reading.at.x.toFixed(2)} m, ${reading.at.y.toFixed(2)} m: ${formatIlluminance(reading.total, p.units)}` +
      (reading.key
        ? `; key ${reading.key.unitLabel}, key to fill ${reading.ratio === null ? "— (no fill)" : `${reading.ratio.toFixed(1)} : 1`}`
        : "");

  const profiles = useMemo(() => {
    if (!line || !gridA) return [];
    const out = [{ name: a?.stateLabel ?? "A", samples: lineProfile(gridA, line.a, line.b), colour: "#d08a1e" }];
    if (gridB) out.push({ name: b?.stateLabel ?? "B", samples: lineProfile(gridB, line.a, line.b), colour: "#3a7bd5" });
    return out;
  }, [line, gridA, gridB, a, b]);

  const what = (r: Reply | undefined) =>
    !r
      ? ""
      : `${r.stateLabel} — ${r.measure.kind === "face" ? `light on faces ${r.measure.planeHeight} m above the deck, facing ${r.measure.facingDeg}°` : r.measure.kind === "head" ? `light at head height (${r.measure.planeHeight} m)` : "light on the deck"}${r.deckHeight ? `; show deck ${r.deckHeight} m up` : ""}`;

  const overlay = (g: Decoded | null, img: HTMLCanvasElement | null, lights: StudyLight[], showSpot: boolean) => ({
    under: (ctx: CanvasRenderingContext2D, v: Parameters<typeof drawHeat>[1]) => {
      if (g && img) drawHeat(ctx, v, g, img);
    },
    over: (ctx: CanvasRenderingContext2D, v: Parameters<typeof drawHeat>[1], pal: Parameters<typeof drawUnits>[3]) => {
      if (g && contours.length) drawContours(ctx, v, g, diff && showSpot ? diff : g.values, contours, pal);
      drawUnits(ctx, v, lights, pal, new Set(showSpot ? covering.map((c) => c.k) : []));
      if (line) drawLine(ctx, v, line.a, line.b, pal);
      if (showSpot && reading?.key) drawLine(ctx, v, reading.at, reading.key.source, pal);
      if (showSpot && selected?.minAt)
        drawDarkSpot(
          ctx,
          v,
          selected.minAt,
          covering.map((c) => c.light.source),
          pal,
        );
    },
  });

  const exportTable = async (format: "csv" | "xlsx") => {
    const res = await fetch(`/api/productions/${p.productionId}/studies/coverage/areas`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ ...A.body, format }),
    });
    if (!res.ok) return;
    download(URL.createObjectURL(await res.blob()), `coverage-areas.${format}`);
  };

  const pointer = {
    onPointerDown: (pt: Point) => {
      if (!drawingLine) return false;
      dragging.current = true;
      setLine({ a: pt, b: pt });
      return true;
    },
    onPointerMove: (pt: Point) => {
      if (dragging.current) setLine((l) => (l ? { a: l.a, b: pt } : l));
      else setProbe(pt);
    },
    onPointerUp: () => {
      dragging.current = false;
      setDrawingLine(false);
    },
  };

  const error = A.query.error ?? B.query.error;
  return (
    <section className="flex flex-col gap-3" aria-label="Coverage study">
      <div className="flex flex-wrap items-end gap-3 rounded-md border border-line bg-surface p-3">
        <LightPicker label="Light" cues={p.cues} value={source} onChange={setSource} />
        <label className="flex flex-col text-xs text-muted">
          Measure
          <select
            className="mt-1 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
            value={measure}
            onChange={(e) => setMeasure(e.target.value as MeasureKind)}
          >
            <option value="deck">On the deck</option>
            <option value="head">At head height ({p.heights.head} m)</option>
            <option value="face">On faces ({p.heights.face} m)</option>
          </select>
        </label>
        {measure === "face" && (
          <label className="flex flex-col text-xs text-muted">
            Faces look toward (°, −90 = audience)
            <input
              type="number"
              step={5}
              min={-360}
              max={360}
              className="mt-1 w-28 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
              value={facingDeg}
              onChange={(e) => Number.isFinite(e.target.valueAsNumber) && setFacingDeg(e.target.valueAsNumber)}
            />
          </label>
        )}
        <label className="flex flex-col text-xs text-muted">
          Compare
          <select
            className="mt-1 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
            value={compare}
            onChange={(e) => setCompare(e.target.value as typeof compare)}
          >
            <option value="none">No comparison</option>
            <option value="side">Side by side</option>
            <option value="difference">Difference (second − first)</option>
          </select>
        </label>
        {compare !== "none" && <LightPicker label="Second light" cues={p.cues} value={sourceB} onChange={setSourceB} />}
        <label className="flex flex-col text-xs text-muted">
          Flag uniformity below
          <input
            type="number"
            step={0.05}
            min={0}
            max={1}
            className="mt-1 w-20 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
            value={minU}
            onChange={(e) =>
              Number.isFinite(e.target.valueAsNumber) && setMinU(Math.min(1, Math.max(0, e.target.valueAsNumber)))
            }
          />
        </label>
        <label className="flex flex-col text-xs text-muted">
          Flag mean beyond × others
          <input
            type="number"
            step={0.5}
            min={1}
            max={100}
            className="mt-1 w-20 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
            value={ratio}
            onChange={(e) => Number.isFinite(e.target.valueAsNumber) && setRatio(Math.max(1, e.target.valueAsNumber))}
          />
        </label>
        <label className="flex flex-col text-xs text-muted">
          Contours (lx)
          <input
            className="mt-1 w-32 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
            placeholder="100 300 500"
            value={contourText}
            onChange={(e) => setContourText(e.target.value)}
          />
        </label>
        <Button
          variant={drawingLine ? "primary" : "secondary"}
          onClick={() => setDrawingLine((d) => !d)}
          aria-pressed={drawingLine}
        >
          {drawingLine ? "Drag across the stage…" : "Draw a line"}
        </Button>
      </div>

      {error && (
        <p role="alert" className="text-sm text-danger">
          {error.message}
        </p>
      )}
      {a?.warnings.map((w) => (
        <p key={w} className="text-sm text-caution" role="status">
          {w}
        </p>
      ))}

      <div
        className={`grid gap-3 ${compare === "side" ? "lg:grid-cols-2" : ""}`}
        data-testid="coverage-result"
        data-state={A.query.isFetching ? "loading" : a ? "ready" : "empty"}
      >
        <div className="flex min-w-0 flex-col gap-2">
          <StudyCanvas
            ref={canvasA}
            label={`Heat map: ${what(a)}`}
            stage={p.stage}
            units={p.units}
            areas={p.areas}
            {...overlay(gridA, imgA, a?.lights ?? [], true)}
            {...pointer}
          />
          <p className="min-h-5 text-xs text-muted" data-testid="probe">
            {readingText}
          </p>
          {a && (
            <Legend
              max={diff ? diffMax : scaleMax}
              units={p.units}
              curves={a.curves}
              mode={diff ? "difference" : "light"}
              what={diff ? `Difference: ${b?.stateLabel ?? "…"} minus ${a.stateLabel}` : what(a)}
            />
          )}
        </div>
        {compare === "side" && (
          <div className="flex min-w-0 flex-col gap-2">
            <StudyCanvas
              label={`Heat map: ${what(b)}`}
              stage={p.stage}
              units={p.units}
              areas={p.areas}
              {...overlay(gridB, imgB, b?.lights ?? [], false)}
              {...pointer}
            />
            {b && <Legend max={scaleMax} units={p.units} curves={b.curves} mode="light" what={what(b)} />}
          </div>
        )}
      </div>

      <div className="flex flex-wrap gap-2">
        <Button
          variant="secondary"
          onClick={() => {
            const png = canvasA.current?.toPng();
            if (png) download(png, "coverage-heat-map.png");
          }}
        >
          Save heat map (PNG)
        </Button>
        <Button variant="secondary" onClick={() => exportTable("csv")}>
          Area table (CSV)
        </Button>
        <Button variant="secondary" onClick={() => exportTable("xlsx")}>
          Area table (.xlsx)
        </Button>
      </div>

      {profiles.length > 0 && <LineChart series={profiles} units={p.units} />}

      {a && (
        // A wide table scrolls inside its own box rather than the page (tablet portrait).
        // biome-ignore lint/a11y/noNoninteractiveTabindex: a box that scrolls must be reachable from the keyboard (WCAG 2.1.1)
        <section className="min-w-0 overflow-x-auto" aria-label="Acting areas" tabIndex={0}>
          <AreaTable areas={a.areas} units={p.units} selected={selectedArea} onSelect={setSelectedArea} />
        </section>
      )}
      {selected && (
        <div className="rounded-md border border-line bg-surface p-3 text-sm" data-testid="dark-spot">
          <p className="font-medium">
            {selected.name}: darkest at{" "}
            {selected.minAt ? `${selected.minAt.x.toFixed(2)} m, ${selected.minAt.y.toFixed(2)} m` : "—"} (
            {selected.min?.toFixed(1) ?? "—"} lx)
          </p>
          {keyAtSpot && (
            <p>
              Key there: {keyAtSpot.light.unitLabel}; key to fill{" "}
              {keyAtSpot.ratio === null ? "— (no fill)" : `${keyAtSpot.ratio.toFixed(1)} : 1`}
            </p>
          )}
          {covering.length ? (
            <ul className="mt-1 list-disc pl-5">
              {covering.map((c) => (
                <li key={c.light.fixtureId}>
                  {c.light.unitLabel}
                  {c.light.channel != null ? ` (ch ${c.light.channel})` : ""}: {c.lux.toFixed(1)} lx
                </li>
              ))}
            </ul>
          ) : (
            <p>No unit reaches this spot in this state.</p>
          )}
        </div>
      )}
      <ColourList productionId={p.productionId} canEdit={p.canRun} initial={p.colours} />
    </section>
  );
}

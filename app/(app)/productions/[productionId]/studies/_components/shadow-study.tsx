"use client";

import dynamic from "next/dynamic";
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { useMemo, useRef, useState } from "react";
import { ApiError, apiFetch } from "@/lib/http/api-client";
import type { OccluderShadows, PerformerMarkDto, ScenicPanelDto, ShadowResult } from "@/lib/dto/studies";
import { shadowStudy } from "@/lib/studies/shadows";
import { formatLength, parseLength, type Point, type Units } from "@/lib/optics";
import { roundDefaultLength } from "@/lib/optics/round-length";
import { Button } from "@/components/ui/button";
import { drawUnits } from "./heat-draw";
import { drawOccluders, drawShadows } from "./shadow-draw";
import { LightPicker } from "./light-picker";
import type { LightSource, StudiesProps } from "./types";

const StudyCanvas = dynamic(() => import("./study-canvas").then((m) => m.StudyCanvas), {
  ssr: false,
  loading: () => <div className="h-[520px] animate-pulse rounded-md bg-raised" />,
});

type Reply = ShadowResult & { stateLabel: string; performers: PerformerMarkDto[]; panels: ScenicPanelDto[] };
/** Fewer sides and lens samples while a mark is dragged: the preview stays smooth, the server's answer follows. */
const LIVE = { sides: 12, lensSamples: 8 };

export function ShadowStudy(p: StudiesProps) {
  const qc = useQueryClient();
  const [source, setSource] = useState<LightSource>(
    p.cues[0] ? { kind: "cue", cueId: p.cues[0].id } : { kind: "full" },
  );
  const key = ["productions", p.productionId, "studies", "shadows", source];
  const q = useQuery({
    queryKey: key,
    queryFn: () =>
      apiFetch<Reply>(`/api/productions/${p.productionId}/studies/shadows`, { method: "POST", json: { source } }),
    placeholderData: keepPreviousData,
  });
  const data = q.data;
  const [drag, setDrag] = useState<{ id: number; at: Point } | null>(null);
  const [activeId, setActiveId] = useState<number | null>(null);
  const [selectedFixture, setSelectedFixture] = useState<number | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const grabbed = useRef<number | null>(null);

  const performers = useMemo(
    () => (data?.performers ?? []).map((m) => (drag && m.id === drag.id ? { ...m, x: drag.at.x, y: drag.at.y } : m)),
    [data, drag],
  );
  const occluders: OccluderShadows[] = useMemo(() => {
    if (!data) return [];
    if (!drag) return data.occluders;
    // Live: only the dragged performer is recomputed here, with lib/optics, as the pointer moves.
    const moved = performers.filter((m) => m.id === drag.id);
    const live = shadowStudy({
      lights: data.lights,
      performers: moved,
      panels: [],
      backWallY: data.backWallY,
      deckHeight: data.deckHeight,
      outlines: LIVE,
    });
    return data.occluders.map((o) => (o.kind === "performer" && o.id === drag.id ? live[0] : o));
  }, [data, drag, performers]);
  const active = activeId ?? performers[0]?.id ?? null;
  const activeShadows = occluders.find((o) => o.kind === "performer" && o.id === active) ?? occluders[0];
  const refresh = () => qc.invalidateQueries({ queryKey: ["productions", p.productionId, "studies", "shadows"] });

  const saveMark = async (id: number, changes: Partial<PerformerMarkDto>) => {
    const mark = data?.performers.find((m) => m.id === id);
    if (!mark) return;
    try {
      await apiFetch(`/api/productions/${p.productionId}/performer-marks/${id}`, {
        method: "PATCH",
        json: { version: mark.version, ...changes },
      });
      setMessage(null);
    } catch (err) {
      setMessage(
        err instanceof ApiError && err.status === 409
          ? "Someone else changed this mark meanwhile; showing their version."
          : err instanceof Error
            ? err.message
            : "Could not save the mark.",
      );
    }
    await refresh();
    setDrag(null);
  };

  const addPerformer = async () => {
    const n = (data?.performers.length ?? 0) + 1;
    try {
      await apiFetch(`/api/productions/${p.productionId}/performer-marks`, {
        method: "POST",
        json: { name: `Performer ${n}`, x: 0, y: Math.min(3, p.stage.stageDepth / 2) },
      });
    } catch (err) {
      setMessage(err instanceof Error ? err.message : "Could not add the performer.");
    }
    refresh();
  };
  const removeRow = async (kind: "performer-marks" | "scenic-panels", id: number) => {
    await apiFetch(`/api/productions/${p.productionId}/${kind}/${id}`, { method: "DELETE" }).catch(() => null);
    refresh();
  };

  const pick = (pt: Point) => {
    let best: number | null = null;
    let bestD = 0.6; // metres: a generous grab radius for a finger on a tablet
    for (const m of performers) {
      const d = Math.hypot(m.x - pt.x, m.y - pt.y);
      if (d < bestD) [best, bestD] = [m.id, d];
    }
    return best;
  };

  const fmt = (m: number | null) => (m === null ? "—" : formatLength(m, p.units));
  return (
    <section className="flex flex-col gap-3" aria-label="Shadow study">
      <div className="flex flex-wrap items-end gap-3 rounded-md border border-line bg-surface p-3">
        <LightPicker label="Light" cues={p.cues} value={source} onChange={setSource} />
        {p.canRun && (
          <Button variant="secondary" onClick={addPerformer}>
            Add a performer
          </Button>
        )}
        {p.canRun && <PanelForm productionId={p.productionId} units={p.units} onSaved={refresh} />}
      </div>
      {message && (
        <p role="alert" className="text-sm text-danger">
          {message}
        </p>
      )}
      {data?.warnings.map((w) => (
        <p key={w} className="text-sm text-caution">
          {w}
        </p>
      ))}
      <p className="text-xs text-muted">
        Drag a performer to move them; the shadows follow. Lens sizes come from each unit&apos;s type. Back wall at{" "}
        {fmt(data?.backWallY ?? null)} from the datum.
      </p>
      <div
        className="grid gap-3 lg:grid-cols-[3fr_2fr]"
        data-testid="shadow-result"
        data-state={q.isFetching ? "loading" : data ? "ready" : "empty"}
      >
        <StudyCanvas
          label={`Shadows: ${data?.stateLabel ?? ""}`}
          stage={p.stage}
          units={p.units}
          areas={p.areas}
          over={(ctx, v, pal) => {
            drawShadows(ctx, v, occluders, pal, selectedFixture);
            drawUnits(
              ctx,
              v,
              data?.lights ?? [],
              pal,
              new Set(data?.lights.flatMap((l, k) => (l.fixtureId === selectedFixture ? [k] : [])) ?? []),
            );
            drawOccluders(ctx, v, performers, data?.panels ?? [], pal, drag?.id ?? active);
          }}
          onPointerDown={(pt) => {
            if (!p.canRun) return false;
            const id = pick(pt);
            grabbed.current = id;
            if (id === null) return false;
            setActiveId(id);
            setDrag({ id, at: pt });
            return true;
          }}
          onPointerMove={(pt) => {
            if (grabbed.current !== null) setDrag({ id: grabbed.current, at: pt });
          }}
          onPointerUp={(pt) => {
            const id = grabbed.current;
            grabbed.current = null;
            if (id !== null) saveMark(id, { x: Math.round(pt.x * 100) / 100, y: Math.round(pt.y * 100) / 100 });
          }}
        />
        <div className="flex min-w-0 flex-col gap-2 text-sm">
          <ul className="flex flex-col gap-1" aria-label="Performers and scenery">
            {(data?.performers ?? []).map((m) => (
              <li
                key={m.id}
                className={`flex flex-wrap items-center gap-2 rounded border border-line px-2 py-1 ${m.id === active ? "bg-raised" : ""}`}
              >
                <button
                  type="button"
                  className="font-medium underline-offset-2 hover:underline"
                  onClick={() => setActiveId(m.id)}
                >
                  {m.name}
                </button>
                <span className="text-xs text-muted">
                  {fmt(m.x)} × {fmt(m.y)}
                </span>
                <LengthInput
                  label="Height"
                  units={p.units}
                  value={m.height}
                  disabled={!p.canRun}
                  onCommit={(v) => saveMark(m.id, { height: v })}
                />
                <LengthInput
                  label="Shoulders"
                  units={p.units}
                  value={m.shoulderWidth}
                  disabled={!p.canRun}
                  onCommit={(v) => saveMark(m.id, { shoulderWidth: v })}
                />
                {p.canRun && (
                  <Button variant="quiet" onClick={() => removeRow("performer-marks", m.id)}>
                    Remove
                  </Button>
                )}
              </li>
            ))}
            {(data?.panels ?? []).map((s) => (
              <li key={`panel-${s.id}`} className="flex items-center gap-2 rounded border border-line px-2 py-1">
                <span className="font-medium">{s.name}</span>
                <span className="text-xs text-muted">panel {fmt(s.height)} high</span>
                {p.canRun && (
                  <Button variant="quiet" onClick={() => removeRow("scenic-panels", s.id)}>
                    Remove
                  </Button>
                )}
              </li>
            ))}
          </ul>
          {activeShadows ? (
            // biome-ignore lint/a11y/noNoninteractiveTabindex: a box that scrolls must be reachable from the keyboard (WCAG 2.1.1)
            <section className="overflow-x-auto" aria-label="Shadows of the chosen performer or panel" tabIndex={0}>
              <table className="w-full text-left text-xs" data-testid="shadow-table">
                <caption className="text-left text-sm font-medium">Shadows of {activeShadows.name}</caption>
                <thead className="text-muted">
                  <tr>
                    <th>Unit</th>
                    <th>Length</th>
                    <th>Soft edge at tip</th>
                    <th>Hard core width</th>
                    <th>On the back wall</th>
                  </tr>
                </thead>
                <tbody>
                  {activeShadows.shadows.map((s) => (
                    <tr
                      key={s.fixtureId}
                      onClick={() => setSelectedFixture(s.fixtureId)}
                      className={`cursor-pointer border-t border-line ${selectedFixture === s.fixtureId ? "bg-raised" : ""}`}
                    >
                      <td className="py-0.5">{s.unitLabel}</td>
                      <td>{s.lands === "unbounded" ? "to the horizon" : fmt(s.length)}</td>
                      <td>{fmt(s.penumbraWidth)}</td>
                      <td>{s.umbraWidth === 0 ? "none (all soft)" : fmt(s.umbraWidth)}</td>
                      <td className={s.lands === "wall" ? "font-medium text-danger" : ""}>
                        {s.lands === "wall"
                          ? `yes, ${fmt(s.wallHeight)} up`
                          : s.lands === "none"
                            ? (s.reason ?? "—")
                            : "no"}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </section>
          ) : (
            <p className="text-muted">Add a performer or a panel to see the shadows each lit unit casts.</p>
          )}
        </div>
      </div>
    </section>
  );
}

/** A length typed in the production's units (3.2, 320 cm, 5' 9"), saved in metres; a bad one is named, not sent. */
function LengthInput({
  label,
  value,
  units,
  disabled,
  onCommit,
}: {
  label: string;
  value: number;
  units: Units;
  disabled: boolean;
  onCommit: (v: number) => void;
}) {
  const [text, setText] = useState(formatLength(value, units));
  const [error, setError] = useState<string | null>(null);
  return (
    <label className="flex items-center gap-1 text-xs text-muted">
      {label}
      <input
        className="w-20 rounded border border-line bg-surface px-1 py-0.5 text-ink aria-invalid:border-danger"
        value={text}
        disabled={disabled}
        aria-invalid={error ? true : undefined}
        title={error ?? undefined}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => {
          try {
            const v = parseLength(text, units === "metric" ? "m" : "ft");
            setError(null);
            if (Math.abs(v - value) > 1e-9) onCommit(v);
          } catch (err) {
            setError(`${label}: ${(err as Error).message}`);
          }
        }}
      />
      {error ? (
        <span role="alert" className="text-danger">
          {error}
        </span>
      ) : null}
    </label>
  );
}

function PanelForm({ productionId, units, onSaved }: { productionId: number; units: Units; onSaved: () => void }) {
  const [open, setOpen] = useState(false);
  // Starting figures in round values of the production's units (2 m → 6' 6"; 3 m → 10' 0").
  const start = (m: number) => formatLength(roundDefaultLength(m, units), units);
  const [f, setF] = useState(() => ({
    name: "",
    x1: start(-2),
    y1: start(6),
    x2: start(2),
    y2: start(6),
    height: start(3),
  }));
  const [error, setError] = useState<string | null>(null);
  if (!open)
    return (
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Add a scenery panel
      </Button>
    );
  const unitWord = units === "metric" ? "m" : "ft and in";
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    try {
      const length = (k: "x1" | "y1" | "x2" | "y2" | "height") => {
        try {
          return parseLength(f[k], units === "metric" ? "m" : "ft");
        } catch (err) {
          throw new RangeError(`${k === "height" ? "Height" : k}: ${(err as Error).message}`);
        }
      };
      const body = {
        name: f.name,
        x1: length("x1"),
        y1: length("y1"),
        x2: length("x2"),
        y2: length("y2"),
        height: length("height"),
      };
      await apiFetch(`/api/productions/${productionId}/scenic-panels`, { method: "POST", json: body });
      setOpen(false);
      setError(null);
      onSaved();
    } catch (err) {
      setError(
        err instanceof ApiError
          ? [err.message, ...Object.values(err.fieldErrors).flat()].join(" ")
          : err instanceof RangeError
            ? err.message
            : "Could not save the panel.",
      );
    }
  };
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2 text-xs text-muted">
      {(["name", "x1", "y1", "x2", "y2", "height"] as const).map((k) => (
        <label key={k} className="flex flex-col">
          {k === "name" ? "Panel name" : k === "height" ? `Height (${unitWord})` : `${k} (${unitWord})`}
          <input
            className={`mt-1 rounded border border-line bg-surface px-1 py-1 text-sm text-ink ${k === "name" ? "w-32" : "w-20"}`}
            value={f[k]}
            onChange={(e) => setF({ ...f, [k]: e.target.value })}
          />
        </label>
      ))}
      <Button type="submit" variant="secondary">
        Save panel
      </Button>
      <span aria-live="polite" className="text-danger">
        {error}
      </span>
    </form>
  );
}

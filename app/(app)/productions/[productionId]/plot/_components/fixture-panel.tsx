"use client";

import { useState } from "react";
import { describePoint, formatLength, parseLength } from "@/lib/optics";
import { markForThrow } from "@/lib/plot/throw-to-mark";
import { LENS_HEIGHT_RULE } from "@/lib/rig/mounting";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import { NotesButton } from "@/components/notes/notes-button";
import { HistoryLink } from "@/components/revisions/history-link";
import { BeamNumbers } from "./beam-numbers";
import { PanelField, PanelSection } from "./panel-field";
import type { PanelProps } from "./panel-props";

const numberOrNull = (text: string, what: string, opts: { int?: boolean } = {}): number | null => {
  if (text === "") return null;
  const n = Number(text.replace(/°$/, ""));
  if (!Number.isFinite(n) || (opts.int && !Number.isInteger(n)))
    throw new RangeError(`${what} must be a ${opts.int ? "whole " : ""}number.`);
  return n;
};

/** The same limits the API enforces, said at the field before the request goes out. */
const inRange = (n: number | null, what: string, min: number, max: number) => {
  if (n !== null && !(n > min && n < max))
    throw new RangeError(`${what} must be more than ${Math.max(0, min)}° and less than ${max}°.`);
  return n;
};

export function FixturePanel(p: PanelProps & { fixture: PlotFixture }) {
  const f = p.fixture;
  const units = p.production.displayUnits;
  const unit = units === "metric" ? "m" : "ft";
  const type = p.data.fixtureTypes.find((t) => t.id === f.fixtureTypeId);
  const live = p.preview && p.preview.id === f.id ? p.preview : null;
  const g = (live ?? f).computed;
  const [throwError, setThrowError] = useState<string | null>(null);
  const ed = p.canEdit;

  /** Parses, saves, and returns a message for the field (client check first, then the server's). */
  const save = (label: string, toPatch: (text: string) => Record<string, unknown>) => async (text: string) => {
    let patch: Record<string, unknown>;
    try {
      patch = toPatch(text);
    } catch (err) {
      return (err as Error).message;
    }
    await p.cmd.patchFixture(f.id, label, () => patch);
    return null;
  };

  return (
    <>
      <PanelSection title="Unit" testId="fixture-panel">
        <div className="flex items-center justify-between gap-2">
          <p className="text-sm font-medium" data-testid="fixture-title">
            Unit {f.unitNumber} · {f.positionName}
          </p>
          <NotesButton
            productionId={p.production.id}
            target={{ subject: "fixture", subjectId: f.id, label: `unit ${f.unitNumber}, ${f.positionName}` }}
          />
          <HistoryLink
            productionId={p.production.id}
            entity="fixture"
            id={f.id}
            name={`unit ${f.unitNumber} on ${f.positionName}`}
          />
        </div>
        <p className="text-xs text-muted">
          {f.typeName} ({f.family}){f.purpose ? ` · ${f.purpose}` : ""}
        </p>
        <PanelField
          label="Channel"
          value={f.channel?.toString() ?? ""}
          editable={ed}
          testId="field-channel"
          commit={save("Change the channel", (t) => ({ channel: numberOrNull(t, "Channel", { int: true }) }))}
        />
        <PanelField
          label="Purpose"
          value={f.purpose ?? ""}
          editable={ed}
          commit={save("Change the purpose", (t) => ({ purpose: t || null }))}
        />
        <PanelField
          label="Colour"
          value={f.colour ?? ""}
          editable={ed}
          commit={save("Change the colour", (t) => ({ colour: t || null }))}
        />
      </PanelSection>
      <PanelSection title="Focus" testId="focus-section">
        {g.focus ? (
          <p className="text-xs text-muted">
            Mark: {describePoint(g.focus, { units, datumName: p.production.datumName })}
          </p>
        ) : (
          <p className="text-xs text-caution">
            No focus mark yet{ed ? ": drag from the unit or pick a focus point." : "."}
          </p>
        )}
        {ed ? (
          <>
            <label className="flex flex-col gap-0.5 text-sm">
              <span className="text-muted">Aim at</span>
              <select
                data-testid="field-focus-point"
                value={f.focusPointId ?? ""}
                onChange={(e) => {
                  const id = e.target.value ? Number(e.target.value) : null;
                  const m = g.focus;
                  void p.cmd.patchFixture(f.id, "Aim the unit", () =>
                    id ? { focusPointId: id } : { focusPointId: null, focusX: m?.x ?? f.x, focusY: m?.y ?? f.y + 2 },
                  );
                }}
                className="min-h-9 rounded-md border border-line bg-surface px-2"
              >
                <option value="">its own mark</option>
                {p.data.focusPoints.map((fp) => (
                  <option key={fp.id} value={fp.id}>
                    {fp.name}
                  </option>
                ))}
              </select>
            </label>
            <fieldset className="flex gap-3 text-sm">
              <legend className="text-muted">Aim height</legend>
              {(["deck", "head"] as const).map((a) => (
                <label key={a} className="flex items-center gap-1">
                  <input
                    type="radio"
                    name={`aim-${f.id}`}
                    checked={f.aim === a}
                    onChange={() => void p.cmd.patchFixture(f.id, "Change the aim height", () => ({ aim: a }))}
                  />
                  {a === "deck" ? "deck" : `head (${formatLength(p.production.headHeight, units)})`}
                </label>
              ))}
            </fieldset>
          </>
        ) : (
          <PanelField label="Aim at" value={f.focusPointName ?? "its own mark"} editable={false} commit={() => null} />
        )}
        <PanelField
          label="Cone (°)"
          value={g.coneDeg.toFixed(1)}
          hint={type ? `this type: ${type.coneMinDeg}–${type.coneMaxDeg}°` : undefined}
          editable={ed}
          testId="field-cone"
          commit={save("Change the cone", (t) => ({ coneDeg: inRange(numberOrNull(t, "Cone"), "Cone", 0, 180) }))}
        />
        <PanelField
          label="Edge softness (°)"
          value={g.softnessDeg.toFixed(1)}
          editable={ed}
          testId="field-softness"
          commit={save("Change the softness", (t) => ({
            softnessDeg: inRange(numberOrNull(t, "Softness"), "Softness", -1e-9, 90),
          }))}
        />
        <PanelField
          label="Lens height"
          value={f.lensHeight == null ? "" : formatLength(f.lensHeight, units)}
          placeholder={`${formatLength(g.lensHeight, units)} (${LENS_HEIGHT_RULE[type?.mounting ?? "under-hung"].short})`}
          hint={LENS_HEIGHT_RULE[type?.mounting ?? "under-hung"].hint}
          editable={ed}
          testId="field-lens-height"
          commit={save("Change the lens height", (t) => ({ lensHeight: t === "" ? null : parseLength(t, unit) }))}
        />
        {ed ? (
          <PanelField
            label="Throw (moves the mark along the beam)"
            value={g.throw == null ? "" : formatLength(g.throw, units)}
            editable
            testId="field-throw"
            error={throwError}
            commit={(t) => {
              setThrowError(null);
              let throwM: number;
              try {
                throwM = parseLength(t, unit);
              } catch (err) {
                return (err as Error).message;
              }
              if (!g.focus) return "Give the unit a focus mark first.";
              const r = markForThrow({
                source: g.source,
                mark: g.focus,
                aimZ: g.focus.z,
                throwM,
                describe: (m) => formatLength(m, units),
              });
              if (!r.ok) return r.reason;
              void p.cmd.patchFixture(f.id, "Set the throw", () => ({
                focusX: round(r.mark.x),
                focusY: round(r.mark.y),
                focusPointId: null,
              }));
              return null;
            }}
          />
        ) : null}
        <BeamNumbers g={g} units={units} isPreview={Boolean(live)} />
      </PanelSection>
      <PanelSection title="Shutter cuts">
        {(f.shutterCuts ?? []).length ? (
          <ul className="text-sm">
            {(f.shutterCuts ?? []).map((c) => (
              <li key={c.label} className="flex justify-between">
                {c.label} shutter
                {ed ? (
                  <button
                    type="button"
                    className="text-xs text-danger"
                    onClick={() =>
                      void p.cmd.patchFixture(f.id, "Remove a cut", (x) => ({
                        shutterCuts: (x.shutterCuts ?? []).filter((k) => k.label !== c.label),
                      }))
                    }
                  >
                    Remove
                  </button>
                ) : null}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-xs text-muted">No cuts.</p>
        )}
        {ed ? (
          <button
            type="button"
            className="self-start rounded-md border border-line px-2 py-1 text-sm"
            onClick={() => p.setTool("cut")}
            aria-pressed={p.tool === "cut"}
          >
            Draw a cut
          </button>
        ) : null}
      </PanelSection>
    </>
  );
}

const round = (n: number) => Math.round(n * 1000) / 1000;

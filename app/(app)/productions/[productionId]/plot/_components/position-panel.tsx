"use client";

import { NotesButton } from "@/components/notes/notes-button";
import { HistoryLink } from "@/components/revisions/history-link";
import { formatLength, parseLength } from "@/lib/optics";
import { POSITION_KINDS, POSITION_KIND_LABELS } from "@/lib/rig/position-kinds";
import { numberingOrder, numberingOrderVertical, renumber, type NumberingDirection } from "@/lib/plot/along-position";
import type { PositionDto } from "@/lib/dto/plan";
import { PanelField, PanelSection } from "./panel-field";
import { ElevationStrip } from "./elevation-strip";
import { isVertical } from "./rig-items";
import { EMPTY_SELECTION } from "./canvas-types";
import type { PanelProps } from "./panel-props";

export function PositionPanel(p: PanelProps & { position: PositionDto }) {
  const pos = p.position;
  const units = p.production.displayUnits;
  const unit = units === "metric" ? "m" : "ft";
  const ed = p.canEdit;
  const fixtures = p.data.fixtures.filter((f) => f.positionId === pos.id);
  const load = fixtures.reduce(
    (kg, f) => kg + (p.data.fixtureTypes.find((t) => t.id === f.fixtureTypeId)?.weightKg ?? 0),
    0,
  );

  const save = (label: string, toPatch: (t: string) => Record<string, unknown>) => async (text: string) => {
    let patch: Record<string, unknown>;
    try {
      patch = toPatch(text);
    } catch (err) {
      return (err as Error).message;
    }
    await p.cmd.run(label, async () => {
      const now = p.cmd.latest().positions.find((x) => x.id === pos.id);
      if (now) await p.cmd.actions.patchPosition(pos.id, { ...patch, version: now.version });
    });
    return null;
  };

  async function renumberUnits(direction: NumberingDirection) {
    const ordered = isVertical(pos.kind)
      ? numberingOrderVertical(fixtures.map((f) => ({ ...f, lensHeight: f.computed.lensHeight })))
      : numberingOrder(fixtures, direction);
    const next = renumber(ordered.map((f) => f.id));
    // Two passes: park every unit on a spare number first, so no two units ever share one mid-way.
    await p.cmd.run("Renumber the position", async () => {
      for (const [i, f] of ordered.entries())
        await p.cmd.actions.patchFixture(f.id, { unitNumber: String(9000 + i), version: p.cmd.fixture(f.id)!.version });
      for (const f of ordered)
        await p.cmd.actions.patchFixture(f.id, { unitNumber: next.get(f.id)!, version: p.cmd.fixture(f.id)!.version });
    });
  }

  return (
    <PanelSection title="Hanging position" testId="position-panel">
      <NotesButton
        productionId={p.production.id}
        target={{ subject: "position", subjectId: pos.id, label: `position ${pos.name}` }}
        className="self-start"
      />
      <HistoryLink productionId={p.production.id} entity="position" id={pos.id} name={`position ${pos.name}`} />
      <PanelField
        label="Name"
        value={pos.name}
        editable={ed}
        testId="position-name"
        commit={save("Rename the position", (t) => ({ name: t }))}
      />
      {ed ? (
        <label className="flex flex-col gap-0.5 text-sm">
          <span className="text-muted">Kind</span>
          <select
            value={pos.kind}
            onChange={(e) => void save("Change the kind", () => ({ kind: e.target.value }))("x")}
            className="min-h-9 rounded-md border border-line bg-surface px-2"
          >
            {POSITION_KINDS.map((k) => (
              <option key={k} value={k}>
                {POSITION_KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </label>
      ) : (
        <PanelField label="Kind" value={POSITION_KIND_LABELS[pos.kind]} editable={false} commit={() => null} />
      )}
      <PanelField
        label="Trim height"
        value={formatLength(pos.trimHeight, units)}
        editable={ed}
        testId="position-trim"
        commit={save("Change the trim", (t) => ({ trimHeight: parseLength(t, unit) }))}
      />
      <PanelField
        label="Rated load (kg)"
        value={pos.ratedLoadKg?.toString() ?? ""}
        editable={ed}
        testId="position-load"
        commit={save("Change the rated load", (t) => {
          if (t === "") return { ratedLoadKg: null };
          const n = Number(t.replace(/\s*kg$/i, ""));
          if (!Number.isFinite(n)) throw new RangeError("Rated load must be a number of kilograms.");
          return { ratedLoadKg: n };
        })}
      />
      <p className="text-xs text-muted">
        {fixtures.length} units, {load.toFixed(1)} kg of fixtures
        {pos.ratedLoadKg ? ` against a posted ${pos.ratedLoadKg} kg` : ""}. A planning figure only: cabling, accessories
        and the venue&apos;s posted ratings count, and a qualified rigger decides.
      </p>
      {isVertical(pos.kind) ? <ElevationStrip position={pos} fixtures={fixtures} units={units} /> : null}
      {ed ? (
        <div className="flex flex-wrap gap-2">
          {isVertical(pos.kind) ? (
            <button
              type="button"
              className="rounded-md border border-line px-2 py-1 text-sm"
              onClick={() => void renumberUnits("from-stage-left")}
            >
              Renumber from the top
            </button>
          ) : (
            <>
              <button
                type="button"
                className="rounded-md border border-line px-2 py-1 text-sm"
                onClick={() => void renumberUnits("from-stage-left")}
              >
                Renumber from SL
              </button>
              <button
                type="button"
                className="rounded-md border border-line px-2 py-1 text-sm"
                onClick={() => void renumberUnits("from-stage-right")}
              >
                Renumber from SR
              </button>
            </>
          )}
          <button
            type="button"
            className="rounded-md border border-line px-2 py-1 text-sm text-danger"
            onClick={() => {
              if (!confirm(`Delete ${pos.name} and the ${fixtures.length} units on it?`)) return;
              void p.cmd.run("Delete the position", () => p.cmd.actions.deletePosition(pos.id));
              p.setSelection(EMPTY_SELECTION);
            }}
          >
            Delete position
          </button>
        </div>
      ) : null}
    </PanelSection>
  );
}

"use client";

import { formatLength } from "@/lib/optics";
import { EMPTY_SELECTION } from "./canvas-types";
import type { PanelProps } from "./panel-props";
import { FixturePanel } from "./fixture-panel";
import { PositionPanel } from "./position-panel";
import { UnderlayPanel } from "./underlay-panel";
import { DraftForm } from "./draft-form";
import { PanelSection } from "./panel-field";
import { deleteFixtures, duplicateFixtures } from "./plot-commands";

export function SidePanel(p: PanelProps) {
  const ids = [...p.selection.fixtures];
  const fixture = ids.length === 1 ? p.data.fixtures.find((f) => f.id === ids[0]) : undefined;
  const position = p.selection.positionId ? p.data.positions.find((x) => x.id === p.selection.positionId) : undefined;
  const point = p.selection.focusPointId
    ? p.data.focusPoints.find((x) => x.id === p.selection.focusPointId)
    : undefined;
  return (
    <aside
      className="no-print w-80 shrink-0 overflow-y-auto max-xl:h-[40%] max-xl:flex-1 border-l border-line bg-surface"
      aria-label="Details"
      data-testid="side-panel"
    >
      {p.draft && p.canEdit ? <DraftForm {...p} /> : null}
      {fixture ? <FixturePanel {...p} fixture={fixture} /> : null}
      {ids.length > 1 ? (
        <PanelSection title={`${ids.length} units selected`}>
          {p.canEdit ? (
            <div className="flex gap-2">
              <button
                type="button"
                className="rounded-md border border-line px-2 py-1 text-sm"
                onClick={() => void duplicateFixtures(p.cmd, ids)}
              >
                Duplicate
              </button>
              <button
                type="button"
                className="rounded-md border border-line px-2 py-1 text-sm text-danger"
                onClick={() => void deleteFixtures(p.cmd, ids, () => p.setSelection(EMPTY_SELECTION))}
              >
                Delete
              </button>
            </div>
          ) : (
            <p className="text-sm text-muted">Select one unit to see its beam.</p>
          )}
        </PanelSection>
      ) : null}
      {position ? <PositionPanel {...p} position={position} /> : null}
      {point ? (
        <PanelSection title="Focus point" testId="focus-point-panel">
          <p className="text-sm font-medium">{point.name}</p>
          <p className="text-sm text-muted">
            {formatLength(Math.abs(point.x), p.production.displayUnits)} {point.x >= 0 ? "SL" : "SR"} of CL,{" "}
            {formatLength(Math.abs(point.y), p.production.displayUnits)} {point.y >= 0 ? "US" : "DS"} of the{" "}
            {p.production.datumName}
          </p>
          <p className="text-xs text-muted">
            {p.data.fixtures.filter((f) => f.focusPointId === point.id).length} units aim here;{" "}
            {p.canEdit ? "drag the diamond to move them all." : "they move with it."}
          </p>
        </PanelSection>
      ) : null}
      {!fixture && !position && !point && ids.length === 0 ? <Overview {...p} /> : null}
    </aside>
  );
}

function Overview(p: PanelProps) {
  const units = p.production.displayUnits;
  return (
    <>
      <PanelSection title="The plot">
        <p className="text-sm">
          {p.data.positions.length} positions · {p.data.fixtures.length} units · {p.data.focusPoints.length} focus
          points
        </p>
        <p className="text-xs text-muted">
          Opening {formatLength(p.production.prosceniumWidth, units)}, stage{" "}
          {formatLength(p.production.stageWidth, units)} × {formatLength(p.production.stageDepth, units)}, datum:{" "}
          {p.production.datumName}. Click a unit, position or focus point for its details.
        </p>
      </PanelSection>
      <UnderlayPanel {...p} />
      <PanelSection title="Acting areas">
        {p.data.areaZones.length ? (
          <ul className="text-sm">
            {p.data.areaZones.map((z) => (
              <li key={z.id} className="flex justify-between">
                {z.name}
                {p.canEdit ? (
                  <button
                    type="button"
                    className="text-xs text-danger"
                    onClick={() => void p.cmd.run("Remove the area", () => p.cmd.actions.deleteAreaZone(z.id))}
                  >
                    Remove
                  </button>
                ) : null}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-xs text-muted">None yet{p.canEdit ? ": use the Area tool." : "."}</p>
        )}
      </PanelSection>
      <PanelSection title="Landmarks">
        {p.data.landmarks.length ? (
          <ul className="text-sm">
            {p.data.landmarks.map((l) => (
              <li key={l.id} className="flex justify-between">
                {l.name}
                {p.canEdit ? (
                  <button
                    type="button"
                    className="text-xs text-danger"
                    onClick={() => void p.cmd.run("Remove the landmark", () => p.cmd.actions.deleteLandmark(l.id))}
                  >
                    Remove
                  </button>
                ) : null}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-xs text-muted">
            None yet. Focus charts word shutter cuts against these (“cut to the lip”).
          </p>
        )}
      </PanelSection>
      <PanelSection title="Keys">
        <p className="text-xs text-muted">
          Space-drag pans · F fits · arrows nudge focus (shift: more) · [ ] cone · , . softness · H deck/head · Delete ·
          Ctrl+D duplicate · Ctrl+Z undo
          {p.canEdit ? " · drag an area's corner or a landmark's end (the small squares) to reshape it" : ""}
        </p>
      </PanelSection>
    </>
  );
}

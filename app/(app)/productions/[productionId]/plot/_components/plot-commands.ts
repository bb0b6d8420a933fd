"use client";
// The plot's commands that make or remove units: hang one from the shelf, delete the selection,
// duplicate it. Each runs through the editor's one-at-a-time queue and leaves an undo step.
import type { Point } from "@/lib/optics";
import {
  nearestPosition,
  numberingOrder,
  projectOntoPosition,
  unitNumberForInsert,
  type NumberingDirection,
} from "@/lib/plot/along-position";
import { freeSpotAlong, nudgeOntoPosition } from "@/lib/plot/nudge";
import { compareUnitNumbers } from "@/lib/rig/unit-number";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import { creationFields, type Commands } from "./use-commands";
import { isVertical } from "./rig-items";

/** Hangs one unit of a type at the nearest position, numbered so nobody else is renumbered. */
export function placeFixture(
  cmd: Commands,
  typeId: number,
  at: Point,
  direction: NumberingDirection,
  tolerance: number,
) {
  const data = cmd.latest();
  const hit = nearestPosition(data.positions, at, tolerance);
  if (!hit) {
    cmd.setNotice({ tone: "info", text: "Drop the unit on a hanging position (a pipe, bridge or boom)." });
    return;
  }
  const pos = hit.position;
  const onPos = data.fixtures.filter((f) => f.positionId === pos.id);
  const spot = freeSpot(data, pos, typeId, hit.point, onPos);
  if (!spot) {
    const type = data.fixtureTypes.find((t) => t.id === typeId);
    cmd.setNotice({
      tone: "info",
      text: `No room left on ${pos.name} for another ${type?.name ?? "unit"}: move or remove a unit there, or drop it on another position.`,
    });
    return;
  }
  const existing = onPos.map((f) => f.unitNumber);
  let before: string | null = null;
  if (onPos.length && isVertical(pos.kind))
    before = existing.slice().sort(compareUnitNumbers).at(-1)!; // booms: the new unit goes below
  else if (onPos.length) {
    const order = numberingOrder([...onPos, { id: -1, x: spot.point.x, y: spot.point.y } as PlotFixture], direction);
    const idx = order.findIndex((f) => f.id === -1);
    before = idx === 0 ? null : order[idx - 1].unitNumber;
  }
  const unitNumber = unitNumberForInsert(existing, before);
  return cmd
    .run("Hang a unit", async () => {
      const [created] = await cmd.actions.createFixtures([
        {
          positionId: pos.id,
          fixtureTypeId: typeId,
          unitNumber,
          x: spot.point.x,
          y: spot.point.y,
          lensHeight: spot.lensHeight,
        },
      ]);
      cmd.remember(`Hang unit ${unitNumber}`, () =>
        cmd.run("Undo hang", () => cmd.actions.deleteFixtures([created.id])).then(() => undefined),
      );
      return created;
    })
    .then((created) => {
      if (created && spot.moved)
        cmd.setNotice({
          tone: "info",
          text: `That spot on ${pos.name} was taken: unit ${unitNumber} hangs at the next free spot.`,
        });
      return created;
    });
}

/** Room one unit takes when its type does not say (18 in centres; common practice, no source). */
const FALLBACK_BODY_WIDTH_M = 0.45;
/** Units on a boom or ladder sit this far apart in height (the plot's long-standing spacing). */
const STACK_SPACING_M = 0.9;

/**
 * Where a new unit hangs on the position it was dropped on: along a line position, nudged clear of the
 * units there by the types' body widths; on a boom or ladder, the next free height below the others.
 * Null when the position has no room left (never two symbols on one point).
 */
function freeSpot(
  data: ReturnType<Commands["latest"]>,
  pos: ReturnType<Commands["latest"]>["positions"][number],
  typeId: number,
  at: Point,
  onPos: PlotFixture[],
): { point: Point; lensHeight: number | null; moved: boolean } | null {
  if (isVertical(pos.kind)) {
    const wanted = Math.max(0.3, pos.trimHeight - STACK_SPACING_M * onPos.length);
    const height = freeSpotAlong({
      length: pos.trimHeight,
      wanted,
      width: STACK_SPACING_M,
      occupied: onPos.map((f) => ({ along: f.computed.lensHeight, width: STACK_SPACING_M })),
    });
    return height === null ? null : { point: at, lensHeight: height, moved: Math.abs(height - wanted) > 1e-9 };
  }
  const widths = new Map(data.fixtureTypes.map((t) => [t.id, t.bodyWidthM ?? FALLBACK_BODY_WIDTH_M]));
  const widthOf = (id: number) => widths.get(id) ?? FALLBACK_BODY_WIDTH_M;
  const nudged = nudgeOntoPosition(
    pos,
    at,
    widthOf(typeId),
    onPos.map((f) => ({ x: f.x, y: f.y, width: widthOf(f.fixtureTypeId) })),
  );
  return nudged && { ...nudged, lensHeight: null };
}

/** Deletes the units; undo hangs them again whole (read in full first, not from the slim plot rows). */
export function deleteFixtures(cmd: Commands, ids: number[], done: () => void) {
  const rows = ids.map((id) => cmd.fixture(id)).filter((f): f is PlotFixture => f !== null);
  return cmd.run(`Delete ${rows.length} unit${rows.length === 1 ? "" : "s"}`, async () => {
    const full = await cmd.actions.fullFixtures(rows.map((f) => f.id)); // kept whole for undo
    await cmd.actions.deleteFixtures(rows.map((f) => f.id));
    done();
    cmd.remember(`Delete ${rows.length} unit${rows.length === 1 ? "" : "s"}`, () =>
      cmd.run("Undo delete", () => cmd.actions.createFixtures(full.map(creationFields))).then(() => undefined),
    );
  });
}

/** Copies sit a little along their position, with unit numbers slotted in after the originals. */
export function duplicateFixtures(cmd: Commands, ids: number[]) {
  const data = cmd.latest();
  const known = ids.filter((id) => cmd.fixture(id) !== null);
  if (!known.length) return;
  return cmd.run("Duplicate", async () => {
    const full = new Map((await cmd.actions.fullFixtures(known)).map((f) => [f.id, f]));
    const taken = new Map<number, string[]>();
    const copies = known.flatMap((id) => {
      const f = full.get(id);
      const pos = f && data.positions.find((p) => p.id === f.positionId);
      if (!f || !pos) return [];
      const list = taken.get(pos.id) ?? data.fixtures.filter((x) => x.positionId === pos.id).map((x) => x.unitNumber);
      const unitNumber = unitNumberForInsert(list, f.unitNumber);
      taken.set(pos.id, [...list, unitNumber]);
      const at = projectOntoPosition(pos, { x: f.x + 0.3 * Math.sign(f.x || 1), y: f.y }).point;
      return [{ ...creationFields(f), unitNumber, x: at.x, y: at.y, channel: null }];
    });
    if (!copies.length) return;
    const created = await cmd.actions.createFixtures(copies);
    cmd.remember(`Duplicate ${created.length}`, () =>
      cmd.run("Undo duplicate", () => cmd.actions.deleteFixtures(created.map((c) => c.id))).then(() => undefined),
    );
  });
}

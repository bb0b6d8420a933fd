// The work call: open work notes put in the order a crew walks the rig, so each position is visited once
// and the lift or ladder goes up and down as few times as possible.
import { compareUnitNumbers } from "@/lib/rig/unit-number";
import type { NoteDto } from "./dto";

export type WorkCallPosition = {
  id: number;
  name: string;
  x1: number;
  y1: number;
  x2: number | null;
  y2: number | null;
  trimHeight: number;
  sortOrder: number;
};
export type WorkCallFixture = {
  id: number;
  positionId: number;
  unitNumber: string;
  channel: number | null;
  x: number;
  y: number;
  lensHeight: number | null;
};

export type WorkCallStop = {
  note: NoteDto;
  /** Where the job is: null for notes on the production, a cue or a focus point (done off the rig). */
  position: { id: number; name: string } | null;
  fixture: { id: number; unitNumber: string; channel: number | null } | null;
  /** Height of the job above the stage floor in metres (the lens, else the position's trim). */
  height: number | null;
};

/** Notes the crew still has to do: work notes that are open or in progress. */
export function isOnWorkCall(n: Pick<NoteDto, "kind" | "status">): boolean {
  return n.kind === "work" && (n.status === "open" || n.status === "in_progress");
}

/** How far along its position a point lies, from the position's first end (a boom or a spot has one end). */
function along(p: WorkCallPosition, x: number, y: number): number {
  if (p.x2 == null || p.y2 == null) return 0;
  const dx = p.x2 - p.x1;
  const dy = p.y2 - p.y1;
  const len = Math.hypot(dx, dy);
  return len === 0 ? 0 : ((x - p.x1) * dx + (y - p.y1) * dy) / len;
}

/**
 * Positions highest first (the lift goes up once and comes down as the work gets lower), positions at one
 * height from downstage to upstage (smaller y first: the datum is at the setting line, upstage positive),
 * then the production's own order. Along each position the direction alternates, so the walk snakes from
 * the end of one pipe to the near end of the next. Notes off the rig come last, oldest first.
 */
export function orderWorkCall(
  notes: NoteDto[],
  positions: WorkCallPosition[],
  fixtures: WorkCallFixture[],
): WorkCallStop[] {
  const byPosition = new Map(positions.map((p) => [p.id, p]));
  const byFixture = new Map(fixtures.map((f) => [f.id, f]));
  const midY = (p: WorkCallPosition) => (p.y1 + (p.y2 ?? p.y1)) / 2;
  const posOrder = [...positions].sort(
    (a, b) =>
      b.trimHeight - a.trimHeight || midY(a) - midY(b) || a.sortOrder - b.sortOrder || a.name.localeCompare(b.name),
  );
  const rank = new Map(posOrder.map((p, i) => [p.id, i]));

  const onRig: Array<WorkCallStop & { pos: WorkCallPosition; at: number; unit: string }> = [];
  const offRig: WorkCallStop[] = [];
  for (const note of notes.filter(isOnWorkCall)) {
    const fixture = note.subject === "fixture" && note.subjectId != null ? byFixture.get(note.subjectId) : undefined;
    const pos = fixture
      ? byPosition.get(fixture.positionId)
      : note.subject === "position" && note.subjectId != null
        ? byPosition.get(note.subjectId)
        : undefined;
    if (!pos) {
      offRig.push({ note, position: null, fixture: null, height: null });
      continue;
    }
    onRig.push({
      note,
      position: { id: pos.id, name: pos.name },
      fixture: fixture ? { id: fixture.id, unitNumber: fixture.unitNumber, channel: fixture.channel } : null,
      height: fixture?.lensHeight ?? pos.trimHeight,
      pos,
      // A note on the whole position is done at its first end.
      at: fixture ? along(pos, fixture.x, fixture.y) : Number.NEGATIVE_INFINITY,
      unit: fixture?.unitNumber ?? "",
    });
  }
  onRig.sort((a, b) => {
    const ra = rank.get(a.pos.id)!;
    const rb = rank.get(b.pos.id)!;
    if (ra !== rb) return ra - rb;
    const dir = ra % 2 === 0 ? 1 : -1;
    if (a.at !== b.at) {
      if (a.at === Number.NEGATIVE_INFINITY) return -1;
      if (b.at === Number.NEGATIVE_INFINITY) return 1;
      return dir * (a.at - b.at);
    }
    return dir * compareUnitNumbers(a.unit, b.unit) || a.note.id - b.note.id;
  });
  offRig.sort((a, b) => a.note.createdAt.localeCompare(b.note.createdAt) || a.note.id - b.note.id);
  return [...onRig.map(({ pos: _p, at: _a, unit: _u, ...stop }) => stop), ...offRig];
}

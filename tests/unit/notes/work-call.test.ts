import { describe, expect, it } from "vitest";
import type { NoteDto } from "@/lib/notes/dto";
import { isOnWorkCall, orderWorkCall, type WorkCallFixture, type WorkCallPosition } from "@/lib/notes/work-call";

// An invented rig: two flown pipes at 7 m (one downstage, one upstage), a lower ladder at 4 m, a boom.
const positions: WorkCallPosition[] = [
  { id: 1, name: "Low ladder", x1: 6, y1: 2, x2: null, y2: null, trimHeight: 4, sortOrder: 0 },
  { id: 2, name: "Mid pipe", x1: -6, y1: 5, x2: 6, y2: 5, trimHeight: 7, sortOrder: 1 },
  { id: 3, name: "Front pipe", x1: -6, y1: 1, x2: 6, y2: 1, trimHeight: 7, sortOrder: 2 },
  { id: 4, name: "Boom", x1: -7, y1: 3, x2: null, y2: null, trimHeight: 2, sortOrder: 3 },
];
const fixtures: WorkCallFixture[] = [
  { id: 11, positionId: 3, unitNumber: "1", channel: 1, x: -5, y: 1, lensHeight: null },
  { id: 12, positionId: 3, unitNumber: "2", channel: 2, x: 0, y: 1, lensHeight: null },
  { id: 13, positionId: 3, unitNumber: "3", channel: 3, x: 5, y: 1, lensHeight: null },
  { id: 21, positionId: 2, unitNumber: "1", channel: 4, x: -4, y: 5, lensHeight: null },
  { id: 22, positionId: 2, unitNumber: "2", channel: 5, x: 4, y: 5, lensHeight: null },
  { id: 31, positionId: 1, unitNumber: "1", channel: 6, x: 6, y: 2, lensHeight: 3.5 },
];

let nextId = 100;
function note(over: Partial<NoteDto>): NoteDto {
  const id = nextId++;
  return {
    id,
    productionId: 1,
    subject: "fixture",
    subjectId: null,
    body: `note ${id}`,
    kind: "work",
    priority: "normal",
    ownerId: null,
    status: "open",
    needs: [],
    dueDate: null,
    dueSession: null,
    authorId: 1,
    runningCueId: null,
    runningCueNumber: null,
    origin: "written",
    showReportId: null,
    closedBy: null,
    closedAt: null,
    version: 1,
    createdAt: `2026-12-05T10:00:${String(id % 60).padStart(2, "0")}.000Z`,
    updatedAt: "2026-12-05T10:00:00.000Z",
    ...over,
  };
}

describe("work call order", () => {
  it("walks the highest positions first, downstage before upstage, snaking along each pipe; jobs off the rig last", () => {
    const notes = [
      note({ subject: "production", subjectId: null, body: "sweep the deck" }),
      note({ subjectId: 31, body: "ladder unit" }),
      note({ subjectId: 22, body: "mid 2" }),
      note({ subjectId: 13, body: "front 3" }),
      note({ subjectId: 11, body: "front 1" }),
      note({ subject: "position", subjectId: 4, body: "boom base loose" }),
      note({ subjectId: 21, body: "mid 1" }),
      note({ subjectId: 12, body: "front 2", status: "in_progress" }),
      note({ subject: "position", subjectId: 2, body: "mid pipe cable" }),
    ];
    const order = orderWorkCall(notes, positions, fixtures).map((s) => s.note.body);
    // Front pipe (7 m, y = 1) left to right; Mid pipe (7 m, y = 5): its own note at its first end, then
    // right to left (the walk comes back); Low ladder (4 m); Boom (2 m); then the production note.
    expect(order).toEqual([
      "front 1",
      "front 2",
      "front 3",
      "mid pipe cable",
      "mid 2",
      "mid 1",
      "ladder unit",
      "boom base loose",
      "sweep the deck",
    ]);
  });

  it("keeps only open and in-progress work notes", () => {
    const notes = [
      note({ subjectId: 11, status: "done" }),
      note({ subjectId: 12, status: "cannot_do" }),
      note({ subjectId: 13, kind: "focus" }),
      note({ subjectId: 21 }),
    ];
    expect(orderWorkCall(notes, positions, fixtures).map((s) => s.fixture?.id)).toEqual([21]);
    expect(isOnWorkCall({ kind: "work", status: "in_progress" })).toBe(true);
    expect(isOnWorkCall({ kind: "paperwork", status: "open" })).toBe(false);
  });

  it("gives each stop its position and working height (the lens if set, else the trim)", () => {
    const stops = orderWorkCall([note({ subjectId: 31 }), note({ subjectId: 12 })], positions, fixtures);
    expect(stops.map((s) => [s.position?.name, s.height])).toEqual([
      ["Front pipe", 7],
      ["Low ladder", 3.5],
    ]);
  });

  it("a note whose fixture is gone goes with the jobs off the rig", () => {
    const stops = orderWorkCall([note({ subjectId: 999 })], positions, fixtures);
    expect(stops[0].position).toBeNull();
  });
});

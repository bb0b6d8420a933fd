// The badges' open-note counts against the real MariaDB: one read for the whole production, checked against
// an independent count made here from the full notes list (open and in progress count; done and cannot-do
// don't), and following every write: a new note, a closed one, a reopened one.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type ApiSession, demoProductionId, demoSession } from "./support/api";

let designer: ApiSession;
let stageManager: ApiSession;
let viewer: ApiSession;
let base = "";
const created: number[] = [];
type Note = {
  id: number;
  subject: string;
  subjectId: number | null;
  status: string;
  priority: string;
  version: number;
};
type Counts = Record<string, { open: number; high: number }>;

/** The same counts, worked out from the list of every note (the reference the route must match). */
function countsFromList(notes: Note[]): Counts {
  const out: Counts = {};
  for (const n of notes) {
    if (n.status === "done" || n.status === "cannot_do") continue;
    const key = `${n.subject}:${n.subject === "production" ? "" : n.subjectId}`;
    out[key] ??= { open: 0, high: 0 };
    out[key].open++;
    if (n.priority === "high") out[key].high++;
  }
  return out;
}

async function counts(s: ApiSession): Promise<Counts> {
  const r = await s.get(`${base}/notes/counts`);
  expect(r.status).toBe(200);
  return r.json.counts;
}

async function write(s: ApiSession, body: Record<string, unknown>): Promise<Note> {
  const r = await s.post(`${base}/notes`, body);
  expect(r.status).toBe(201);
  created.push(r.json.note.id);
  return r.json.note;
}

beforeAll(async () => {
  [designer, stageManager, viewer] = await Promise.all([
    demoSession("designer"),
    demoSession("stageManager"),
    demoSession("viewer"),
  ]);
  base = `/api/productions/${await demoProductionId(designer)}`;
}, 60_000);

afterAll(async () => {
  for (const id of created) await designer.request("DELETE", `${base}/notes/${id}`);
});

describe("open-note counts per thing", () => {
  it("match a count made from the full notes list, per fixture, position, cue and the production", async () => {
    const fixtures = (await designer.get(`${base}/fixtures`)).json.fixtures as Array<{ id: number }>;
    const cues = (await designer.get(`${base}/cues`)).json.cues as Array<{ id: number }>;
    const positions = (await designer.get(`${base}/positions`)).json.positions as Array<{ id: number }>;
    const unit = fixtures[fixtures.length - 1].id;
    const before = await counts(viewer);
    const was = before[`fixture:${unit}`] ?? { open: 0, high: 0 };

    await write(viewer, { subject: "fixture", subjectId: unit, kind: "work", body: "Loose safety on this unit" });
    await write(stageManager, {
      subject: "fixture",
      subjectId: unit,
      kind: "focus",
      priority: "high",
      body: "Spills onto the proscenium",
    });
    const moving = await write(viewer, { subject: "fixture", subjectId: unit, kind: "general", body: "Label faded" });
    await designer.patch(`${base}/notes/${moving.id}`, { version: moving.version, status: "in_progress" });
    // Written already done: never counted.
    await write(designer, { subject: "fixture", subjectId: unit, kind: "work", status: "done", body: "Re-gelled" });
    await write(viewer, { subject: "cue", subjectId: cues[0].id, kind: "cue", body: "Bump reads late" });
    await write(viewer, { subject: "position", subjectId: positions[0].id, kind: "work", body: "Pipe end tape" });
    await write(viewer, { subject: "production", kind: "paperwork", body: "Reprint the channel list" });

    const after = await counts(designer);
    // Three more unfinished on the unit (one in progress), one of them high priority.
    expect(after[`fixture:${unit}`]).toEqual({ open: was.open + 3, high: was.high + 1 });
    const notes = (await designer.get(`${base}/notes`)).json.notes as Note[];
    expect(after).toEqual(countsFromList(notes));
    expect(after[`cue:${cues[0].id}`].open).toBeGreaterThanOrEqual(1);
    expect(after[`position:${positions[0].id}`].open).toBeGreaterThanOrEqual(1);
    expect(after["production:"].open).toBeGreaterThanOrEqual(1);
  });

  it("follow closing and reopening a note", async () => {
    const fixtures = (await designer.get(`${base}/fixtures`)).json.fixtures as Array<{ id: number }>;
    const unit = fixtures[0].id;
    const n = await write(viewer, { subject: "fixture", subjectId: unit, kind: "work", body: "Shutter sticks" });
    const open = (await counts(viewer))[`fixture:${unit}`].open;
    const closed = await designer.patch(`${base}/notes/${n.id}`, { version: n.version, status: "done" });
    expect(closed.status).toBe(200);
    expect((await counts(viewer))[`fixture:${unit}`]?.open ?? 0).toBe(open - 1);
    await designer.patch(`${base}/notes/${n.id}`, { version: closed.json.note.version, status: "open" });
    expect((await counts(viewer))[`fixture:${unit}`].open).toBe(open);
    expect(await counts(viewer)).toEqual(countsFromList((await viewer.get(`${base}/notes`)).json.notes));
  });
});

// Notes against the real MariaDB through the route handlers: who may close which kind (the design's role
// table: the rig and focus are the designer's and the crew's, cues the designer's, the stage manager calls
// the show), the current cue a note picks up, the work call's walk order, the channel check and the spot.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type ApiSession, demoProductionId, demoSession, freshUser } from "./support/api";

let designer: ApiSession;
let electrician: ApiSession;
let stageManager: ApiSession;
let viewer: ApiSession;
let base = "";
type Fixture = { id: number; positionId: number; unitNumber: string; channel: number | null };
type Position = { id: number; name: string; trimHeight: number };
let fixtures: Fixture[] = [];
let positions: Position[] = [];
const created: number[] = [];

async function write(s: ApiSession, body: Record<string, unknown>) {
  const r = await s.post(`${base}/notes`, body);
  if (r.status === 201) created.push(r.json.note.id);
  return r;
}

beforeAll(async () => {
  [designer, electrician, stageManager, viewer] = await Promise.all([
    demoSession("designer"),
    demoSession("electrician"),
    demoSession("stageManager"),
    demoSession("viewer"),
  ]);
  base = `/api/productions/${await demoProductionId(designer)}`;
  fixtures = (await designer.get(`${base}/fixtures`)).json.fixtures;
  positions = (await designer.get(`${base}/positions`)).json.positions;
}, 60_000);

afterAll(async () => {
  for (const id of created) await designer.request("DELETE", `${base}/notes/${id}`);
  await stageManager.request("PUT", `${base}/notes/current-cue`, { cueId: null });
});

describe("closing notes by kind", () => {
  it("the stage manager writes a cue note but only the designer closes it, and closing records who and when", async () => {
    const r = await write(stageManager, { subject: "production", kind: "cue", body: "Cue 14 late on the blackout" });
    expect(r.status).toBe(201);
    const note = r.json.note;
    expect(note.status).toBe("open");
    const refused = await stageManager.patch(`${base}/notes/${note.id}`, { version: note.version, status: "done" });
    expect(refused.status).toBe(403);
    expect(
      (await electrician.patch(`${base}/notes/${note.id}`, { version: note.version, status: "done" })).status,
    ).toBe(403);
    const done = await designer.patch(`${base}/notes/${note.id}`, { version: note.version, status: "done" });
    expect(done.status).toBe(200);
    expect(done.json.note.status).toBe("done");
    const me = (await designer.get("/api/auth/me")).json.user;
    expect(done.json.note.closedBy).toBe(me.id);
    expect(Date.now() - Date.parse(done.json.note.closedAt)).toBeLessThan(120_000);
  });

  it("a viewer may write a general note but not close it; the stage manager may", async () => {
    const r = await write(viewer, {
      subject: "production",
      kind: "general",
      body: "Programme credits misspell the board op",
    });
    expect(r.status).toBe(201);
    expect((await viewer.patch(`${base}/notes/${r.json.note.id}`, { version: 1, status: "cannot_do" })).status).toBe(
      403,
    );
    const closed = await stageManager.patch(`${base}/notes/${r.json.note.id}`, { version: 1, status: "cannot_do" });
    expect(closed.status).toBe(200);
    // Reopening is closing's twin: the viewer may not, and the row is unchanged.
    expect((await viewer.patch(`${base}/notes/${r.json.note.id}`, { version: 2, status: "open" })).status).toBe(403);
  });

  it("anyone may move an open note along; a stale version gets 409 with the current row", async () => {
    const r = await write(viewer, {
      subject: "fixture",
      subjectId: fixtures[0].id,
      kind: "work",
      body: "Hum from this unit",
    });
    const moved = await stageManager.patch(`${base}/notes/${r.json.note.id}`, {
      version: 1,
      status: "in_progress",
      needs: ["access", "isolated"],
    });
    expect(moved.status).toBe(200);
    expect(moved.json.note.needs).toEqual(["access", "isolated"]);
    const stale = await electrician.patch(`${base}/notes/${r.json.note.id}`, { version: 1, status: "done" });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.status).toBe("in_progress");
  });

  it("refuses a subject outside the production, an owner who is not a member, and a note on nothing, writing nothing", async () => {
    const before = (await designer.get(`${base}/notes`)).json.notes.length;
    const outsider = await freshUser("notes-owner");
    const bad = [
      { subject: "fixture", subjectId: 2_147_483_000, kind: "work", body: "x" },
      { subject: "production", kind: "work", body: "x", ownerId: outsider.user.id },
      { subject: "cue", kind: "cue", body: "x" },
      { subject: "production", kind: "chores", body: "x" },
    ];
    for (const body of bad) {
      const r = await write(designer, body);
      expect(r.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(r.json.error.fieldErrors ?? {}).length, JSON.stringify(r.json)).toBeGreaterThan(0);
    }
    expect((await designer.get(`${base}/notes`)).json.notes.length).toBe(before);
  });
});

describe("current cue", () => {
  it("the stage manager sets it, a new note picks it up, a viewer may not move it", async () => {
    const cues = (await designer.get(`${base}/cues`)).json.cues as Array<{ id: number; number: string }>;
    const cue = cues[Math.min(2, cues.length - 1)];
    expect((await viewer.request("PUT", `${base}/notes/current-cue`, { cueId: cue.id })).status).toBe(403);
    const set = await stageManager.request("PUT", `${base}/notes/current-cue`, { cueId: cue.id });
    expect(set.status).toBe(200);
    expect(set.json.currentCue.cueId).toBe(cue.id);
    const r = await write(electrician, {
      subject: "production",
      kind: "focus",
      body: "Spill on the portal in this state",
    });
    expect(r.json.note.runningCueId).toBe(cue.id);
    expect(Number(r.json.note.runningCueNumber)).toBe(Number(cue.number));
  });
});

describe("work call", () => {
  it("lists open work notes highest position first, each position's notes together, and drops a note once done", async () => {
    const on = (p: Position) => fixtures.filter((f) => f.positionId === p.id);
    const byHeight = positions.filter((p) => on(p).length >= 2).sort((a, b) => b.trimHeight - a.trimHeight);
    const high = byHeight[0];
    const low = byHeight.find((p) => p.trimHeight < high.trimHeight)!;
    const mine: number[] = [];
    // Written low first, interleaved, so the order cannot come from the order of writing.
    for (const f of [on(low)[0], on(high)[1], on(low)[1], on(high)[0]]) {
      const r = await write(designer, {
        subject: "fixture",
        subjectId: f.id,
        kind: "work",
        body: `Re-gel ${f.unitNumber}`,
      });
      mine.push(r.json.note.id);
    }
    const stops = (await electrician.get(`${base}/notes/work-call`)).json.stops as Array<{
      note: { id: number; version: number };
      position: { id: number } | null;
      height: number;
    }>;
    const ours = stops.filter((s) => mine.includes(s.note.id));
    expect(ours.map((s) => s.position?.id)).toEqual([high.id, high.id, low.id, low.id]);
    // Positions come highest trim first, each visited once.
    const onRig = stops.filter((s) => s.position);
    const posOrder = onRig.map((s) => s.position!.id).filter((id, i, a) => a.indexOf(id) === i);
    const trims = posOrder.map((id) => positions.find((p) => p.id === id)!.trimHeight);
    expect(trims).toEqual([...trims].sort((a, b) => b - a));
    expect(posOrder.length).toBe(new Set(onRig.map((s) => s.position!.id)).size); // each position visited once

    const first = ours[0];
    expect(
      (await stageManager.patch(`${base}/notes/${first.note.id}`, { version: first.note.version, status: "done" }))
        .status,
    ).toBe(403);
    const done = await electrician.patch(`${base}/notes/${first.note.id}`, {
      version: first.note.version,
      status: "done",
    });
    expect(done.status).toBe(200);
    const after = (await electrician.get(`${base}/notes/work-call`)).json.stops as Array<{ note: { id: number } }>;
    expect(after.some((s) => s.note.id === first.note.id)).toBe(false);
  });
});

describe("channel check", () => {
  it("each faulty fixture becomes an open work note on it; a fixture outside the production refuses the whole check", async () => {
    const [a, b] = fixtures;
    const before = (await designer.get(`${base}/notes`)).json.notes.length;
    const refused = await electrician.post(`${base}/notes/channel-check`, {
      results: [
        { fixtureId: a.id, result: "faulty" },
        { fixtureId: 2_147_483_000, result: "faulty" },
      ],
    });
    expect(refused.status).toBe(400);
    expect(refused.json.error.fieldErrors["results.1.fixtureId"]).toBeTruthy();
    expect((await designer.get(`${base}/notes`)).json.notes.length).toBe(before);
    expect(
      (await stageManager.post(`${base}/notes/channel-check`, { results: [{ fixtureId: a.id, result: "good" }] }))
        .status,
    ).toBe(403);

    const r = await electrician.post(`${base}/notes/channel-check`, {
      results: [
        { fixtureId: a.id, result: "good" },
        { fixtureId: b.id, result: "faulty", fault: "no output" },
      ],
    });
    expect(r.status).toBe(201);
    expect([r.json.good, r.json.faulty]).toEqual([1, 1]);
    const note = r.json.notes[0];
    created.push(note.id);
    expect([note.subject, note.subjectId, note.kind, note.status, note.origin]).toEqual([
      "fixture",
      b.id,
      "work",
      "open",
      "channel_check",
    ]);
    expect(note.body).toContain("no output");
    const stops = (await electrician.get(`${base}/notes/work-call`)).json.stops as Array<{ note: { id: number } }>;
    expect(stops.some((s) => s.note.id === note.id)).toBe(true);
  });
});

describe("what lights this spot", () => {
  it("ranks the units reaching a lit unit's focus in a cue, largest first, shares adding to one", async () => {
    const cues = (await designer.get(`${base}/cues`)).json.cues as Array<{
      id: number;
      levels: Record<string, number>;
    }>;
    const cue = cues.find((c) => Object.values(c.levels).some((l) => l > 0)) ?? cues[0];
    const all = (await designer.get(`${base}/fixtures`)).json.fixtures as Array<{
      channel: number | null;
      focusX: number | null;
      focusY: number | null;
      focusPointId: number | null;
    }>;
    const points = new Map(
      (
        (await designer.get(`${base}/focus-points`)).json.focusPoints as Array<{ id: number; x: number; y: number }>
      ).map((p) => [p.id, p]),
    );
    const markOf = (f: (typeof all)[number]) =>
      f.focusPointId != null
        ? points.get(f.focusPointId)
        : f.focusX != null && f.focusY != null
          ? { x: f.focusX, y: f.focusY }
          : undefined;
    const lit = all.find((f) => f.channel != null && (cue.levels?.[f.channel] ?? 0) > 0 && markOf(f));
    const mark = lit ? markOf(lit)! : { x: 0, y: 2 };
    const r = await viewer.post(`${base}/notes/spot`, { x: mark.x, y: mark.y, cueId: cue.id });
    expect(r.status).toBe(200);
    const lux = (r.json.contributions as Array<{ lux: number; share: number }>).map((c) => c.lux);
    // A unit lit in the cue and aimed at this very mark reaches it.
    if (lit) expect(lux.length).toBeGreaterThan(0);
    expect(lux).toEqual([...lux].sort((a, b) => b - a));
    expect(lux.reduce((s, v) => s + v, 0)).toBeCloseTo(r.json.total, 6);
    if (lux.length)
      expect((r.json.contributions as Array<{ share: number }>).reduce((s, c) => s + c.share, 0)).toBeCloseTo(1, 9);
    expect((await viewer.post(`${base}/notes/spot`, { x: "centre", y: 0 })).status).toBe(400);
  });
});

describe("show reports", () => {
  it("the stage manager files one: items become notes for the role that does them, a lamp out a work note; nothing half-written on a bad row", async () => {
    const team = (await designer.get(base)).json;
    const members = (team.team ?? team.members ?? []) as Array<{ userId: number; role: string }>;
    const electricianId = members.find((m) => m.role === "electrician")?.userId;
    const designerId = members.find((m) => m.role === "designer")?.userId;
    const unit = fixtures[2];
    const body = {
      // Its own name per run: the cluster run (npm run test:cluster) files this twice into one database.
      performance: `Matinee 2 (${Date.now().toString(36)})`,
      performedOn: "2026-12-05",
      summary: "Smooth; one unit dark.",
      items: [
        { body: "Cue 30 fade felt slow", kind: "cue", subject: "production" },
        { body: "Boom base rattles on the revolve", kind: "work", subject: "fixture", subjectId: unit.id },
      ],
      faults: [{ fixtureId: unit.id, kind: "lamp_out", description: "dark all second half" }],
    };
    expect((await electrician.post(`${base}/notes/show-reports`, body)).status).toBe(403);
    const before = (await designer.get(`${base}/notes`)).json.notes.length;
    const bad = await stageManager.post(`${base}/notes/show-reports`, {
      ...body,
      faults: [{ fixtureId: 2_147_483_000, kind: "fault", description: "x" }],
    });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors["faults.0.fixtureId"]).toBeTruthy();
    const badItem = await stageManager.post(`${base}/notes/show-reports`, {
      ...body,
      items: [{ body: "x", kind: "work", subject: "fixture", subjectId: 2_147_483_000 }],
    });
    expect(badItem.status).toBe(400);
    expect((await designer.get(`${base}/notes`)).json.notes.length).toBe(before);
    expect(
      (await designer.get(`${base}/notes/show-reports`)).json.showReports.some(
        (r: { performance: string; summary: string }) =>
          r.summary === "Smooth; one unit dark." && r.performance === body.performance,
      ),
    ).toBe(false);

    const r = await stageManager.post(`${base}/notes/show-reports`, body);
    expect(r.status).toBe(201);
    for (const n of r.json.notes) created.push(n.id);
    const [cueNote, workNote, lampNote] = r.json.notes;
    expect([cueNote.kind, cueNote.origin, cueNote.showReportId]).toEqual(["cue", "show_report", r.json.report.id]);
    if (designerId) expect(cueNote.ownerId).toBe(designerId);
    if (electricianId) expect([workNote.ownerId, lampNote.ownerId]).toEqual([electricianId, electricianId]);
    expect([lampNote.kind, lampNote.subjectId, lampNote.status]).toEqual(["work", unit.id, "open"]);
    expect(r.json.report.faults).toEqual([
      expect.objectContaining({ fixtureId: unit.id, kind: "lamp_out", description: "dark all second half" }),
    ]);
    const stops = (await electrician.get(`${base}/notes/work-call`)).json.stops as Array<{ note: { id: number } }>;
    expect(stops.some((s) => s.note.id === lampNote.id)).toBe(true);
    // One e-mail to each member of the team, sent or queued for retry.
    expect(r.json.mail.sent + r.json.mail.queued).toBe(members.length);
  });
});

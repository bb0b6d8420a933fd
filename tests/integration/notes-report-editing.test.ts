// Editing show reports against the real MariaDB: the stage manager keeps a draft (nothing written, nothing
// mailed), edits it with the version read (409 with the current report when stale), sends it (its items and
// logged faults become notes, the team is mailed), and from then on it is read-only (409 naming why).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type ApiSession, demoProductionId, demoSession } from "./support/api";

let designer: ApiSession;
let electrician: ApiSession;
let stageManager: ApiSession;
let base = "";
const created: number[] = [];
type Fixture = { id: number; unitNumber: string };
let fixtures: Fixture[] = [];

beforeAll(async () => {
  [designer, electrician, stageManager] = await Promise.all([
    demoSession("designer"),
    demoSession("electrician"),
    demoSession("stageManager"),
  ]);
  base = `/api/productions/${await demoProductionId(designer)}`;
  fixtures = (await designer.get(`${base}/fixtures`)).json.fixtures;
}, 60_000);

afterAll(async () => {
  for (const id of created) await designer.request("DELETE", `${base}/notes/${id}`);
});

const noteCount = async () => ((await designer.get(`${base}/notes`)).json.notes as unknown[]).length;
type Report = { id: number; version: number; status: string; summary: string; items: unknown[] };
const reportById = async (id: number) =>
  ((await designer.get(`${base}/notes/show-reports`)).json.showReports as Report[]).find((r) => r.id === id);

describe("editing a show report until it is sent", () => {
  it("a draft writes nothing; edits are versioned; sending writes the notes once; a sent report is read-only", async () => {
    const [unitA, unitB] = [fixtures[1], fixtures[3]];
    const notesBefore = await noteCount();
    const draft = await stageManager.post(`${base}/notes/show-reports`, {
      performance: "Evening 9",
      performedOn: "2026-12-06",
      summary: "First half fine.",
      items: [{ body: "Blackout at the interval came early", kind: "cue", subject: "production" }],
      faults: [],
      send: false,
    });
    expect(draft.status).toBe(201);
    const id = draft.json.report.id as number;
    expect(draft.json.report).toMatchObject({ status: "draft", sentAt: null, version: 1, noteIds: [] });
    expect(draft.json.notes).toEqual([]);
    expect(draft.json.mail).toBeUndefined(); // a draft goes to nobody
    expect(await noteCount()).toBe(notesBefore);

    // Only the stage manager edits or sends (DESIGN.md: the show report is the stage manager's).
    const change = {
      version: 1,
      summary: "First half fine; one lamp out in the second.",
      items: [
        { body: "Blackout at the interval came early", kind: "cue", subject: "production" },
        { body: "Side light flickers", kind: "work", subject: "fixture", subjectId: unitA.id },
      ],
      faults: [{ fixtureId: unitB.id, kind: "lamp_out", description: "dark from the top of act two" }],
    };
    expect((await electrician.patch(`${base}/notes/show-reports/${id}`, change)).status).toBe(403);
    expect((await designer.post(`${base}/notes/show-reports/${id}/send`, { version: 1 })).status).toBe(403);

    const edited = await stageManager.patch(`${base}/notes/show-reports/${id}`, change);
    expect(edited.status).toBe(200);
    expect(edited.json.showReport).toMatchObject({ version: 2, status: "draft", summary: change.summary });
    expect(edited.json.showReport.items).toHaveLength(2);
    expect(edited.json.showReport.faults).toEqual([expect.objectContaining({ fixtureId: unitB.id, kind: "lamp_out" })]);

    // A second editor still holding version 1 loses nothing silently: 409 with the current report.
    const stale = await stageManager.patch(`${base}/notes/show-reports/${id}`, { version: 1, summary: "Mine" });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current).toMatchObject({ id, version: 2, summary: change.summary });

    // A bad row changes nothing and names the row.
    const bad = await stageManager.patch(`${base}/notes/show-reports/${id}`, {
      version: 2,
      summary: "should not land",
      faults: [{ fixtureId: 2_147_483_000, kind: "fault", description: "x" }],
    });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors["faults.0.fixtureId"]).toBeTruthy();
    const badItem = await stageManager.patch(`${base}/notes/show-reports/${id}`, {
      version: 2,
      items: [{ body: "x", kind: "work", subject: "cue", subjectId: 2_147_483_000 }],
    });
    expect(badItem.status).toBe(400);
    expect(badItem.json.error.fieldErrors["items.0.subjectId"]).toBeTruthy();
    expect(await reportById(id)).toMatchObject({ version: 2, summary: change.summary });
    expect((await stageManager.patch(`${base}/notes/show-reports/${id}`, { version: 2 })).status).toBe(400);

    // Sending at a stale version is refused too; at the current one it writes 2 item notes + 1 lamp-out note.
    expect((await stageManager.post(`${base}/notes/show-reports/${id}/send`, { version: 1 })).status).toBe(409);
    const sent = await stageManager.post(`${base}/notes/show-reports/${id}/send`, { version: 2 });
    expect(sent.status).toBe(200);
    for (const n of sent.json.notes) created.push(n.id);
    expect(sent.json.report).toMatchObject({ status: "sent", version: 3 });
    expect(Date.now() - Date.parse(sent.json.report.sentAt)).toBeLessThan(120_000);
    expect(sent.json.notes.map((n: { kind: string; subjectId: number | null }) => [n.kind, n.subjectId])).toEqual([
      ["cue", null],
      ["work", unitA.id],
      ["work", unitB.id],
    ]);
    expect(sent.json.report.noteIds).toEqual(sent.json.notes.map((n: { id: number }) => n.id));
    expect(await noteCount()).toBe(notesBefore + 3);
    const team = (await designer.get(`${base}/team`)).json;
    const members = (team.team ?? team.members ?? []) as unknown[];
    if (members.length) expect(sent.json.mail.sent + sent.json.mail.queued).toBe(members.length);

    // Read-only from now on: an edit or a second send is a 409 that says it was sent, and nothing changes.
    const late = await stageManager.patch(`${base}/notes/show-reports/${id}`, { version: 3, summary: "after" });
    expect(late.status).toBe(409);
    expect(late.json.error.message).toMatch(/sent/);
    expect(late.json.error.current).toMatchObject({ id, status: "sent", summary: change.summary });
    expect((await stageManager.post(`${base}/notes/show-reports/${id}/send`, { version: 3 })).status).toBe(409);
    expect(await noteCount()).toBe(notesBefore + 3);
    expect(await reportById(id)).toMatchObject({ version: 3, status: "sent" });
  });

  it("filing without `send` still files and sends in one step", async () => {
    const r = await stageManager.post(`${base}/notes/show-reports`, {
      performance: "Evening 10",
      performedOn: "2026-12-07",
      summary: "",
      items: [{ body: "Check the haze level", kind: "general", subject: "production" }],
      faults: [],
    });
    expect(r.status).toBe(201);
    for (const n of r.json.notes) created.push(n.id);
    expect(r.json.report.status).toBe("sent");
    expect(r.json.notes).toHaveLength(1);
    expect(
      (await stageManager.patch(`${base}/notes/show-reports/${r.json.report.id}`, { version: 1, summary: "x" })).status,
    ).toBe(409);
  });
});

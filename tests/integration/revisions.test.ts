// Revisions over HTTP against MariaDB and the mail stand-in: a revision issued after known edits lists exactly
// those edits in their groups; the team's e-mails arrive with the attachments each role needs (parsed back
// with mailparser), not to a member who opted out; any two revisions compare; a unit restored from a revision
// is a new, recorded change (409 when stale); each thing's history is a line per field.
import type * as mariadb from "mariadb";
import ExcelJS from "exceljs";
import type { ParsedMail } from "mailparser";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mailTo } from "@/tests/support/outbox";
import { type ApiSession, freshUser, getBytes } from "./support/api";
import { rigProduction } from "./support/rig";
import { openTestDb } from "./concurrency-support";

let db: mariadb.Connection;
let owner: ApiSession;
let ownerEmail = "";
let pid = 0;
const people = {} as Record<"sm" | "lx" | "viewer", { session: ApiSession; email: string }>;
const shop = `shop-${Date.now()}@example.test`;
let units: Array<{ id: number; version: number; unitNumber: string }> = [];
const cues: Array<{ id: number; version: number; number: number }> = [];
let revA = 0;
let revB = 0;

async function join(role: string, tag: string) {
  const u = await freshUser(tag);
  const [row] = await db.query("SELECT id FROM users WHERE email = ?", [u.email]);
  await db.query("INSERT INTO memberships (user_id, production_id, role, is_owner) VALUES (?, ?, ?, 0)", [
    row.id,
    pid,
    role,
  ]);
  return { session: u.session, email: u.email };
}

const base = () => `/api/productions/${pid}`;
const names = (m: ParsedMail) => m.attachments.map((a) => a.filename ?? "").sort();
const revisionMail = async (to: string, label: string) =>
  (await mailTo(to)).filter((m) => m.subject?.includes(`revision ${label}`));
/** Waits for the revision's message to `to` (the stand-in also holds each account's sign-up mail). */
async function waitForRevisionMail(to: string, label: string, ms = 30_000): Promise<ParsedMail> {
  const end = Date.now() + ms;
  for (;;) {
    const [m] = await revisionMail(to, label);
    if (m) return m;
    if (Date.now() > end) throw new Error(`no revision ${label} message to ${to} within ${ms} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

beforeAll(async () => {
  db = await openTestDb();
  const p = await rigProduction();
  owner = p.s;
  pid = p.id;
  const me = await owner.get("/api/auth/me");
  ownerEmail = me.json.user.email;
  people.sm = await join("stage_manager", "rev-sm");
  people.lx = await join("electrician", "rev-lx");
  people.viewer = await join("viewer", "rev-viewer");

  const made = await owner.post(`${base()}/fixtures`, {
    fixtures: [1, 2, 3].map((n) => ({
      positionId: p.lx1.id,
      fixtureTypeId: p.profile.id,
      unitNumber: String(n),
      channel: n,
      colour: "pale lavender",
      x: n - 2,
      y: 1,
    })),
  });
  expect(made.status, JSON.stringify(made.json)).toBe(201);
  units = made.json.fixtures;
  for (const n of [1, 2]) {
    const c = await owner.post(`${base()}/cues`, { number: n, upTime: 5, levels: { 1: 50, 2: 70 } });
    expect(c.status, JSON.stringify(c.json)).toBe(201);
    cues.push(c.json.cue);
  }
  // The viewer opts out; the owner names the shop.
  expect(
    (await people.viewer.session.request("PUT", `${base()}/revisions/mail-choice`, { receive: false })).status,
  ).toBe(200);
  expect((await owner.request("PUT", `${base()}/revisions/shop`, { shopEmail: shop })).status).toBe(200);
}, 180_000);
afterAll(async () => db?.end());

describe("issuing revisions", () => {
  it("issues A with everything new, then B after known edits listing exactly those, grouped", async () => {
    const a = await owner.post(`${base()}/revisions`, { issuedFor: "hang", note: "first hang" });
    expect(a.status, JSON.stringify(a.json)).toBe(201);
    expect(a.json.revision.label).toBe("A");
    expect(a.json.summary.fixtures.added).toBe(3);
    expect(a.json.summary.cues.added).toBe(2);
    revA = a.json.revision.id;

    // The known edits: recolour unit 1, refocus unit 2, re-patch unit 3, add unit 4; retime cue 1, re-level cue 2.
    const [u1, u2, u3] = units;
    const edits = [
      await owner.patch(`${base()}/fixtures/${u1.id}`, { version: u1.version, colour: "full CTB" }),
      await owner.patch(`${base()}/fixtures/${u2.id}`, { version: u2.version, focusX: 1.25, focusY: 3 }),
      await people.lx.session.patch(`${base()}/fixtures/${u3.id}`, { version: u3.version, universe: 1, address: 101 }),
      await owner.patch(`${base()}/cues/${cues[0].id}`, { version: cues[0].version, upTime: 8 }),
      await owner.patch(`${base()}/cues/${cues[1].id}`, { version: cues[1].version, levels: { 2: 30 } }),
    ];
    for (const e of edits) expect(e.status, JSON.stringify(e.json)).toBe(200);
    const lx1 = (await owner.get(`${base()}/positions`)).json.positions[0];
    const type = (await owner.get(`${base()}/fixture-types`)).json.fixtureTypes[0];
    const added = await owner.post(`${base()}/fixtures`, {
      fixtures: [{ positionId: lx1.id, fixtureTypeId: type.id, unitNumber: "4", channel: 4, x: 2, y: 1 }],
    });
    expect(added.status).toBe(201);

    // The electrician may issue too; an empty label takes the next free letter.
    const b = await people.lx.session.post(`${base()}/revisions`, { label: "", issuedFor: "focus", sparesPercent: 50 });
    expect(b.status, JSON.stringify(b.json)).toBe(201);
    expect(b.json.revision.label).toBe("B");
    expect(b.json.previousLabel).toBe("A");
    expect(b.json.summary.fixtures).toEqual({
      added: 1,
      removed: 0,
      refocused: 1,
      repatched: 1,
      recoloured: 1,
      otherwise: 0,
    });
    expect(b.json.summary.cues).toEqual({ added: 0, removed: 0, retimed: 1, relevelled: 1, otherwise: 0 });
    expect(b.json.mail).toEqual({ queued: 4 }); // owner, stage manager, electrician, shop; not the viewer
    revB = b.json.revision.id;

    const detail = await owner.get(`${base()}/revisions/${revB}`);
    expect(detail.status).toBe(200);
    const { diff } = detail.json;
    expect(diff.fixtures.recoloured).toEqual([
      {
        id: u1.id,
        name: "LX1 unit 1 (channel 1)",
        changes: [{ field: "colour", label: "Colour", before: "pale lavender", after: "full CTB" }],
      },
    ]);
    expect(diff.fixtures.refocused[0].changes.map((c: { field: string }) => c.field).sort()).toEqual([
      "focusX",
      "focusY",
    ]);
    expect(diff.fixtures.repatched[0].changes.map((c: { field: string }) => c.field).sort()).toEqual([
      "address",
      "universe",
    ]);
    expect(diff.cues.retimed[0].changes).toEqual([{ field: "upTime", label: "Up time", before: 5, after: 8 }]);
    expect(diff.cues.relevelled[0].levels).toEqual([{ channel: 2, before: 70, after: 30 }]);
  }, 180_000);

  it("refuses a label already issued, a stage manager, and a body with an unknown field", async () => {
    const dup = await owner.post(`${base()}/revisions`, { label: "a", issuedFor: "tech" });
    expect(dup.status).toBe(400);
    expect(dup.json.error.fieldErrors.label).toBeDefined();
    expect((await people.sm.session.post(`${base()}/revisions`, { issuedFor: "tech" })).status).toBe(403);
    const odd = await owner.post(`${base()}/revisions`, { issuedFor: "tech", letter: "Z" });
    expect(odd.status).toBe(400);
    expect((await owner.get(`${base()}/revisions`)).json.revisions.map((r: { label: string }) => r.label)).toEqual([
      "B",
      "A",
    ]);
  });
});

describe("the revision e-mail", () => {
  it("reaches each member who did not opt out, with the attachments of their role", async () => {
    await waitForRevisionMail(people.sm.email, "A");
    const smB = await waitForRevisionMail(people.sm.email, "B");
    expect(smB.subject).toContain("revision B");
    expect(smB.text).toContain("Changes since revision A");
    expect(smB.text).toContain("Fixtures recoloured (1):");
    expect(smB.text).toContain("Colour pale lavender → full CTB");
    expect(smB.text).toContain("Cues retimed (1):");
    expect(names(smB)).toEqual([
      expect.stringMatching(/cue sheet rev B\.csv$/),
      expect.stringMatching(/cue sheet rev B\.xlsx$/),
    ]);
    const csv = smB.attachments.find((a) => a.filename?.endsWith(".csv"))!.content.toString("utf8");
    expect(csv.split(/\r?\n/).filter((l) => l.trim()).length).toBe(3); // header and the two cues

    const lx = await waitForRevisionMail(people.lx.email, "B");
    expect(names(lx)).toEqual([
      expect.stringMatching(/changed focus charts rev B\.xlsx$/),
      expect.stringMatching(/rig rev B\.xlsx$/),
    ]);
    // The focus charts hold the new unit and the refocused one, nothing else.
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(lx.attachments.find((a) => a.filename?.includes("focus"))!.content as never);
    expect(book.worksheets[0].rowCount).toBe(3);

    await waitForRevisionMail(ownerEmail, "B");
    const own = await revisionMail(ownerEmail, "B");
    expect(own).toHaveLength(1);
    expect(own[0].attachments).toHaveLength(0);

    const shopMail = await waitForRevisionMail(shop, "B");
    const list = shopMail.attachments.find((a) => a.filename?.endsWith(".csv"))!.content.toString("utf8");
    // 3 units at A and 4 at B, 50 % spares rounded up: 3 + 2 = 5, then 4 + 2 = 6, so one more to send.
    expect(list).toMatch(/Fixture,Profile 26,5,6,1,0/);

    expect(await revisionMail(people.viewer.email, "B")).toEqual([]);
  }, 90_000);
});

describe("comparing and restoring", () => {
  it("compares any two revisions, and a revision with the paperwork now", async () => {
    const ab = await owner.get(`${base()}/revisions/compare?from=${revA}&to=${revB}`);
    expect(ab.status).toBe(200);
    expect(ab.json.diff.fixtures.added).toHaveLength(1);
    const ba = await owner.get(`${base()}/revisions/compare?from=${revB}&to=${revA}`);
    expect(ba.json.diff.fixtures.removed).toHaveLength(1); // the other way round, unit 4 is gone
    const now = await owner.get(`${base()}/revisions/compare?from=${revB}&to=current`);
    expect(Object.values(now.json.diff.fixtures).flat()).toEqual([]);
    expect((await owner.get(`${base()}/revisions/compare?from=${revB}&to=nonsense`)).status).toBe(400);
  });

  it("restores one unit's values from A as a new recorded change, refusing a stale version with 409", async () => {
    const u1 = units[0];
    const current = (await owner.get(`${base()}/fixtures/${u1.id}`)).json.fixture;
    const stale = await owner.post(`${base()}/revisions/${revA}/restore`, {
      entity: "fixture",
      id: u1.id,
      version: current.version - 1,
    });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.colour).toBe("full CTB");
    // The electrician may not write a colour, so may not restore one.
    const lx = await people.lx.session.post(`${base()}/revisions/${revA}/restore`, {
      entity: "fixture",
      id: u1.id,
      version: current.version,
    });
    expect(lx.status).toBe(403);
    expect(Object.keys(lx.json.error.fieldErrors)).toEqual(["colour"]);
    const ok = await owner.post(`${base()}/revisions/${revA}/restore`, {
      entity: "fixture",
      id: u1.id,
      version: current.version,
    });
    expect(ok.status, JSON.stringify(ok.json)).toBe(200);
    expect(ok.json.fixture.colour).toBe("pale lavender");
    expect(ok.json.fixture.version).toBe(current.version + 1);

    const history = (await people.viewer.session.get(`${base()}/history?entity=fixture&id=${u1.id}`)).json.history;
    expect(history[0]).toMatchObject({
      field: "colour",
      before: "full CTB",
      after: "pale lavender",
      restoredFrom: "A",
    });
    expect(history[1]).toMatchObject({
      field: "colour",
      before: "pale lavender",
      after: "full CTB",
      restoredFrom: null,
    });
    expect(history[1].who).toMatch(/^Test rigio/);
    expect(history.at(-1)).toMatchObject({ action: "create" });
    // Nothing left to restore: a clear 400, no empty change.
    const again = await owner.post(`${base()}/revisions/${revA}/restore`, {
      entity: "fixture",
      id: u1.id,
      version: ok.json.fixture.version,
    });
    expect(again.status).toBe(400);
  });

  it("restores a cue's time and levels from A", async () => {
    const cue = (await owner.get(`${base()}/cues/${cues[1].id}`)).json.cue;
    const r = await owner.post(`${base()}/revisions/${revA}/restore`, {
      entity: "cue",
      id: cue.id,
      version: cue.version,
    });
    expect(r.status, JSON.stringify(r.json)).toBe(200);
    expect(r.json.cue.levels).toEqual({ 1: 50, 2: 70 });
    const history = (await owner.get(`${base()}/history?entity=cue&id=${cue.id}`)).json.history;
    expect(history[0]).toMatchObject({ label: "Channel 2 level", before: 30, after: 70, restoredFrom: "A" });
  });

  it("answers 404 for a history of something not in the production, and 400 for a bad entity", async () => {
    expect((await owner.get(`${base()}/history?entity=fixture&id=2147483000`)).status).toBe(404);
    expect((await owner.get(`${base()}/history?entity=cable&id=1`)).status).toBe(400);
  });
});

describe("equipment for the shop", () => {
  it("lists units with spares and the add / return list between the two revisions, as CSV and Excel", async () => {
    const r = await owner.get(`${base()}/revisions/equipment?of=${revB}&from=${revA}&spares=10`);
    expect(r.status).toBe(200);
    // 4 units of Profile 26 at B, 10 % spares rounded up: 1.
    expect(r.json.list).toEqual([{ kind: "type", name: "Profile 26", inUse: 4, spares: 1, total: 5 }]);
    expect(r.json.addReturn).toEqual([{ kind: "type", name: "Profile 26", before: 4, after: 5, add: 1, return: 0 }]);
    const csv = await getBytes(owner, `${base()}/revisions/equipment?of=${revB}&from=${revA}&format=csv`);
    expect(csv.type).toMatch(/text\/csv/);
    expect(csv.bytes.toString("utf8")).toContain("Send (add)");
    const xlsx = await getBytes(owner, `${base()}/revisions/equipment?of=${revB}&format=xlsx`);
    expect(xlsx.bytes.subarray(0, 2).toString()).toBe("PK");
    expect((await owner.get(`${base()}/revisions/equipment?spares=150`)).status).toBe(400);
  });
});

// Through the real route handlers, over HTTP, against the migrated and seeded MariaDB.
import { describe, expect, it } from "vitest";
import { waitForMail } from "@/tests/support/outbox";
import { testClientAddress } from "@/tests/support/sign-up";
import { ApiSession, DEMO_USERS, demoProductionId, demoSession, freshUser } from "./support/api";

describe("health", () => {
  it("reports the database reachable", async () => {
    const r = await new ApiSession().get("/api/health");
    expect(r.status).toBe(200);
    expect(r.json).toEqual({ status: "ok", database: "reachable" });
  });
});

describe("sign-in", () => {
  it("signs in a demo user and reads who is signed in", async () => {
    const s = await demoSession("designer");
    const me = await s.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(me.json.user.email).toBe(DEMO_USERS.designer);
  });

  it("gives the same 401 message for an unknown address and a wrong password", async () => {
    const unknown = await new ApiSession().post("/api/auth/sign-in", {
      email: "nobody@nowhere.test",
      password: "whatever-it-is",
    });
    const wrong = await new ApiSession().post("/api/auth/sign-in", {
      email: DEMO_USERS.designer,
      password: "not-the-password",
    });
    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(401);
    expect(unknown.json.error.message).toBe(wrong.json.error.message);
  });

  it("names the missing field", async () => {
    const r = await new ApiSession().post("/api/auth/sign-in", { email: DEMO_USERS.designer });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("password");
  });

  it("refuses a malformed JSON body with 400", async () => {
    const r = await new ApiSession().request("POST", "/api/auth/sign-in", undefined, "{not json");
    expect(r.status).toBe(400);
    expect(r.json.error.message).toMatch(/not valid JSON/);
  });

  it("signs up once per address: asking again answers the same and makes no second account", async () => {
    const { email } = await freshUser("dup");
    const again = await new ApiSession().request("POST", "/api/auth/sign-up", { name: "B", email }, undefined, {
      "x-forwarded-for": testClientAddress(),
    });
    expect(again.status).toBe(202);
    const mail = await waitForMail(email, 2);
    expect(mail.subject).toMatch(/tried to create a Throwline account/);
    expect(mail.text).not.toMatch(/\/sign-up\/[A-Za-z0-9_-]{43}/);
  });

  it("signs out", async () => {
    const s = await demoSession("viewer");
    await s.post("/api/auth/sign-out");
    expect((await s.get("/api/auth/me")).status).toBe(401);
  });

  it("asks an anonymous caller to sign in", async () => {
    expect((await new ApiSession().get("/api/productions")).status).toBe(401);
  });
});

describe("productions", () => {
  it("creates a production whose creator is owner and designer", async () => {
    const { session } = await freshUser("creator");
    const created = await session.post("/api/productions", { name: "Test Piece", venue: "Studio B" });
    expect(created.status).toBe(201);
    const id = created.json.production.id;
    const read = await session.get(`/api/productions/${id}`);
    expect(read.status).toBe(200);
    expect(read.json.you).toEqual({ role: "designer", isOwner: true });
    expect(read.json.production.displayUnits).toBe("metric");
  });

  it("refuses a production without a name, naming the field", async () => {
    const { session } = await freshUser("noname");
    const r = await session.post("/api/productions", { venue: "Somewhere" });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("name");
  });

  it("hides a production from an outsider (404, not 403)", async () => {
    const designer = await demoSession("designer");
    const id = await demoProductionId(designer);
    const { session: outsider } = await freshUser("outsider");
    expect((await outsider.get(`/api/productions/${id}`)).status).toBe(404);
    expect((await outsider.get(`/api/productions/${id}/fixtures`)).status).toBe(404);
    expect((await outsider.patch(`/api/productions/${id}`, { version: 1, name: "Mine now" })).status).toBe(404);
  });

  it("answers 404 for an unknown or malformed production id", async () => {
    const s = await demoSession("designer");
    expect((await s.get("/api/productions/999999")).status).toBe(404);
    expect((await s.get("/api/productions/abc")).status).toBe(404);
  });

  it("does not let a viewer change settings", async () => {
    const viewer = await demoSession("viewer");
    const id = await demoProductionId(viewer);
    const current = (await viewer.get(`/api/productions/${id}`)).json.production;
    const r = await viewer.patch(`/api/productions/${id}`, { version: current.version, venue: "Elsewhere" });
    expect(r.status).toBe(403);
  });

  it("names the field when a string arrives where a number belongs", async () => {
    const { session } = await freshUser("types");
    const id = (await session.post("/api/productions", { name: "Typed" })).json.production.id;
    const r = await session.patch(`/api/productions/${id}`, { version: 1, headHeight: "tall" });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("headHeight");
  });

  it("answers a stale version with 409 and the current row, and keeps the first write", async () => {
    const { session } = await freshUser("stale");
    const id = (await session.post("/api/productions", { name: "Race" })).json.production.id;
    const first = await session.patch(`/api/productions/${id}`, { version: 1, venue: "First venue" });
    expect(first.status).toBe(200);
    expect(first.json.production.version).toBe(2);
    const second = await session.patch(`/api/productions/${id}`, { version: 1, venue: "Second venue" });
    expect(second.status).toBe(409);
    expect(second.json.error.current.venue).toBe("First venue");
    expect(second.json.error.current.version).toBe(2);
    expect((await session.get(`/api/productions/${id}`)).json.production.venue).toBe("First venue");
  });
});

describe("fixtures", () => {
  it("lists the demo rig with computed pools", async () => {
    const s = await demoSession("viewer");
    const id = await demoProductionId(s);
    const r = await s.get(`/api/productions/${id}/fixtures`);
    expect(r.status).toBe(200);
    expect(r.json.fixtures.length).toBeGreaterThanOrEqual(100);
    const aimed = r.json.fixtures.find((f: any) => f.computed.focus);
    expect(aimed.computed.throw).toBeGreaterThan(0);
    expect(["ok", "open", "none"]).toContain(aimed.computed.deck.status);
  });

  it("lets the electrician set a circuit but not a colour", async () => {
    const el = await demoSession("electrician");
    const id = await demoProductionId(el);
    const f = (await el.get(`/api/productions/${id}/fixtures`)).json.fixtures[5];
    const denied = await el.patch(`/api/productions/${id}/fixtures/${f.id}`, {
      version: f.version,
      colour: "deep amber",
    });
    expect(denied.status).toBe(403);
    expect(denied.json.error.fieldErrors).toHaveProperty("colour");
    const ok = await el.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, circuit: "A-17" });
    expect(ok.status).toBe(200);
    expect(ok.json.fixture.circuit).toBe("A-17");
    expect(ok.json.fixture.version).toBe(f.version + 1);
  });

  it("keeps both people's work when two edit one fixture: the second gets 409", async () => {
    const designer = await demoSession("designer");
    const el = await demoSession("electrician");
    const id = await demoProductionId(designer);
    const f = (await designer.get(`/api/productions/${id}/fixtures`)).json.fixtures[7];
    const a = await designer.patch(`/api/productions/${id}/fixtures/${f.id}`, {
      version: f.version,
      colour: "pale amber",
    });
    const b = await el.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, circuit: "B-2" });
    expect(a.status).toBe(200);
    expect(b.status).toBe(409);
    expect(b.json.error.current.colour).toBe("pale amber");
  });

  it("refuses a DMX address that runs past slot 512 (ANSI E1.11)", async () => {
    const el = await demoSession("electrician");
    const id = await demoProductionId(el);
    const f = (await el.get(`/api/productions/${id}/fixtures`)).json.fixtures.find((x: any) => x.footprint === 8);
    const r = await el.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, address: 506 });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("address");
    const ok = await el.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, address: 505 });
    expect(ok.status).toBe(200);
  });

  it("refuses a cone of 180° naming the field", async () => {
    const designer = await demoSession("designer");
    const id = await demoProductionId(designer);
    const f = (await designer.get(`/api/productions/${id}/fixtures`)).json.fixtures[0];
    const r = await designer.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, coneDeg: 180 });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("coneDeg");
  });
});

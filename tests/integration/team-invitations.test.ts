// Invitations and team management over HTTP against MariaDB and the mail stand-in: the e-mail reaches the
// invited address with a working link, the link makes a member with the invited role once and only once,
// altered and expired links are refused with nobody signed in, and the team is the owner's to manage.
import * as mariadb from "mariadb";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_USERS } from "@/tests/support/demo";
import { linkIn, waitForMail } from "@/tests/support/outbox";
import { ApiSession, demoProductionId, demoSession, freshUser, uniqueEmail } from "./support/api";

let owner: ApiSession;
let pid = 0;
let db: mariadb.Connection;

beforeAll(async () => {
  owner = await demoSession("designer"); // the demo's owner
  pid = await demoProductionId(owner);
  const u = new URL(process.env.DATABASE_URL!);
  db = await mariadb.createConnection({
    host: u.hostname,
    port: Number(u.port),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.slice(1),
  });
}, 60_000);
afterAll(async () => db?.end());

async function invite(email: string, role: string) {
  const r = await owner.post(`/api/productions/${pid}/invitations`, { email, role });
  expect(r.status, JSON.stringify(r.json)).toBe(201);
  return r.json.invitation as { id: number; email: string; role: string; mailSent: boolean };
}

async function tokenFor(email: string, nth = 1) {
  const mail = await waitForMail(email, nth);
  return { mail, token: linkIn(mail, "/invite/").pathname.split("/").pop()! };
}

const team = async (s: ApiSession) =>
  (await s.get(`/api/productions/${pid}/team`)).json?.members as Array<{
    userId: number;
    email: string;
    role: string;
    isOwner: boolean;
    version: number;
  }>;

describe("an invitation by e-mail", () => {
  it("reaches the invited address with a link that signs up a new stage manager once, landing on the cues", async () => {
    const email = uniqueEmail("sm-invite");
    const inv = await invite(email, "stage_manager");
    expect(inv.mailSent).toBe(true);
    const { mail, token } = await tokenFor(email);
    expect(mail.to && "value" in mail.to ? mail.to.value.map((a) => a.address) : []).toEqual([email]);
    expect(mail.text).toContain("Salt and Lantern");

    // The link's page opens for anyone holding it.
    const page = await new ApiSession().get(`/invite/${token}`);
    expect(page.status).toBe(200);

    const newcomer = new ApiSession();
    const r = await newcomer.post("/api/invitations/accept", {
      token,
      name: "Nell Quarry",
      password: "a-long-test-password",
    });
    expect(r.status, JSON.stringify(r.json)).toBe(201);
    expect(r.json.landing).toBe(`/productions/${pid}/cues`); // the stage manager's landing tab (DESIGN.md)
    const me = await newcomer.get("/api/auth/me");
    expect(me.json.user.email).toBe(email);
    const row = (await team(owner)).find((m) => m.email === email);
    expect(row?.role).toBe("stage_manager");
    expect(row?.isOwner).toBe(false);

    // Twice: refused, and whoever tried is not signed in.
    const again = new ApiSession();
    const second = await again.post("/api/invitations/accept", {
      token,
      name: "Someone Else",
      password: "another-long-password",
    });
    expect(second.status).toBe(409);
    expect(second.json.error.message).toMatch(/already been used/);
    expect((await again.get("/api/auth/me")).status).toBe(401);
    expect((await team(owner)).filter((m) => m.email === email)).toHaveLength(1);
  }, 60_000);

  it("refuses an altered link and an expired one, signing nobody in and writing nothing", async () => {
    const email = uniqueEmail("tamper");
    await invite(email, "viewer");
    const { token } = await tokenFor(email);
    const altered = (token[0] === "A" ? "B" : "A") + token.slice(1);
    const s = new ApiSession();
    const bad = await s.post("/api/invitations/accept", {
      token: altered,
      name: "Mallory",
      password: "a-long-test-password",
    });
    expect(bad.status).toBe(404);
    expect(bad.json.error.message).toMatch(/not valid/);
    expect((await s.get("/api/auth/me")).status).toBe(401);

    await db.query("UPDATE invitations SET expires_at = NOW(3) - INTERVAL 1 MINUTE WHERE email = ?", [email]);
    const late = await s.post("/api/invitations/accept", {
      token,
      name: "Late Comer",
      password: "a-long-test-password",
    });
    expect(late.status).toBe(409);
    expect(late.json.error.message).toMatch(/expired/);
    expect((await s.get("/api/auth/me")).status).toBe(401);
    const [{ n }] = await db.query("SELECT COUNT(*) AS n FROM users WHERE email = ?", [email]);
    expect(Number(n)).toBe(0);
  }, 60_000);

  it("an address already on the team gets a message, and a second invitation to an open address is the same one with a new link", async () => {
    const already = await owner.post(`/api/productions/${pid}/invitations`, {
      email: DEMO_USERS.electrician.toUpperCase(),
      role: "viewer",
    });
    expect(already.status).toBe(409);
    expect(already.json.error.message).toMatch(/already on this production's team/);
    const [{ n }] = await db.query("SELECT COUNT(*) AS n FROM invitations WHERE email = ?", [DEMO_USERS.electrician]);
    expect(Number(n)).toBe(0);

    const email = uniqueEmail("twice");
    const first = await invite(email, "viewer");
    const { token: oldToken } = await tokenFor(email, 1);
    const second = await invite(email, "electrician");
    expect(second.id).toBe(first.id);
    expect(second.role).toBe("electrician");
    const { token: newToken } = await tokenFor(email, 2);
    const open = (await owner.get(`/api/productions/${pid}/invitations`)).json.invitations as Array<{ email: string }>;
    expect(open.filter((i) => i.email === email)).toHaveLength(1);
    expect(
      (
        await new ApiSession().post("/api/invitations/accept", {
          token: oldToken,
          name: "Old Link",
          password: "a-long-test-password",
        })
      ).status,
    ).toBe(404);

    // Withdrawn: the new link stops working too.
    expect((await owner.request("DELETE", `/api/productions/${pid}/invitations/${first.id}`)).status).toBe(200);
    const withdrawn = await new ApiSession().post("/api/invitations/accept", {
      token: newToken,
      name: "Withdrawn",
      password: "a-long-test-password",
    });
    expect(withdrawn.status).toBe(409);
    expect(withdrawn.json.error.message).toMatch(/withdrawn/);
  }, 60_000);

  it("a signed-in user with an account joins with it (no second account)", async () => {
    const { session: s, email } = await freshUser("existing");
    await invite(email, "electrician");
    const { token } = await tokenFor(email, 2); // the first mail was the sign-up link
    const r = await s.post("/api/invitations/accept", { token });
    expect(r.status, JSON.stringify(r.json)).toBe(201);
    expect(r.json.landing).toBe(`/productions/${pid}`);
    expect((await team(owner)).find((m) => m.email === email)?.role).toBe("electrician");
  }, 60_000);
});

describe("the team is the owner's to manage", () => {
  it("role changes: 403 for a member who is not the owner, 409 on a stale version, then the change", async () => {
    const email = uniqueEmail("role");
    await invite(email, "viewer");
    const { token } = await tokenFor(email);
    const joined = await new ApiSession().post("/api/invitations/accept", {
      token,
      name: "Rolf Change",
      password: "a-long-test-password",
    });
    const userId = joined.json.membership.userId as number;
    const row = (await team(owner)).find((m) => m.userId === userId)!;

    for (const who of ["electrician", "stageManager", "viewer"] as const) {
      const s = await demoSession(who);
      const r = await s.patch(`/api/productions/${pid}/team/${userId}`, { role: "designer", version: row.version });
      expect(r.status, who).toBe(403);
      expect((await s.request("DELETE", `/api/productions/${pid}/team/${userId}`)).status, who).toBe(403);
    }
    const stale = await owner.patch(`/api/productions/${pid}/team/${userId}`, {
      role: "designer",
      version: row.version + 5,
    });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.role).toBe("viewer");
    const ok = await owner.patch(`/api/productions/${pid}/team/${userId}`, {
      role: "electrician",
      version: row.version,
    });
    expect(ok.status, JSON.stringify(ok.json)).toBe(200);
    expect(ok.json.member.role).toBe("electrician");

    const removed = await owner.request("DELETE", `/api/productions/${pid}/team/${userId}`);
    expect(removed.status).toBe(200);
    expect((await team(owner)).some((m) => m.userId === userId)).toBe(false);
  }, 60_000);

  it("the last owner cannot be removed", async () => {
    const ownerRow = (await team(owner)).find((m) => m.email === DEMO_USERS.designer)!;
    expect(ownerRow.isOwner).toBe(true);
    const r = await owner.request("DELETE", `/api/productions/${pid}/team/${ownerRow.userId}`);
    expect(r.status).toBe(409);
    expect(r.json.error.message).toMatch(/last owner/);
    expect((await team(owner)).some((m) => m.userId === ownerRow.userId)).toBe(true);
  }, 30_000);
});

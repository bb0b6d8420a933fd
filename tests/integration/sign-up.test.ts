// Sign-up by mailed link, over HTTP against MariaDB and the mail stand-in: the request answers the same
// whether or not the address has an account (only the mailbox learns which), the link makes one account
// once, refused links sign nobody in, and a new account can join the productions that invited it.
import * as mariadb from "mariadb";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { linkIn, mailTo, waitForMail } from "@/tests/support/outbox";
import { signUpLinkToken, signUpThroughMail, testClientAddress } from "@/tests/support/sign-up";
import { ApiSession, demoProductionId, demoSession, freshUser, postVia, uniqueEmail } from "./support/api";

let db: mariadb.Connection;
beforeAll(async () => {
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

const SIGN_UP_LINK = /\/sign-up\/[A-Za-z0-9_-]{43}/;
const RESET_LINK = /\/reset-password\/[A-Za-z0-9_-]{43}/;

async function askToSignUp(email: string, name = "Someone") {
  const started = performance.now();
  const r = await new ApiSession().request("POST", "/api/auth/sign-up", { name, email }, undefined, {
    "x-forwarded-for": testClientAddress(),
  });
  return { ...r, ms: performance.now() - started };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const accountsWith = async (email: string) =>
  Number((await db.query("SELECT COUNT(*) AS n FROM users WHERE email = ?", [email]))[0].n);

describe("asking to sign up", () => {
  it("answers the same for a new address and one with an account; only the mail differs", async () => {
    const { email: taken } = await freshUser("signup-taken");
    const fresh = uniqueEmail("signup-new");
    const a = await askToSignUp(taken, "Somebody Else");
    const b = await askToSignUp(fresh, "Nell Quarry");
    expect([a.status, b.status]).toEqual([202, 202]);
    expect(a.json).toEqual(b.json);
    expect(a.json.message).toMatch(/check your e-mail/i);

    // The new address: a link that finishes the account, and nothing about resets.
    const toFresh = await waitForMail(fresh);
    expect(toFresh.subject).toBe("Finish creating your Throwline account");
    expect(toFresh.text).toMatch(SIGN_UP_LINK);
    expect(toFresh.text).not.toMatch(RESET_LINK);
    expect(toFresh.text).toContain("Nell Quarry");
    // The address with an account: no second account, a note and a working reset link.
    const toTaken = await waitForMail(taken, 2); // the first was its own sign-up link
    expect(toTaken.subject).toMatch(/tried to create a Throwline account/);
    expect(toTaken.text).not.toMatch(SIGN_UP_LINK);
    expect(await accountsWith(taken)).toBe(1);
    const reset = linkIn(toTaken, "/reset-password/").pathname.split("/").pop()!;
    const confirmed = await new ApiSession().post("/api/auth/password-reset/confirm", {
      token: reset,
      password: "a-newer-test-password",
    });
    expect(confirmed.status, JSON.stringify(confirmed.json)).toBe(200);
  }, 60_000);

  it("takes about as long for either kind of address (both look up, write one link, queue one mail)", async () => {
    // Alternating, several each, medians compared: the answer must not give away which path ran. The
    // bound is loose on purpose (a shared, loaded machine); a path that sent its mail before answering
    // (an SMTP round trip) or hashed a password would take several times as long as the other.
    const taken = await Promise.all([0, 1, 2, 3, 4].map(async (i) => (await freshUser(`timing-${i}`)).email));
    const times = { existing: [] as number[], fresh: [] as number[] };
    for (let i = 0; i < taken.length; i++) {
      times.existing.push((await askToSignUp(taken[i])).ms);
      times.fresh.push((await askToSignUp(uniqueEmail(`timing-new-${i}`))).ms);
    }
    const [e, f] = [median(times.existing), median(times.fresh)];
    console.log(`sign-up request, median of 5: existing address ${e.toFixed(1)} ms, new address ${f.toFixed(1)} ms`);
    expect(Math.abs(e - f)).toBeLessThan(Math.max(30, 1.5 * Math.min(e, f)));
  }, 120_000);

  it("refuses a request without a name or with a bad address, naming the field, and sends nothing", async () => {
    const email = uniqueEmail("signup-bad");
    const noName = await new ApiSession().post("/api/auth/sign-up", { email });
    expect(noName.status).toBe(400);
    expect(noName.json.error.fieldErrors).toHaveProperty("name");
    const badEmail = await new ApiSession().post("/api/auth/sign-up", { name: "X", email: "not-an-address" });
    expect(badEmail.status).toBe(400);
    expect(badEmail.json.error.fieldErrors).toHaveProperty("email");
    // A password is chosen from the link, never sent with the request.
    const withPassword = await new ApiSession().post("/api/auth/sign-up", {
      name: "X",
      email,
      password: "a-long-test-password",
    });
    expect(withPassword.status).toBe(400);
    expect(await mailTo(email)).toHaveLength(0);
  });
});

describe("the mailed link", () => {
  it("makes the account once and signs it in; an altered or used link signs nobody in", async () => {
    const email = uniqueEmail("signup-link");
    const s = new ApiSession();
    const token = await signUpLinkToken(postVia(s), { email, name: "Orla Penhallow" });

    const page = await new ApiSession().get(`/sign-up/${token}`);
    expect(page.status).toBe(200);
    expect(page.json.raw).toContain("Finish creating your account");
    expect(page.json.raw).toContain(email);

    const altered = (token[0] === "A" ? "B" : "A") + token.slice(1);
    const thief = new ApiSession();
    const refused = await thief.post("/api/auth/sign-up/complete", {
      token: altered,
      name: "Thief",
      password: "a-hijacking-password",
    });
    expect(refused.status).toBe(404);
    expect(refused.json.error.message).toMatch(/not valid/);
    expect(thief.cookie).toBe("");
    expect((await new ApiSession().get(`/sign-up/${altered}`)).json.raw).toContain("This link does not work");

    const done = await s.post("/api/auth/sign-up/complete", {
      token,
      name: "Orla Penhallow",
      password: "a-long-test-password",
    });
    expect(done.status, JSON.stringify(done.json)).toBe(201);
    expect(done.json.landing).toBe("/welcome");
    expect((await s.get("/api/auth/me")).json.user).toMatchObject({ email, name: "Orla Penhallow" });
    expect(await accountsWith(email)).toBe(1);

    const again = new ApiSession();
    const twice = await again.post("/api/auth/sign-up/complete", {
      token,
      name: "Second Go",
      password: "another-long-password",
    });
    expect(twice.status).toBe(409);
    expect(twice.json.error.message).toMatch(/already been used/);
    expect(again.cookie).toBe("");
    const usedPage = (await new ApiSession().get(`/sign-up/${token}`)).json.raw as string;
    expect(usedPage).toContain("This sign-up link was already used");
    expect(usedPage).not.toContain("Create my account");
    expect(await accountsWith(email)).toBe(1);
  }, 60_000);

  it("an expired link: a clear page, and nothing is made", async () => {
    const email = uniqueEmail("signup-expired");
    const token = await signUpLinkToken(postVia(new ApiSession()), { email, name: "Late Comer" });
    await db.query("UPDATE sign_up_links SET expires_at = NOW(3) - INTERVAL 1 SECOND WHERE email = ?", [email]);
    const s = new ApiSession();
    const r = await s.post("/api/auth/sign-up/complete", {
      token,
      name: "Late Comer",
      password: "a-long-test-password",
    });
    expect(r.status).toBe(409);
    expect(r.json.error.message).toMatch(/expired/);
    expect(s.cookie).toBe("");
    expect((await new ApiSession().get(`/sign-up/${token}`)).json.raw).toContain("This sign-up link has expired");
    expect(await accountsWith(email)).toBe(0);
  }, 60_000);

  it("an address that got its account another way meanwhile cannot finish a second one", async () => {
    const owner = await demoSession("designer");
    const pid = await demoProductionId(owner);
    const email = uniqueEmail("signup-raced");
    const token = await signUpLinkToken(postVia(new ApiSession()), { email, name: "Two Doors" });
    expect((await owner.post(`/api/productions/${pid}/invitations`, { email, role: "viewer" })).status).toBe(201);
    const invite = linkIn(await waitForMail(email, 2), "/invite/")
      .pathname.split("/")
      .pop()!;
    const accepted = await new ApiSession().post("/api/invitations/accept", {
      token: invite,
      name: "Two Doors",
      password: "a-long-test-password",
    });
    expect(accepted.status, JSON.stringify(accepted.json)).toBe(201);
    const late = await new ApiSession().post("/api/auth/sign-up/complete", {
      token,
      name: "Two Doors",
      password: "a-long-test-password",
    });
    expect(late.status).toBe(409);
    expect(late.json.error.message).toMatch(/already uses this address/);
    expect(await accountsWith(email)).toBe(1);
  }, 60_000);
});

describe("a new account and the invitations waiting for its address", () => {
  it("lists them, joins one with its role, and cannot join another address's", async () => {
    const owner = await demoSession("designer");
    const pid = await demoProductionId(owner);
    const email = uniqueEmail("signup-invited");
    const invited = await owner.post(`/api/productions/${pid}/invitations`, { email, role: "electrician" });
    expect(invited.status).toBe(201);
    const invitationId = invited.json.invitation.id as number;

    const s = new ApiSession();
    await signUpThroughMail(postVia(s), { email, name: "Wren Halloway" });
    const listed = await s.get("/api/auth/invitations");
    expect(listed.status).toBe(200);
    expect(listed.json.invitations).toEqual([
      expect.objectContaining({
        id: invitationId,
        productionId: pid,
        role: "electrician",
        productionName: "Salt and Lantern",
      }),
    ]);
    const welcome = (await s.get("/welcome")).json.raw as string;
    expect(welcome).toContain("Salt and Lantern");
    expect(welcome).toContain("Invitations waiting for you");

    // Someone else's account cannot take it, even knowing its id.
    const { session: other } = await freshUser("signup-other");
    expect((await other.post("/api/auth/invitations/join", { invitationId })).status).toBe(404);

    const joined = await s.post("/api/auth/invitations/join", { invitationId });
    expect(joined.status, JSON.stringify(joined.json)).toBe(201);
    expect(joined.json.landing).toBe(`/productions/${pid}`);
    const team = (await owner.get(`/api/productions/${pid}/team`)).json.members as Array<{
      email: string;
      role: string;
    }>;
    expect(team.find((m) => m.email === email)?.role).toBe("electrician");
    expect((await s.post("/api/auth/invitations/join", { invitationId })).status).toBe(409);
    expect((await s.get("/api/auth/invitations")).json.invitations).toEqual([]);
    expect((await new ApiSession().get("/api/auth/invitations")).status).toBe(401);
  }, 90_000);
});

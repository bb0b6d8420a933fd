// Sessions end on the server, sign-in attempts are limited per account and per address, and bodies are
// capped before they are read. Through the real route handlers against MariaDB.
import { describe, expect, it } from "vitest";
import { signUpLinkToken } from "@/tests/support/sign-up";
import { ApiSession, BASE_URL, freshUser, postVia, uniqueEmail } from "./support/api";
import { SIGN_IN_LIMITS } from "@/lib/auth/sign-in-limits";

/** A unique client address per test, so per-address counts never leak between tests (X-Forwarded-For). */
const address = () => `198.51.100.${Math.floor(Math.random() * 250) + 1}-${Date.now()}`;

async function signIn(email: string, password: string, from: string) {
  const res = await fetch(`${BASE_URL}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-forwarded-for": from },
    body: JSON.stringify({ email, password }),
  });
  return {
    status: res.status,
    retryAfter: res.headers.get("retry-after"),
    json: await res.json(),
    cookie: res.headers.getSetCookie()[0]?.split(";")[0] ?? "",
  };
}

describe("signing out ends the session on the server", () => {
  it("a cookie replayed after sign-out is signed out, while another session of the same user lives on", async () => {
    const { email } = await freshUser("replay");
    const from = address();
    const first = await signIn(email, "a-long-test-password", from);
    const second = await signIn(email, "a-long-test-password", from);
    expect(first.status).toBe(200);
    const me = (cookie: string) => fetch(`${BASE_URL}/api/auth/me`, { headers: { cookie } }).then((r) => r.status);
    expect(await me(first.cookie)).toBe(200);
    const out = await fetch(`${BASE_URL}/api/auth/sign-out`, { method: "POST", headers: { cookie: first.cookie } });
    expect(out.status).toBe(200);
    // The browser forgot the cookie; an attacker who copied it before sign-out replays it.
    expect(await me(first.cookie)).toBe(401);
    expect(await me(second.cookie)).toBe(200);
  });
});

describe("sign-in limits", () => {
  it(`after ${SIGN_IN_LIMITS.account.failures} wrong passwords an account waits, even with the right one, and is told how long`, async () => {
    const { email } = await freshUser("limit");
    for (let i = 0; i < SIGN_IN_LIMITS.account.failures; i++) {
      // From a different address each time: the account's own count is what stops this.
      expect((await signIn(email, `wrong-guess-${i}`, address())).status).toBe(401);
    }
    const blocked = await signIn(email, "a-long-test-password", address());
    expect(blocked.status).toBe(429);
    expect(blocked.json.error.message).toMatch(/Try again in \d+ s/);
    const wait = Number(blocked.retryAfter);
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(SIGN_IN_LIMITS.account.windowSeconds);
    expect(blocked.cookie).toBe("");
  });

  it("an unknown e-mail is limited exactly like a real one (the limit reveals no accounts)", async () => {
    const from = address();
    const ghost = `nobody-${Date.now()}@example.test`;
    const statuses = [];
    for (let i = 0; i <= SIGN_IN_LIMITS.account.failures; i++)
      statuses.push((await signIn(ghost, "whatever-it-is", from)).status);
    expect(statuses).toEqual([...Array(SIGN_IN_LIMITS.account.failures).fill(401), 429]);
  });

  it(`one address is stopped after ${SIGN_IN_LIMITS.address.failures} failures across many accounts`, async () => {
    const from = address();
    for (let i = 0; i < SIGN_IN_LIMITS.address.failures; i++) {
      expect((await signIn(`spray-${i}-${Date.now()}@example.test`, "guess-guess", from)).status).toBe(401);
    }
    expect((await signIn(`spray-last-${Date.now()}@example.test`, "guess-guess", from)).status).toBe(429);
    // Another address is unaffected.
    expect((await signIn(`spray-other-${Date.now()}@example.test`, "guess-guess", address())).status).toBe(401);
  }, 120_000);
});

describe("bodies and passwords", () => {
  it("a 50 MB sign-in body is refused from its declared length, before it is read", async () => {
    const big = "x".repeat(50 * 1024 * 1024);
    const res = await fetch(`${BASE_URL}/api/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: big,
    });
    expect(res.status).toBe(413);
  });

  it("a chunked JSON body over 1 MB is stopped at the cap (no Content-Length to trust)", async () => {
    const chunk = new TextEncoder().encode(" ".repeat(256 * 1024));
    let sent = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent++ >= 8) controller.close();
        else controller.enqueue(chunk);
      },
    });
    const res = await fetch(`${BASE_URL}/api/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body,
      duplex: "half",
    } as RequestInit);
    expect(res.status).toBe(413);
    expect((await res.json()).error.message).toMatch(/over 1024 KB/);
  });

  it("a password longer than bcrypt can check gets its own message at sign-up, naming the field", async () => {
    const email = uniqueEmail("long");
    const s = new ApiSession();
    const token = await signUpLinkToken(postVia(s), { name: "Long", email });
    const r = await s.post("/api/auth/sign-up/complete", { token, name: "Long", password: "p".repeat(73) });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors.password[0]).toMatch(/at most 72 characters/);
    // 72 ASCII characters are exactly 72 bytes: accepted (and the refused try did not use up the link).
    const ok = await s.post("/api/auth/sign-up/complete", { token, name: "Long", password: "p".repeat(72) });
    expect(ok.status).toBe(201);
  });
});

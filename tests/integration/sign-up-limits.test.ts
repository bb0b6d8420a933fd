// Sign-up requests are limited per e-mail address and per client address, counted in MariaDB: over the
// limit the answer is 429 with the wait ("try again in N s", Retry-After) and no mail goes out. The limit
// treats an address with an account exactly like one without (it reveals nothing).
import { describe, expect, it } from "vitest";
import { MAIL_REQUEST_LIMITS } from "@/lib/auth/request-limits";
import { mailTo, waitForMail } from "@/tests/support/outbox";
import { testClientAddress } from "@/tests/support/sign-up";
import { ApiSession, freshUser, uniqueEmail } from "./support/api";

const ask = (email: string, from: string) =>
  new ApiSession().request("POST", "/api/auth/sign-up", { name: "Limit Test", email }, undefined, {
    "x-forwarded-for": from,
  });

async function rawAsk(email: string, from: string) {
  const res = await fetch(`${process.env.APP_URL ?? "http://127.0.0.1:3000"}/api/auth/sign-up`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-forwarded-for": from },
    body: JSON.stringify({ name: "Limit Test", email }),
  });
  return { status: res.status, retryAfter: res.headers.get("retry-after"), json: await res.json() };
}

describe("sign-up request limits", () => {
  it(`after ${MAIL_REQUEST_LIMITS.email.requests} requests for one address, the next waits and sends nothing, with or without an account`, async () => {
    const { email: taken } = await freshUser("limit-taken"); // one mail already: its sign-up link
    const fresh = uniqueEmail("limit-new");
    // The account's own sign-up counted once already.
    for (const [email, before] of [
      [taken, 1],
      [fresh, 0],
    ] as const) {
      // From a different client each time: the address's own count is what stops this.
      for (let i = before; i < MAIL_REQUEST_LIMITS.email.requests; i++)
        expect((await ask(email, testClientAddress())).status).toBe(202);
      const refused = await rawAsk(email, testClientAddress());
      expect(refused.status).toBe(429);
      expect(refused.json.error.message).toMatch(/for this e-mail address\. Try again in \d+ s\./);
      const wait = Number(refused.retryAfter);
      expect(wait).toBeGreaterThan(0);
      expect(wait).toBeLessThanOrEqual(MAIL_REQUEST_LIMITS.email.windowSeconds);
    }
    // Every accepted request's mail arrives (the account's first was its sign-up link); the refused sent none.
    await waitForMail(fresh, MAIL_REQUEST_LIMITS.email.requests);
    await waitForMail(taken, MAIL_REQUEST_LIMITS.email.requests);
    await new Promise((r) => setTimeout(r, 1000));
    expect(await mailTo(fresh)).toHaveLength(MAIL_REQUEST_LIMITS.email.requests);
    expect(await mailTo(taken)).toHaveLength(MAIL_REQUEST_LIMITS.email.requests);
  }, 90_000);

  it(`one client is stopped after ${MAIL_REQUEST_LIMITS.client.requests} requests across many addresses; another client is not`, async () => {
    const from = testClientAddress();
    for (let i = 0; i < MAIL_REQUEST_LIMITS.client.requests; i++)
      expect((await ask(uniqueEmail(`spray-${i}`), from)).status).toBe(202);
    const refused = await rawAsk(uniqueEmail("spray-last"), from);
    expect(refused.status).toBe(429);
    expect(refused.json.error.message).toMatch(/from your network\. Try again in \d+ s\./);
    expect(Number(refused.retryAfter)).toBeGreaterThan(0);
    expect((await ask(uniqueEmail("spray-other"), testClientAddress())).status).toBe(202);
  }, 120_000);
});

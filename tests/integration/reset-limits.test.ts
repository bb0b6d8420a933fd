// Password-reset requests are limited like sign-up requests: per e-mail address and per client address,
// counted in MariaDB, 429 with the wait, no mail over the limit, and the same for unknown addresses.
import { describe, expect, it } from "vitest";
import { MAIL_REQUEST_LIMITS } from "@/lib/auth/request-limits";
import { mailTo, waitForMail } from "@/tests/support/outbox";
import { testClientAddress } from "@/tests/support/sign-up";
import { BASE_URL, freshUser, uniqueEmail } from "./support/api";

async function askReset(email: string, from: string) {
  const res = await fetch(`${BASE_URL}/api/auth/password-reset`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-forwarded-for": from },
    body: JSON.stringify({ email }),
  });
  return { status: res.status, retryAfter: res.headers.get("retry-after"), json: await res.json() };
}

describe("password-reset request limits", () => {
  it(`after ${MAIL_REQUEST_LIMITS.email.requests} requests for one address the next waits, known or unknown`, async () => {
    const { email: known } = await freshUser("reset-limit"); // one mail already: its sign-up link
    const unknown = uniqueEmail("reset-limit-ghost");
    const answers: number[][] = [];
    for (const email of [known, unknown]) {
      const statuses: number[] = [];
      for (let i = 0; i <= MAIL_REQUEST_LIMITS.email.requests; i++)
        statuses.push((await askReset(email, testClientAddress())).status);
      answers.push(statuses);
      const refused = await askReset(email, testClientAddress());
      expect(refused.status).toBe(429);
      expect(refused.json.error.message).toMatch(
        /Too many password-reset requests for this e-mail address\. Try again in \d+ s\./,
      );
      expect(Number(refused.retryAfter)).toBeGreaterThan(0);
    }
    const expected = [...Array(MAIL_REQUEST_LIMITS.email.requests).fill(202), 429];
    expect(answers).toEqual([expected, expected]);
    await waitForMail(unknown, MAIL_REQUEST_LIMITS.email.requests);
    await waitForMail(known, 1 + MAIL_REQUEST_LIMITS.email.requests);
    await new Promise((r) => setTimeout(r, 1000));
    expect(await mailTo(unknown)).toHaveLength(MAIL_REQUEST_LIMITS.email.requests);
    expect(await mailTo(known)).toHaveLength(1 + MAIL_REQUEST_LIMITS.email.requests);
  }, 90_000);

  it(`one client is stopped after ${MAIL_REQUEST_LIMITS.client.requests} requests across many addresses`, async () => {
    const from = testClientAddress();
    for (let i = 0; i < MAIL_REQUEST_LIMITS.client.requests; i++)
      expect((await askReset(uniqueEmail(`reset-spray-${i}`), from)).status).toBe(202);
    const refused = await askReset(uniqueEmail("reset-spray-last"), from);
    expect(refused.status).toBe(429);
    expect(refused.json.error.message).toMatch(/from your network\. Try again in \d+ s\./);
    expect((await askReset(uniqueEmail("reset-spray-other"), testClientAddress())).status).toBe(202);
  }, 120_000);
});

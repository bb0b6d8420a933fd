// Each queued message is sent by one try only. The send right after queuing, the retry timer and a second
// app server all look at the same queue; before the claim, a message picked up by the timer while its first
// send was still talking to the mail server went out twice (seen once in a full run: a sign-up link mailed
// twice). Run in-process against the suite's MariaDB, as several servers would use it.
import { QueryTypes } from "sequelize";
import { afterAll, describe, expect, it } from "vitest";
import { getDb } from "@/models";
import { CLAIM_SECONDS, claimMail, dueMail, enqueueMail, markMailFailed, markMailSent } from "@/lib/data/mail-queue";

const made: number[] = [];
const address = () => `claim-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.test`;

async function queued() {
  const m = await enqueueMail({ productionId: null, to: address(), subject: "Claim check", text: "body" });
  made.push(m.id);
  return m;
}

const run = (sql: string, replacements: unknown[]) =>
  getDb().sequelize.query(sql, { replacements, type: QueryTypes.UPDATE });

/** As if its send had failed a while ago and its next try were due now. */
const dueAndUnclaimed = (id: number) =>
  run("UPDATE outgoing_mail SET sending_until = NULL, next_attempt_at = NOW(3) - INTERVAL 1 SECOND WHERE id = ?", [id]);

describe("claiming queued mail", () => {
  afterAll(async () => {
    if (made.length) await run(`DELETE FROM outgoing_mail WHERE id IN (${made.map(() => "?").join(",")})`, made);
    await getDb().sequelize.close();
  });

  it("a message is queued claimed by the send that follows: no retry takes it meanwhile", async () => {
    const m = await queued();
    expect(await claimMail(m.id)).toBe(false);
    expect(await claimMail(m.id, { dueOnly: false })).toBe(false);
    expect((await dueMail(1000)).map((d) => d.id)).not.toContain(m.id);
  });

  it("of ten tries at once on a due message, exactly one gets it", async () => {
    const m = await queued();
    await dueAndUnclaimed(m.id);
    expect((await dueMail(1000)).map((d) => d.id)).toContain(m.id);
    const claims = await Promise.all(Array.from({ length: 10 }, () => claimMail(m.id)));
    expect(claims.filter(Boolean)).toHaveLength(1);
  });

  it("a failed send frees it for the next due try; 'try now' may take it early, once", async () => {
    const m = await queued();
    await markMailFailed(m.id, 0, "mail server down");
    expect(await claimMail(m.id)).toBe(false); // its next try is a minute away
    expect(await claimMail(m.id, { dueOnly: false })).toBe(true);
    expect(await claimMail(m.id, { dueOnly: false })).toBe(false);
  });

  it("a sent message is never claimed again", async () => {
    const m = await queued();
    await markMailSent(m.id);
    await dueAndUnclaimed(m.id);
    expect(await claimMail(m.id, { dueOnly: false })).toBe(false);
  });

  it(`a claim left by a server that stopped mid-send runs out (after ${CLAIM_SECONDS} s)`, async () => {
    const m = await queued();
    await run(
      `UPDATE outgoing_mail SET sending_until = NOW(3) - INTERVAL 1 SECOND, next_attempt_at = NOW(3) - INTERVAL ${CLAIM_SECONDS} SECOND WHERE id = ?`,
      [m.id],
    );
    expect(await claimMail(m.id)).toBe(true);
  });
});

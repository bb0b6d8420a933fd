// The mail server down: the stand-in is stopped (scripts/lib/mail-stand-in.mjs stops listening while its
// control file exists), an owner invites someone and someone asks for a password reset; both are saved
// and their mail queued with the failure, which the outbox page shows. Once the server is back, the
// outbox's "try now" sends the invitation, the minute timer sends the reset, and both links work.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailStandIn, stopMailStandIn } from "./support/mail-stand-in";
import type { BrowserContext } from "playwright-core";
import { linkIn, mailTo, waitForMail } from "../support/outbox";
import { openBrowser, screenshot, signedIn, type SignedIn } from "./support/browser";

let owner: SignedIn;
let guest: BrowserContext;
beforeAll(async () => {
  owner = await signedIn("designer");
  guest = await openBrowser();
}, 120_000);
afterAll(async () => {
  await startMailStandIn(); // never leave the stand-in stopped for the tests after this one
  await owner?.close();
  await guest?.close();
});

describe("the mail server down", () => {
  it("queues the mail with the failure on the outbox page, and delivers it by the retry once the server is back", async () => {
    const invited = `e2e-outage-${Date.now()}@example.test`;
    const resetFor = `e2e-outage-reset-${Date.now()}@example.test`;
    const { page, productionId } = owner;

    await stopMailStandIn();
    try {
      await page.goto(`/productions/${productionId}/team`);
      await page.getByRole("textbox", { name: "E-mail" }).fill(invited);
      await page.getByLabel("Role", { exact: true }).selectOption("electrician");
      await page.getByRole("button", { name: "Send invitation" }).click();
      await page.getByText(/could not be sent yet/).waitFor();
      const reset = await guest.request.post("/api/auth/password-reset", { data: { email: resetFor } });
      expect(reset.status()).toBe(202); // the same answer: the outage is the queue's business

      await page.goto(`/productions/${productionId}/team/outbox`);
      const item = page.getByRole("listitem").filter({ hasText: invited });
      await item.getByText(/queued after 1 attempt/).waitFor();
      await item.locator("summary").click();
      await item.getByText(/The mail server refused or did not answer/).waitFor();
      await screenshot(page, "mail-outage-outbox-queued");
      expect(await mailTo(invited)).toHaveLength(0);
    } finally {
      await startMailStandIn();
    }

    await page.getByRole("button", { name: "Try queued mail now" }).click();
    const invitation = await waitForMail(invited);
    // The outbox page shows it sent.
    await expect
      .poll(async () => {
        await page.reload();
        return page.getByRole("listitem").filter({ hasText: invited }).locator("summary").textContent();
      })
      .toMatch(/· sent$/);
    await screenshot(page, "mail-outage-outbox-sent");

    // Nothing lost: the delivered link is the live one.
    const join = await guest.newPage();
    await join.goto(linkIn(invitation, "/invite/").pathname);
    await join.getByRole("heading", { name: /^Join / }).waitFor();

    // The reset mail belongs to no production: the queue's own timer sends it once its wait is over
    // (a minute after the failure, checked every minute).
    const resetMail = await waitForMail(resetFor, 1, 150_000);
    expect(resetMail.subject).toBe("Throwline password request");
  }, 240_000);
});

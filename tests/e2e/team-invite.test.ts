// An owner invites a stage manager from the team page; the stage manager opens the link in the e-mail the
// mail stand-in captured, creates an account and lands on the cues.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { linkIn, waitForMail } from "../support/outbox";
import { openBrowser, screenshot, signedIn, type SignedIn } from "./support/browser";
import type { BrowserContext } from "playwright-core";

let owner: SignedIn;
let guest: BrowserContext;
beforeAll(async () => {
  owner = await signedIn("designer");
  guest = await openBrowser();
}, 120_000);
afterAll(async () => {
  await owner?.close();
  await guest?.close();
});

describe("inviting a stage manager", () => {
  it("the owner invites, the stage manager accepts from the e-mail and lands on the cue sheet", async () => {
    const email = `e2e-sm-${Date.now()}@example.test`;
    const { page, productionId } = owner;
    await page.goto(`/productions/${productionId}/team`);
    await page.getByLabel("E-mail", { exact: true }).fill(email);
    await page.getByLabel("Role", { exact: true }).selectOption("stage_manager");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${email}.`).waitFor();
    await page.getByText(email).first().waitFor();
    await screenshot(page, "team-invitation-sent");

    const mail = await waitForMail(email);
    const link = linkIn(mail, "/invite/");
    const sm = await guest.newPage();
    await sm.goto(link.pathname);
    await sm.getByRole("heading", { name: /^Join / }).waitFor();
    await sm.getByLabel("Your name").fill("Pim Ashgrove");
    await sm.getByLabel("Choose a password").fill("a-long-e2e-password");
    await sm.getByRole("button", { name: "Create account and join" }).click();
    await sm.waitForURL(/\/productions\/\d+\/cues$/);
    expect(new URL(sm.url()).pathname).toBe(`/productions/${productionId}/cues`);
    await sm.getByText("Cue sheet").first().waitFor({ state: "visible" });
    await screenshot(sm, "team-invited-stage-manager-cues");

    // The same link again: a clear page, no form.
    await guest.clearCookies();
    const again = await guest.newPage();
    await again.goto(link.pathname);
    await again.getByRole("heading", { name: "This invitation was already used" }).waitFor();
    expect(await again.getByRole("button").filter({ hasText: /join/i }).count()).toBe(0);
    await screenshot(again, "team-invitation-used");
  }, 120_000);
});

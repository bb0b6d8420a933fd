// Signing up in the browser: name and address, "check your e-mail", the link from the captured mail,
// a password, then the welcome page with the invitation waiting for that address, joined in one click.
// An altered link shows a clear page with no form.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { linkIn, waitForMail } from "../support/outbox";
import { openBrowser, screenshot, signedIn, type SignedIn } from "./support/browser";

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

describe("signing up", () => {
  it("asks for a name and address, finishes from the mailed link and joins the waiting invitation", async () => {
    const email = `e2e-signup-${Date.now()}@example.test`;
    const invited = await owner.page.request.post(`/api/productions/${owner.productionId}/invitations`, {
      data: { email, role: "viewer" },
    });
    expect(invited.status()).toBe(201);

    const page = await guest.newPage();
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Tamsin Orrell");
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send me a link" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: /Check your e-mail/ })
      .waitFor();
    await screenshot(page, "sign-up-check-your-mail");

    const link = linkIn(await waitForMail(email, 2), "/sign-up/"); // the first mail is the invitation
    await page.goto(link.pathname);
    await page.getByRole("heading", { name: "Finish creating your account" }).waitFor();
    expect(await page.getByLabel("Your name").inputValue()).toBe("Tamsin Orrell");
    await page.getByLabel("Choose a password").fill("a-long-e2e-password");
    await page.getByRole("button", { name: "Create my account" }).click();
    await page.waitForURL(/\/welcome$/);
    await page.getByRole("heading", { name: "Welcome, Tamsin Orrell" }).waitFor();
    await screenshot(page, "sign-up-welcome");
    await page.getByRole("button", { name: /^Join / }).click();
    await page.waitForURL(new RegExp(`/productions/${owner.productionId}$`));

    // The link again, and an altered one: clear pages, no form.
    const again = await guest.newPage();
    await again.goto(link.pathname);
    await again.getByRole("heading", { name: "This sign-up link was already used" }).waitFor();
    const token = link.pathname.split("/").pop()!;
    await again.goto(`/sign-up/${(token[0] === "A" ? "B" : "A") + token.slice(1)}`);
    await again.getByRole("heading", { name: "This link does not work" }).waitFor();
    expect(await again.getByLabel("Choose a password").count()).toBe(0);
    await screenshot(again, "sign-up-link-refused");
  }, 150_000);
});

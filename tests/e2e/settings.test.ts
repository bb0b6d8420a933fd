import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { DEMO, openBrowser, openDemoProduction, screenshot, signIn } from "./support/browser";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("production settings", () => {
  it("the designer gets a message naming the field for a length that is not a length, and nothing is saved", async () => {
    const page = await browser.newPage();
    await signIn(page, DEMO.designer);
    await page.goto(`${await openDemoProduction(page)}/settings`);
    const head = page.getByLabel("Head height");
    const before = await head.inputValue();
    await head.fill("tall");
    await page.getByRole("button", { name: "Save settings" }).click();
    await page.locator("#headHeight-error").filter({ hasText: /tall/ }).waitFor();
    expect(await page.getByLabel("Head height").inputValue()).toBe("tall");
    await screenshot(page, "settings-error");
    await page.reload();
    expect(await page.getByLabel("Head height").inputValue()).toBe(before);
    await page.close();
  });

  it("the designer saves a length typed in feet and inches; the viewer sees the form read-only", async () => {
    const page = await browser.newPage();
    await signIn(page, DEMO.designer);
    const settingsUrl = `${await openDemoProduction(page)}/settings`;
    await page.goto(settingsUrl);
    await page.getByLabel("Head height").fill(`5' 6"`);
    await page.getByRole("button", { name: "Save settings" }).click();
    await page.getByText("Settings saved.").waitFor();
    // 5'6" = 1.6764 m exactly (NIST SP 811: 1 ft = 0.3048 m); shown in metric to two decimals.
    expect(await page.getByLabel("Head height").inputValue()).toBe("1.68 m");
    await page.getByLabel("Head height").fill("1.7");
    await page.getByRole("button", { name: "Save settings" }).click();
    await page.getByText("Settings saved.").waitFor();
    await page.close();

    await browser.clearCookies();
    const viewer = await browser.newPage();
    await signIn(viewer, DEMO.viewer);
    await viewer.goto(settingsUrl);
    expect(await viewer.getByLabel("Head height").isDisabled()).toBe(true);
    expect(await viewer.getByRole("button", { name: "Save settings" }).count()).toBe(0);
    await viewer.close();
  });
});

import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { DEMO, demoProductionId, openBrowser, openDemoProduction, screenshot, signIn } from "./support/browser";
import { eventually } from "./support/wait";

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
    const productionApi = `/api/productions/${await demoProductionId(page)}`;
    const storedHead = async () =>
      (await (await page.request.get(productionApi)).json()).production.headHeight as number;
    const seeded = await storedHead();
    await page.goto(settingsUrl);
    const head = page.getByLabel("Head height");
    const before = await head.inputValue();
    await head.fill(`5' 6"`);
    await page.getByRole("button", { name: "Save settings" }).click();
    await page.getByText("Settings saved.").waitFor();
    // 5'6" = 1.6764 m exactly (NIST SP 811: 1 ft = 0.3048 m); shown in metric to two decimals.
    await eventually(() => head.inputValue()).toBe("1.68 m");
    expect(await storedHead()).toBeCloseTo(1.6764, 9);
    // Put the demo back. "Settings saved." is still on screen from the first save, so wait for the
    // stored value itself before leaving the page.
    await head.fill(before);
    await page.getByRole("button", { name: "Save settings" }).click();
    await eventually(storedHead).toBe(seeded);
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

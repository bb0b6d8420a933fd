// The rig on paper: the print stylesheet hides the controls and keeps the table; screenshots of the
// printed hanging view and of the types and accessories panels in the dark theme, to look at.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { DEMO, openBrowser, screenshot, signIn, demoProductionId } from "./support/browser";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser({ width: 1280, height: 900 });
});
afterAll(async () => {
  await browser?.close();
});

describe("rig print and dark theme", () => {
  it("prints the table without the controls, and shows the panels in the dark theme", async () => {
    const page = await browser.newPage();
    await signIn(page, DEMO.designer);
    const id = await demoProductionId(page);
    await page.goto(`/productions/${id}/rig`);
    await page.getByTestId("rig-table").waitFor();
    await page.emulateMedia({ media: "print" });
    expect(await page.getByRole("button", { name: "Import a file" }).isVisible()).toBe(false);
    expect(await page.getByTestId("rig-table").isVisible()).toBe(true);
    await screenshot(page, "rig-print-hanging");

    await page.emulateMedia({ media: "screen" });
    await page.getByTestId("theme-toggle").click();
    await page.getByRole("button", { name: "Fixture types" }).click();
    await page.getByRole("region", { name: "Fixture types" }).waitFor();
    await page.screenshot({ path: (await screenshot(page, "rig-types-dark")).replace(".png", "-viewport.png") });
    await page.getByRole("button", { name: "Accessories", exact: true }).click();
    await page.getByRole("region", { name: "Accessories" }).waitFor();
    await page.screenshot({ path: (await screenshot(page, "rig-accessories-dark")).replace(".png", "-viewport.png") });
    await page.getByTestId("theme-toggle").click(); // the theme is remembered; leave it light for other tests
    await page.close();
  });
});

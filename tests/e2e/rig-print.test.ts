// The rig on paper: the print stylesheet hides the controls and keeps the table; screenshots of the
// printed hanging view and of the types and accessories panels in the dark theme, to look at.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { setTheme } from "./support/theme";

let designer: SignedIn;
beforeAll(async () => {
  designer = await signedIn("designer", { width: 1280, height: 900 });
});
afterAll(async () => {
  await designer?.close();
});

describe("rig print and dark theme", () => {
  it("prints the table without the controls, and shows the panels in the dark theme", async () => {
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-table").waitFor();
    await page.getByRole("button", { name: "Import a file" }).waitFor(); // on screen before the switch to print
    await page.emulateMedia({ media: "print" });
    await page.getByRole("button", { name: "Import a file" }).waitFor({ state: "hidden" });
    expect(await page.getByTestId("rig-table").isVisible()).toBe(true);
    await screenshot(page, "rig-print-hanging");

    await page.emulateMedia({ media: "screen" });
    await setTheme(page, true);
    await page.getByRole("button", { name: "Fixture types" }).click();
    await page.getByRole("region", { name: "Fixture types" }).waitFor();
    await page.screenshot({ path: (await screenshot(page, "rig-types-dark")).replace(".png", "-viewport.png") });
    await page.getByRole("button", { name: "Accessories", exact: true }).click();
    await page.getByRole("region", { name: "Accessories" }).waitFor();
    await page.screenshot({ path: (await screenshot(page, "rig-accessories-dark")).replace(".png", "-viewport.png") });
    await setTheme(page, false); // the theme is remembered in this browser
  });
});

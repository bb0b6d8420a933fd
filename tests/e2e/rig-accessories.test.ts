// The electrician adds an accessory to a fixture, sees a bad address refused, edits it and removes it.
import { afterAll, beforeAll, describe, it } from "vitest";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { textOf, eventually } from "./support/wait";

let electrician: SignedIn;
beforeAll(async () => {
  electrician = await signedIn("electrician", { width: 1440, height: 900 });
});
afterAll(async () => {
  await electrician?.close();
});

describe("accessories as the electrician", () => {
  it("adds, checks, edits and removes a scroller", async () => {
    const { page, productionId } = electrician;
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-table").waitFor();
    await page.getByRole("button", { name: "Accessories", exact: true }).click();
    const panel = page.getByRole("region", { name: "Accessories" });
    // The rows arrive after the panel opens: wait for as many as the server holds before counting on them.
    const held = await page.request.get(`/api/productions/${productionId}/accessories`);
    const before = ((await held.json()).accessories as unknown[]).length;
    await eventually(() => panel.getByTestId("accessory-row").count()).toBe(before);

    const select = panel.getByLabel("Fixture for the new accessory");
    const fixtureName = (await select.locator("option").nth(1).textContent())!.trim();
    await select.selectOption({ index: 1 });
    await panel.getByLabel("Kind of the new accessory").fill("scroller");
    await panel.getByLabel("Address of the new accessory").fill("512");
    await panel.getByLabel("Slots of the new accessory").fill("2");
    await panel.getByRole("button", { name: "Add accessory" }).click();
    // ANSI E1.11: two slots from 512 run past the end of the universe
    await textOf(panel.getByRole("alert").first()).toMatch(/512/);
    await panel.getByLabel("Address of the new accessory").fill("101");
    await panel.getByLabel("Universe of the new accessory").fill("2");
    await panel.getByLabel("Power (W) of the new accessory").fill("40");
    await panel.getByRole("button", { name: "Add accessory" }).click();
    await panel.getByRole("status").filter({ hasText: "Added a scroller" }).waitFor();
    await eventually(() => panel.getByTestId("accessory-row").count()).toBe(before + 1);
    await screenshot(page, "rig-accessories-electrician");

    await panel.getByRole("button", { name: `Edit the scroller on ${fixtureName}` }).click();
    await panel.getByLabel(`Weight (kg) of the scroller on ${fixtureName}`).fill("3.5");
    await panel.getByRole("button", { name: "Save" }).click();
    await panel.getByRole("status").filter({ hasText: "Saved the scroller" }).waitFor();
    await panel.getByTestId("accessory-row").filter({ hasText: "3.5" }).waitFor();

    await panel.getByRole("button", { name: `Remove the scroller on ${fixtureName}` }).click();
    await eventually(() => panel.getByTestId("accessory-row").count()).toBe(before);
  });
});

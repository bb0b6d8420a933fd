// The electrician edits a fixture type's wattage in the types table; the cone stays read-only for them.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { textOf } from "./support/wait";

let electrician: SignedIn;
beforeAll(async () => {
  electrician = await signedIn("electrician", { width: 1440, height: 900 });
});
afterAll(async () => {
  await electrician?.close();
});

describe("fixture types as the electrician", () => {
  it("edits a wattage, sees a bad figure refused, and cannot edit the cone", async () => {
    const { page, productionId } = electrician;
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-table").waitFor();
    await page
      .getByRole("button", { name: /fixture types/i })
      .first()
      .click();
    const panel = page.getByRole("region", { name: "Fixture types" });
    await panel.waitFor();
    await textOf(panel.getByTestId("types-from-memory")).toMatch(/from memory/);

    const wattButton = panel.getByRole("button", { name: /^Edit Power \(W\) of / }).first();
    const typeName = ((await wattButton.getAttribute("aria-label")) ?? "").replace(/^Edit Power \(W\) of /, "");
    const old = (await wattButton.textContent())?.trim() ?? "";
    await wattButton.click();
    const input = panel.getByLabel(`Power (W) of ${typeName}`);
    await input.fill("lots");
    await input.press("Enter");
    await textOf(panel.getByTestId("type-cell-message").first()).toMatch(/not a number/);
    await input.fill("777");
    await input.press("Enter");
    await panel
      .getByRole("button", { name: `Edit Power (W) of ${typeName}` })
      .filter({ hasText: "777" })
      .waitFor();
    expect(await panel.getByRole("button", { name: `Edit Cone (°) of ${typeName}` }).count()).toBe(0);
    await screenshot(page, "rig-types-electrician");

    // put the demo back as it was
    await panel.getByRole("button", { name: `Edit Power (W) of ${typeName}` }).click();
    await panel.getByLabel(`Power (W) of ${typeName}`).fill(old);
    await panel.getByLabel(`Power (W) of ${typeName}`).press("Enter");
    await panel
      .getByRole("button", { name: `Edit Power (W) of ${typeName}` })
      .filter({ hasText: old })
      .waitFor();
  });
});

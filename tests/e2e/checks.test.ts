// An electrician overloads a circuit on the checks page and sees the warning badge on the plot, and each
// unit's own badge on the plot and in the rig table, linked to its row on the checks page.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { screenshot, signedIn, type SignedIn } from "./support/browser";
import { eventually, UI_TIMEOUT } from "./support/wait";

let el: SignedIn;
beforeAll(async () => {
  el = await signedIn("electrician");
});
afterAll(async () => {
  await el?.close();
});

describe("checks", () => {
  it("lowering a circuit's rating below its load shows on the checks page and as a badge on the plot", async () => {
    const { page, productionId } = el;
    const api = `/api/productions/${productionId}`;
    const summary = async () =>
      (await (await page.request.get(`${api}/checks`)).json()).checks.summary as { errors: number; warnings: number };
    // A dimmed circuit with a load over 2 A, read from the checks themselves: other tests (a re-import of the
    // demo rig) may have moved units between circuits before this one runs.
    const loads = (await (await page.request.get(`${api}/checks`)).json()).checks.power.circuits as Array<{
      id: number;
      name: string;
      ratingA: number;
      dimmed: boolean;
      amps: number;
      status: string;
    }>;
    const target = loads.find((c) => c.dimmed && c.status === "ok" && c.amps > 2.5)!;
    expect(target, "the demo has a loaded dimmed circuit").toBeDefined();
    const before = await summary();

    await page.goto(`/productions/${productionId}/checks`);
    await page
      .getByTestId("checks-cautions")
      .getByText(/planning aids, not an engineering or electrical approval/)
      .waitFor();
    const circuitRow = page.locator(`tr[data-circuit="${target.name}"]`);
    expect(await circuitRow.getAttribute("data-status")).toBe("ok");
    // Its load draws over 2.5 A (I = P / V), so a 2 A rating is overloaded
    const rating = page.getByLabel(`Rating of circuit ${target.name} in amps`);
    await rating.fill("2");
    await rating.press("Enter");
    await eventually(() => circuitRow.getAttribute("data-status")).toBe("over-rating");
    await eventually(async () => (await summary()).errors).toBe(before.errors + 1);
    await page.getByTestId("checks-findings").getByText(`Circuit ${target.name}:`).first().waitFor();
    await screenshot(page, "checks-overloaded-circuit");

    await page.goto(`/productions/${productionId}/plot`);
    const badge = page.getByTestId("checks-badge");
    await badge.waitFor({ timeout: UI_TIMEOUT });
    expect(await badge.getAttribute("data-severity")).toBe("error");
    expect(await badge.textContent()).toContain(`${before.errors + 1} to fix`);
    await screenshot(page, "checks-badge-on-plot");

    // Each unit on that circuit carries its own badge: drawn on its symbol, with a link over it named with
    // what is wrong, which opens the finding's row on the checks page.
    const unitBadgeName = new RegExp(`^Unit .+, checks to fix: circuit ${target.name} overloaded`);
    const canvas = page.getByTestId("plot-canvas");
    await eventually(async () => Number((await canvas.getAttribute("data-check-badges")) ?? 0)).toBeGreaterThan(0);
    const onPlot = page.getByRole("link", { name: unitBadgeName }).first();
    await onPlot.waitFor({ timeout: UI_TIMEOUT });
    expect(await onPlot.getAttribute("data-severity")).toBe("error");
    const href = (await onPlot.getAttribute("href")) ?? "";
    expect(href).toMatch(new RegExp(`/productions/${productionId}/checks#finding-power-`));
    await screenshot(page, "checks-unit-badge-on-plot");

    // The rig table: a Checks cell on the same units, the same words, the same row
    await page.goto(`/productions/${productionId}/rig`);
    // Narrow the table to that circuit's units (typing also hurries the long table's hydration on a busy machine)
    await page.getByLabel("Filter fixtures").fill(target.name);
    const inTable = page.getByTestId("rig-table").getByRole("link", { name: unitBadgeName }).first();
    await inTable.waitFor({ timeout: UI_TIMEOUT });
    expect(await inTable.getAttribute("href")).toBe(href);
    await screenshot(page, "checks-unit-badge-in-rig");
    await inTable.click();
    await page.waitForURL(/\/checks#finding-power-/);
    const row = page.locator(`[id="${href.split("#")[1]}"]`);
    await row.waitFor({ timeout: UI_TIMEOUT });
    expect(await row.textContent()).toContain(`Circuit ${target.name}:`);

    await page.goto(`/productions/${productionId}/plot`);
    await page.getByTestId("checks-badge").click();
    await page.waitForURL(/\/checks$/);

    // Put the demo back for the other tests
    const now = (await (await page.request.get(`${api}/circuits`)).json()).circuits.find(
      (c: { id: number }) => c.id === target.id,
    );
    const back = await page.request.patch(`${api}/circuits/${target.id}`, {
      data: { version: now.version, ratingA: target.ratingA },
    });
    expect(back.status()).toBe(200);
  });
});

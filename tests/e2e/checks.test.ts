// An electrician overloads a circuit on the checks page and sees the warning badge on the plot.
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
    const row = page.locator(`tr[data-circuit="${target.name}"]`);
    expect(await row.getAttribute("data-status")).toBe("ok");
    // Its load draws over 2.5 A (I = P / V), so a 2 A rating is overloaded
    const rating = page.getByLabel(`Rating of circuit ${target.name} in amps`);
    await rating.fill("2");
    await rating.press("Enter");
    await eventually(() => row.getAttribute("data-status")).toBe("over-rating");
    await eventually(async () => (await summary()).errors).toBe(before.errors + 1);
    await page.getByTestId("checks-findings").getByText(`Circuit ${target.name}:`).first().waitFor();
    await screenshot(page, "checks-overloaded-circuit");

    await page.goto(`/productions/${productionId}/plot`);
    const badge = page.getByTestId("checks-badge");
    await badge.waitFor({ timeout: UI_TIMEOUT });
    expect(await badge.getAttribute("data-severity")).toBe("error");
    expect(await badge.textContent()).toContain(`${before.errors + 1} to fix`);
    await screenshot(page, "checks-badge-on-plot");
    await badge.click();
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

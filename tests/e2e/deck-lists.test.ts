// The focus chart list drawn a window at a time with a PDF page estimate that matches the print view;
// the rig's Focus values showing inherited values; a cue deleted only after a second, explicit yes.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { eventually } from "./support/wait";

let designer: SignedIn;
beforeAll(async () => {
  designer = await signedIn("designer", { width: 1440, height: 900 });
});
afterAll(async () => {
  await designer?.close();
});

describe("focus charts", () => {
  it("draws 12 charts at a time, and the PDF button's page count is the print view's", async () => {
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/focus`);
    await page.getByTestId("chart-list").waitFor();
    await eventually(() => page.getByTestId("focus-chart").count()).toBe(12);
    // Other tests may hang units in the demo while this runs: the total is read from the server.
    const total = (
      (await (await page.request.get(`/api/productions/${productionId}/fixtures`)).json()).fixtures as unknown[]
    ).length;
    await eventually(() => page.getByTestId("chart-window").textContent()).toContain(`Showing 12 of ${total} charts`);
    await page.getByTestId("show-more-charts").click();
    await eventually(() => page.getByTestId("focus-chart").count()).toBe(24);
    await screenshot(page, "deck-focus-list-window");

    for (const perPage of ["4", "6"]) {
      await page.getByTestId("per-page").selectOption(perPage);
      const label = (await page.getByTestId("download-pdf").textContent()) ?? "";
      const promised = Number(label.match(/about (\d+) page/)?.[1]);
      const printHref = await page.getByTestId("print-view").getAttribute("href");
      const print = await designer.context.newPage();
      await print.goto(printHref!);
      // The print view lays out the same sheets the PDF prints (focus.test.ts checks the PDF against it).
      await eventually(() => print.getByTestId("focus-sheet").count(), { timeout: 60_000 }).toBe(promised);
      await print.close();
    }
  }, 240_000);
});

describe("rig, Focus values", () => {
  it("shows the type's cone and the trim's lens height where a unit has none, marked as inherited", async () => {
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/rig?view=focus`);
    await eventually(() => page.getByTestId("inherited-value").count(), { timeout: 60_000 }).toBeGreaterThan(0);
    const texts = await page.getByTestId("inherited-value").allTextContents();
    expect(texts.some((t) => /°\s*from type$/.test(t.trim()))).toBe(true);
    expect(texts.some((t) => /from trim$/.test(t.trim()))).toBe(true);
    await screenshot(page, "deck-rig-focus-values");
  }, 120_000);
});

describe("deleting a cue", () => {
  it("asks first; 'Keep it' keeps the cue, 'Yes' deletes it", async () => {
    const { page } = designer;
    const api = page.context().request;
    const created = await api.post("/api/productions", { data: { name: `Cue delete ${Date.now()}` } });
    expect(created.status()).toBe(201);
    const id = (await created.json()).production.id as number;
    for (const number of [1, 2])
      expect((await api.post(`/api/productions/${id}/cues`, { data: { number, levels: { 1: 50 } } })).status()).toBe(
        201,
      );
    const count = async () => ((await (await api.get(`/api/productions/${id}/cues`)).json()).cues as unknown[]).length;

    await page.goto(`/productions/${id}/cues`);
    await page.getByTestId("cue-row-2").click();
    await page.getByTestId("delete-cue").click();
    await page.getByTestId("delete-cue-confirm").waitFor();
    await screenshot(page, "deck-cue-delete-confirm");
    await page.getByRole("button", { name: "Keep it" }).click();
    await expect(page.getByTestId("delete-cue-confirm").count()).resolves.toBe(0);
    expect(await count()).toBe(2);

    await page.getByTestId("delete-cue").click();
    await page.getByRole("button", { name: "Yes, delete cue 2" }).click();
    await eventually(count).toBe(1);
    await eventually(() => page.getByTestId("cue-row-2").count()).toBe(0);
  }, 120_000);
});

describe("the not-found page", () => {
  it("keeps the header with the user's name and Sign out, for a stray address and a production not theirs", async () => {
    const { page } = designer;
    for (const address of ["/no-such-page", "/productions/999999999"]) {
      const r = await page.goto(address);
      expect(r?.status(), address).toBe(404);
      await expect(page.getByTestId("signed-in-as").textContent()).resolves.toBe("Maren Oduya");
      await expect(page.getByRole("button", { name: "Sign out" }).count()).resolves.toBe(1);
    }
    await screenshot(page, "deck-not-found");
    expect((await page.request.get("/favicon.ico")).status()).toBe(200);
  }, 60_000);
});

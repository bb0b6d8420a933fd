import { afterAll, beforeAll, describe, expect, it } from "vitest";
import path from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { DEMO, SCREENSHOTS, openBrowser, screenshot, signIn, demoProductionId } from "./support/browser";
import { eventually, textOf } from "./support/wait";
import { setTheme } from "./support/theme";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser({ width: 1440, height: 1000 });
});
afterAll(async () => {
  await browser?.close();
});

async function freshPage() {
  await browser.clearCookies();
  return browser.newPage();
}

async function type(page: Page, line: string, expectFeedback: RegExp) {
  const box = page.getByLabel(/Type levels/);
  await box.fill(line);
  await box.press("Enter");
  await page.locator("#level-entry-feedback").filter({ hasText: expectFeedback }).waitFor();
}

describe("the designer writes cues with the keyboard", () => {
  it("makes three cues, each from typed lines, and sees tracking in the grid", async () => {
    const page = await freshPage();
    await signIn(page, DEMO.designer);
    await page.goto(`/productions/${await demoProductionId(page)}/cues`);
    await page.getByLabel(/Type levels/).waitFor();

    await type(page, "cue 801", /Cue 801 created/);
    await type(page, "1-4 out", /Cue 801: channels 1–4 at 0 %/);
    await type(page, "1 55", /Cue 801: channel 1 at 55 %/);
    await type(page, "2 full", /channel 2 at 100 %/);
    await type(page, "cue 802", /Cue 802 created/);
    await type(page, "1 out", /channel 1 at 0 %/);
    await type(page, "cue 803", /Cue 803 created/);
    await type(page, "3-4 73", /channels 3, 4 at 73 %/);
    await type(page, "1 120", /outside 0–100/); // a bad level is refused in words

    await textOf(page.getByTestId("cell-1-801")).toMatch(/^[▲▼]?55$/);
    await textOf(page.getByTestId("cell-2-802")).toBe("100"); // tracked from 801
    await textOf(page.getByTestId("cell-1-802")).toBe("▼0");
    await textOf(page.getByTestId("cell-2-803")).toBe("100"); // still tracking
    await textOf(page.getByTestId("cell-3-803")).toBe("▲73");
    await textOf(page.getByTestId("moves-up")).toMatch(/Up \(2\)/);
    await page.getByTestId("cue-plan").locator("canvas").first().waitFor();
    await screenshot(page, "cues-designer-light");
    await setTheme(page, true);
    await screenshot(page, "cues-designer-dark");
    await setTheme(page, false);
    await page.close();
  });
});

describe("the stage manager calls the show from the cue sheet", () => {
  it("lands on the summary, edits a call note, cannot change a level, prints the sheet", async () => {
    const page = await freshPage();
    await signIn(page, DEMO.stageManager);
    expect(new URL(page.url()).pathname).toMatch(/\/productions\/\d+\/cues$/);
    await page.getByRole("heading", { name: "Cue sheet" }).waitFor();
    await page
      .getByText(/Standby LX/)
      .first()
      .waitFor();
    expect(await page.getByLabel(/Type levels/).count()).toBe(0); // no level entry for the stage manager

    const note = page.getByLabel("Call note for cue 1", { exact: true });
    await note.fill("GO as the lantern is lifted");
    await note.press("Enter");
    await page.getByRole("status").filter({ hasText: "Cue 1: call note saved." }).waitFor();
    await page.reload();
    // The field is filled once the saved notes have loaded, which can come after it first shows.
    await eventually(() => page.getByLabel("Call note for cue 1", { exact: true }).inputValue()).toBe(
      "GO as the lantern is lifted",
    );

    // Even straight at the API, with the stage manager's own session, a level is refused.
    const productionId = await demoProductionId(page);
    const cues = await (await page.request.get(`/api/productions/${productionId}/cues`)).json();
    const first = cues.cues[0];
    const denied = await page.request.patch(`/api/productions/${productionId}/cues/${first.id}`, {
      data: { version: first.version, levels: { 1: 90 } },
    });
    expect(denied.status()).toBe(403);

    await screenshot(page, "cues-sheet-screen");
    await page.getByRole("button", { name: "Print cue sheet" }).waitFor();
    await page.emulateMedia({ media: "print" });
    await page.getByRole("button", { name: "Print cue sheet" }).waitFor({ state: "hidden" }); // hidden on paper
    await screenshot(page, "cues-sheet-print");
    const pdf = await page.pdf({
      path: path.join(SCREENSHOTS, "cue-sheet-a4.pdf"),
      format: "A4",
      printBackground: true,
    });
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    await page.emulateMedia({ media: "screen" });
    await page.close();
  });
});

// A large show in the designer's workspace (600 cues × 400 channels, imported from a USITT ASCII file):
// the level grid and the cue list draw only the rows in view, typed entry still lands and brings its
// channel into view, and the list's sort, filter and columns work and are remembered. Then parts in
// the cue form, shown on the cue sheet; and the look on the plan in light and dark.
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { openBrowser, screenshot, SCREENSHOTS, type SignedIn, signedIn } from "./support/browser";
import { eventually, nextFrames, textOf } from "./support/wait";
import { setTheme } from "./support/theme";
import { postViaBrowser, signUpThroughMail } from "../support/sign-up";

let browser: BrowserContext;
let designer: SignedIn;
beforeAll(async () => {
  [browser, designer] = await Promise.all([
    openBrowser({ width: 1440, height: 1000 }),
    signedIn("designer", { width: 1440, height: 1000 }),
  ]);
});
afterAll(async () => {
  await Promise.all([browser?.close(), designer?.close()]);
});

/** Sparse moves as a real show has them; the same file every run (a fixed pseudo-random walk). */
function bigShowFile(cues = 600, channels = 400): string {
  let seed = 11;
  const r = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
  const lines = ["IDENT 3:0"];
  for (let i = 1; i <= cues; i++) {
    lines.push(`CUE ${i}`, `TEXT Look ${i}`, "UP 3");
    const pairs: string[] = [];
    for (let k = 0; k < 2 + Math.floor(r() * 12); k++)
      pairs.push(`${1 + Math.floor(r() * channels)}@${Math.round(r() * 10) * 10}`);
    if (i === 1) pairs.push(`${channels}@5`); // so the rig reaches the last channel
    for (let k = 0; k < pairs.length; k += 8) lines.push(`CHAN ${pairs.slice(k, k + 8).join(" ")}`);
  }
  return [...lines, "ENDDATA", ""].join("\r\n");
}

// This show comes from a cue file alone: no unit is hung, so a typed level first warns that the channel
// has no unit in the rig and records on the second Enter.
async function type(page: Page, line: string, feedback: RegExp) {
  const box = page.getByLabel(/Type levels/);
  const said = page.locator("#level-entry-feedback");
  await box.fill(line);
  await box.press("Enter");
  await said.filter({ hasText: new RegExp(`${feedback.source}|no unit in the rig`) }).waitFor();
  if (/no unit in the rig/.test((await said.textContent()) ?? "")) await box.press("Enter");
  await said.filter({ hasText: feedback }).waitFor();
}

describe("a show of 600 cues and 400 channels", () => {
  it("stays a window of rows, takes typed levels, and remembers the list's view", async () => {
    const page = await browser.newPage();
    // A fresh account of its own, so the demo designer keeps landing on the one demo production.
    await page.context().clearCookies();
    const email = `large-show-${Date.now()}@example.test`;
    await signUpThroughMail(postViaBrowser(page), { name: "Large Show", email });
    const made = await page.request.post("/api/productions", {
      data: { name: `Large show ${Date.now()}`, venue: "Test Hall", displayUnits: "metric" },
    });
    expect(made.status()).toBe(201);
    const id = (await made.json()).production.id;
    const imported = await page.request.post(`/api/productions/${id}/cues/import`, {
      data: { text: bigShowFile(), mode: "moves" },
    });
    expect(imported.status()).toBe(200);
    expect((await imported.json()).imported).toBe(600);

    await page.goto(`/productions/${id}/cues`);
    await page.getByTestId("grid-ch-1").waitFor();
    await page.locator('[data-testid^="cue-row-"]').first().waitFor();
    const drawn = async (prefix: string) => page.locator(`[data-testid^="${prefix}"]`).count();
    expect(await drawn("grid-ch-")).toBeLessThan(80); // 400 channels, only a window drawn
    expect(await drawn("cue-row-")).toBeLessThan(60); // 600 cues, only a window drawn

    await type(page, "cue 600", /Cue 600 selected/);
    await type(page, "350 75", /Cue 600: channel 350 at 75 %/);
    await textOf(page.getByTestId("cell-350-600")).toMatch(/^▲?75$/); // brought into view by the typed line
    await type(page, "349-351 full", /channels 349, 350, 351 at 100 %/);
    for (const ch of [349, 350, 351]) await textOf(page.getByTestId(`cell-${ch}-600`)).toMatch(/^▲?100$/);
    await page.getByLabel("Go to channel").fill("2");
    await page.getByLabel("Go to channel").press("Enter");
    await page.getByTestId("grid-ch-2").waitFor();

    // Sort by label descending, filter, and hide a column; then reload: sort and columns are remembered.
    await page.getByRole("button", { name: /^Label/ }).click();
    await page.locator("th[aria-sort=ascending]").filter({ hasText: "Label" }).waitFor(); // one click at a time: a second before the first lands is lost
    await page.getByRole("button", { name: /^Label/ }).click();
    await page.locator("th[aria-sort=descending]").filter({ hasText: "Label" }).waitFor();
    await page.getByText(/^Columns \(/).click();
    await page.getByRole("checkbox", { name: "Wait" }).uncheck();
    await page.getByLabel("Filter cues").fill("Look 59");
    await page.getByText("11 of 600 cues").waitFor(); // Look 59 and Look 590–599
    await screenshot(page, "cues-large-light");
    await page.reload();
    await page.getByTestId("grid-ch-1").waitFor();
    await page.locator("th[aria-sort=descending]").filter({ hasText: "Label" }).waitFor();
    await eventually(() => page.getByRole("button", { name: /^Wait/ }).count()).toBe(0);
    await page.getByTestId("cue-list-scroll").evaluate((el) => el.scrollTo(0, 0)); // the list had scrolled to the selected cue
    // The windowed list draws the top rows on its next render, not during scrollTo: wait for them.
    await textOf(page.locator('[data-testid^="cue-row-"]').first()).toMatch(/Look 600/); // labels sort as people read numbers: 600 last, so first descending
    await page.close();
  });
});

describe("parts and the look of a cue", () => {
  it("edits parts in the cue form, shows them on the sheet, and draws the look in both themes", async () => {
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/cues`);
    await page.getByLabel(/Type levels/).waitFor();
    await type(page, "cue 5", /Cue 5 (selected|created)/);
    await page.getByRole("button", { name: "Add a part" }).click();
    await page.getByLabel("Part 1: label").fill("sky");
    await page.getByLabel("Part 1: time").fill("12/4");
    await page.getByLabel("Part 1: wait").fill("2");
    await page.getByLabel("Part 1: channels").fill("1-3, x");
    await page.getByRole("button", { name: "Save cue" }).click();
    await page.getByText(/"x" is not a channel/).waitFor(); // named beside the field, nothing sent
    await page.getByLabel("Part 1: channels").fill("1-3");
    const saved = page.waitForResponse((r) => r.request().method() === "PATCH" && r.url().includes("/cues/"));
    await page.getByRole("button", { name: "Save cue" }).click();
    expect((await saved).status()).toBe(200);
    await page.getByLabel("Part 1: channels").waitFor(); // the form comes back with the saved part
    await page.getByTestId("cue-plan").locator("canvas").first().waitFor();
    await screenshot(page, "cues-plan-light");
    await page.getByTestId("cue-plan").screenshot({ path: path.join(SCREENSHOTS, "cues-plan-only-light.png") });
    await setTheme(page, true);
    await nextFrames(page); // the plan redraws in the dark palette on the frame after the class changes
    await page.getByTestId("cue-plan").screenshot({ path: path.join(SCREENSHOTS, "cues-plan-only-dark.png") });
    await screenshot(page, "cues-plan-dark");
    await setTheme(page, false);
    await eventually(async () => Number(await page.getByTestId("cue-plan").getAttribute("data-lit"))).toBeGreaterThan(
      0,
    );

    await page.goto(page.url().split("?")[0] + "?view=sheet");
    await textOf(page.getByTestId("sheet-part-5-1")).toBe("part 1 sky: 12/4 wait 2 · ch 1-3");
  });
});

import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { DEMO_PRODUCTION_NAME } from "../support/demo";
import { DEMO, openBrowser, openDemoProduction, screenshot, signIn } from "./support/browser";
import { textOf } from "./support/wait";
import { isDark, toggleTheme } from "./support/theme";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function freshPage() {
  await browser.clearCookies();
  return browser.newPage();
}

describe("each demo user lands on the right page", () => {
  // A member of one production lands inside it (the stage manager on the cue sheet); a member of
  // several lands on the list. Other test files may add productions to the demo designer's account.
  const cases: Array<[string, string, RegExp, string]> = [
    ["designer", DEMO.designer, /^\/productions(\/\d+)?$/, "Where things stand"],
    ["electrician", DEMO.electrician, /^\/productions(\/\d+)?$/, "Where things stand"],
    ["stage-manager", DEMO.stageManager, /^\/productions\/\d+\/cues$/, "Cue sheet"],
    ["viewer", DEMO.viewer, /^\/productions(\/\d+)?$/, "Where things stand"],
  ];
  for (const [name, email, path, text] of cases) {
    it(`${name} lands on ${path}`, async () => {
      const page = await freshPage();
      await signIn(page, email);
      expect(new URL(page.url()).pathname).toMatch(path);
      if (name !== "stage-manager") await openDemoProduction(page);
      await textOf(page.getByTestId("production-name")).toContain(DEMO_PRODUCTION_NAME);
      await page.getByText(text).first().waitFor({ state: "visible" });
      await screenshot(page, `landing-${name}`);
      await page.close();
    });
  }
});

describe("sign-in errors", () => {
  it("shows one plain message for a wrong password", async () => {
    const page = await freshPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill(DEMO.designer);
    await page.getByLabel("Password").fill("wrong-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByRole("alert").filter({ hasText: "do not match" }).waitFor();
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await page.close();
  });
});

describe("theme and sign-out", () => {
  it("toggles the dark theme, remembers it, and signs out", async () => {
    const page = await freshPage();
    await signIn(page, DEMO.electrician);
    const before = await isDark(page);
    expect(await toggleTheme(page)).toBe(!before);
    await page.reload();
    expect(await isDark(page)).toBe(!before); // set by the inline script before the page is shown
    if (!before) await screenshot(page, "overview-dark");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");
    await page.goto("/productions");
    await page.waitForURL("**/sign-in");
    await page.close();
  });
});

// Chromium from Debian (never a downloaded build), one fresh profile per browser.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const BASE_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";
export const SCREENSHOTS = path.resolve(process.env.TEST_RESULTS_DIR ?? "test-results", "screenshots");
export const DEMO_PASSWORD = "lantern-demo-2026";
export const DEMO = {
  designer: "maren.oduya@quillmere.test",
  electrician: "teodor.brask@quillmere.test",
  stageManager: "ines.calloway@quillmere.test",
  viewer: "rafe.lindqvist@quillmere.test",
} as const;

/** A browser with a fresh temporary profile; closing the context closes the browser. */
export async function openBrowser(viewport = { width: 1366, height: 900 }): Promise<BrowserContext> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const context = await browser.newContext({ viewport, baseURL: BASE_URL });
  context.on("close", () => void browser.close());
  return context;
}

/** Signs in afresh (any earlier session in this browser context is dropped first). */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.context().clearCookies();
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOTS, { recursive: true });
  const file = path.join(SCREENSHOTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Opens the demo production's overview and returns its URL. A member of several productions lands on
 * the list after signing in; a member of one lands inside it.
 */
export async function openDemoProduction(page: Page): Promise<string> {
  if (!/\/productions\/\d+/.test(new URL(page.url()).pathname)) {
    await page.goto("/productions");
    await page.getByRole("link", { name: /Salt and Lantern/ }).first().click();
    await page.waitForURL(/\/productions\/\d+/);
  }
  const match = new URL(page.url()).pathname.match(/^\/productions\/\d+/);
  return new URL(match![0], page.url()).toString();
}

/** The demo production's id, opening it first (see openDemoProduction). */
export async function demoProductionId(page: Page): Promise<number> {
  return Number(new URL(await openDemoProduction(page)).pathname.split("/")[2]);
}

// Chromium from Debian (never a downloaded build), one fresh profile per browser.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { DEMO_PASSWORD, DEMO_PRODUCTION_NAME, DEMO_USERS, type DemoRole, demoIdFrom } from "../../support/demo";

export { DEMO_PASSWORD, DEMO_USERS as DEMO };
export const BASE_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";
export const SCREENSHOTS = path.resolve(process.env.TEST_RESULTS_DIR ?? "test-results", "screenshots");

/** A browser with a fresh temporary profile; closing the context closes the browser. */
export async function openBrowser(viewport = { width: 1366, height: 900 }): Promise<BrowserContext> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  const context = await browser.newContext({ viewport, baseURL: BASE_URL });
  context.on("close", () => void browser.close());
  return context;
}

/** Signs in through the form, afresh (any earlier session in this browser context is dropped first). */
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
    await page.getByRole("link", { name: DEMO_PRODUCTION_NAME }).first().click();
    await page.waitForURL(/\/productions\/\d+/);
  }
  const match = new URL(page.url()).pathname.match(/^\/productions\/\d+/);
  return new URL(match![0], page.url()).toString();
}

/** The demo production's id, asked of the API with the page's session (the page stays where it is). */
export async function demoProductionId(page: Page): Promise<number> {
  const r = await page.request.get("/api/productions");
  if (!r.ok()) throw new Error(`GET /api/productions answered ${r.status()}: is the page signed in?`);
  return demoIdFrom(await r.json());
}

export type SignedIn = { context: BrowserContext; page: Page; productionId: number; close: () => Promise<void> };

/**
 * Test setup: a fresh browser signed in as one of the demo accounts, a blank page in it and the demo
 * production's id. Signs in through the sign-in route rather than the form (sign-in.test.ts covers the
 * form), so setup costs one request. Close it in afterAll.
 */
export async function signedIn(role: DemoRole, viewport?: { width: number; height: number }): Promise<SignedIn> {
  const context = await openBrowser(viewport);
  try {
    const r = await context.request.post("/api/auth/sign-in", {
      data: { email: DEMO_USERS[role], password: DEMO_PASSWORD },
    });
    if (!r.ok()) throw new Error(`sign-in as the demo ${role} answered ${r.status()}: ${await r.text()}`);
    const page = await context.newPage();
    return { context, page, productionId: await demoProductionId(page), close: () => context.close() };
  } catch (err) {
    await context.close();
    throw err;
  }
}

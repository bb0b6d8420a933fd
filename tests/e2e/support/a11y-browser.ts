// Browsers for the accessibility tests: a desktop window or a 10-inch tablet in portrait with touch on
// (800 × 1280, so CSS sees a coarse pointer), in the light or the dark theme from the first paint.
import { chromium, type BrowserContext } from "playwright-core";
import { THEME_STORAGE_KEY } from "@/components/theme-script";
import { BASE_URL, DEMO, DEMO_PASSWORD } from "./browser";
import type { DemoRole } from "../../support/demo";

export const VIEWPORTS = {
  desktop: { viewport: { width: 1366, height: 900 }, hasTouch: false },
  tablet: { viewport: { width: 800, height: 1280 }, hasTouch: true },
} as const;
export type ViewportName = keyof typeof VIEWPORTS;

/** A fresh browser for one viewport and theme; the theme is remembered in localStorage before any page script runs. */
export async function openThemed(name: ViewportName, dark: boolean): Promise<BrowserContext> {
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
  const context = await browser.newContext({ ...VIEWPORTS[name], baseURL: BASE_URL });
  context.on("close", () => void browser.close());
  await context.addInitScript(([key, value]) => localStorage.setItem(key, value), [
    THEME_STORAGE_KEY,
    dark ? "dark" : "light",
  ] as const);
  return context;
}

/** Signs the context in as a demo account through the sign-in route. */
export async function signInAs(context: BrowserContext, role: DemoRole) {
  const r = await context.request.post("/api/auth/sign-in", {
    data: { email: DEMO[role], password: DEMO_PASSWORD },
    timeout: 120_000,
  });
  if (!r.ok()) throw new Error(`sign-in as the demo ${role} answered ${r.status()}: ${await r.text()}`);
}

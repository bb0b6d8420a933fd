// The light/dark switch in the header, driven the way a person would: wait until it works, click it,
// and wait until the page has changed before anyone reads or photographs it.
import type { Page } from "playwright-core";
import { UI_TIMEOUT, eventually } from "./wait";

export const isDark = (page: Page) => page.evaluate(() => document.documentElement.classList.contains("dark"));

/** Flips the theme and returns the new one (true for dark). */
export async function toggleTheme(page: Page): Promise<boolean> {
  const toggle = page.getByTestId("theme-toggle");
  // aria-pressed appears once the button's script has run; a click before that would do nothing.
  await page.locator("[data-testid=theme-toggle][aria-pressed]").waitFor({ timeout: UI_TIMEOUT });
  const wasDark = await isDark(page);
  await toggle.click();
  await eventually(() => isDark(page)).toBe(!wasDark);
  return !wasDark;
}

/** Sets the theme (no click when it already is). */
export async function setTheme(page: Page, dark: boolean) {
  if ((await isDark(page)) !== dark) await toggleTheme(page);
}

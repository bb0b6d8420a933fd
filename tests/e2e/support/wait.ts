// Waiting for the page instead of reading it straight after an action. A page answers a click, a key
// or a scroll on its own time (a fetch, a re-render of a windowed list), and on a busy machine that
// time grows: read it once and the test sees the page before the change. Retry the read until it
// matches, or until UI_TIMEOUT says the change is not coming.
import { expect } from "vitest";
import type { Locator, Page } from "playwright-core";

/** Long enough for a loaded two-core machine; a passing check returns as soon as it matches. */
export const UI_TIMEOUT = 20_000;

/** expect.poll with UI_TIMEOUT unless told otherwise (vitest's default of one second is too short under load). */
export function eventually<T>(read: () => T | Promise<T>, options: { timeout?: number; message?: string } = {}) {
  return expect.poll(read, { timeout: options.timeout ?? UI_TIMEOUT, interval: 100, message: options.message });
}

/** A locator's text, trimmed, retried until it matches (a string matches exactly). */
export function textOf(locator: Locator) {
  return eventually(async () => ((await locator.textContent({ timeout: UI_TIMEOUT })) ?? "").trim());
}

/** Resolves after the page has painted `frames` more frames (for a screenshot after a redraw, never for a check). */
export async function nextFrames(page: Page, frames = 2) {
  await page.evaluate(
    (n) =>
      new Promise<void>((done) => {
        const step = (left: number) => (left === 0 ? done() : requestAnimationFrame(() => step(left - 1)));
        step(n);
      }),
    frames,
  );
}

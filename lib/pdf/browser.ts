import "server-only";
// One shared headless Chromium (Debian's, never a downloaded build) for printing PDFs. It starts on the
// first print, serves later ones, and closes after a quiet minute so an idle server holds no browser.
import { existsSync } from "node:fs";
import { chromium, type Browser } from "playwright-core";
import { AppError } from "@/lib/errors";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
// The same flags the end-to-end tests use: no sandbox (root in a container), nothing fetched from outside.
export const CHROMIUM_ARGS = ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

const IDLE_MS = 60_000;
/** At most this many prints at once share the browser; the rest wait (2 cores here). */
const MAX_PAGES = 2;

let browser: Promise<Browser> | null = null;
let idleTimer: NodeJS.Timeout | null = null;
let active = 0;
const waiting: Array<() => void> = [];

export function chromiumMissing(): boolean {
  return !existsSync(/*turbopackIgnore: true*/ CHROMIUM_PATH);
}

function launch(): Promise<Browser> {
  if (chromiumMissing()) {
    throw new AppError("unavailable", `PDF printing needs Chromium at ${CHROMIUM_PATH}, which is not installed on this server. Install it (apt-get install chromium; npm start does this) or use the print view and your browser's "Save as PDF".`);
  }
  browser ??= chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS }).catch((err) => {
    browser = null;
    throw new AppError("unavailable", `Chromium could not be started for printing: ${(err as Error).message.split("\n")[0]}`);
  });
  return browser;
}

async function acquire() {
  if (active >= MAX_PAGES) await new Promise<void>((resolve) => waiting.push(resolve));
  active += 1;
  if (idleTimer) clearTimeout(idleTimer);
}

function release() {
  active -= 1;
  waiting.shift()?.();
  if (active === 0 && !waiting.length) {
    idleTimer = setTimeout(() => {
      const b = browser;
      browser = null;
      void b?.then((x) => x.close()).catch(() => {});
    }, IDLE_MS);
    idleTimer.unref();
  }
}

/** Runs fn with a fresh page of the shared browser; the page is closed afterwards whatever happens. */
export async function withPage<T>(fn: (page: import("playwright-core").Page) => Promise<T>): Promise<T> {
  await acquire();
  try {
    const b = await launch();
    const context = await b.newContext();
    try {
      return await fn(await context.newPage());
    } finally {
      await context.close().catch(() => {});
    }
  } finally {
    release();
  }
}

/** Closes the shared browser now (benchmarks and tests, so the process can exit). */
export async function closeBrowser() {
  const b = browser;
  browser = null;
  if (idleTimer) clearTimeout(idleTimer);
  await b?.then((x) => x.close()).catch(() => {});
}

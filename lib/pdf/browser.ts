import "server-only";
// One shared headless Chromium (Debian's, never a downloaded build) for printing PDFs. It starts on the
// first print, serves later ones, and closes after a quiet minute so an idle server holds no browser.
// Its pages are kept between prints (a new page costs the browser about half a CPU-second, and a page
// that already holds the print's fonts need not parse them again).
import { existsSync } from "node:fs";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { AppError } from "@/lib/errors";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
// The same flags the end-to-end tests use: no sandbox (root in a container), nothing fetched from outside.
export const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];
// Flags for the printing browser only:
// - Headless Chromium 156 still builds the address bar's pop-up as a web page in a renderer of its own
//   (about 2 CPU-seconds at the first print, for nothing), and keeps a spare renderer ready (20 MiB).
//   Chromium reads only the last
//   --disable-features, so the list repeats the features playwright-core disables itself (1.65).
// - V8 (whose collector also frees the page's DOM) otherwise lets a print page's heap grow by about
//   40 MiB a part, to 300 MiB a page by the end of a long print; collecting sooner cost no time in trials.
const PLAYWRIGHT_DISABLED =
  "AvoidUnnecessaryBeforeUnloadCheckSync,DestroyProfileOnBrowserClose,HttpsUpgrades,HttpsFirstBalancedModeAutoEnable,LensOverlay,MediaRouter,PaintHolding,ThirdPartyStoragePartitioning,AvoidCorsURLLoaderRestartOnRedirect,OptimizationHints,NetworkTimeServiceQuerying,AimEnabled,PreconnectToSearch";
const PRINT_ARGS = [
  ...CHROMIUM_ARGS,
  `--disable-features=${PLAYWRIGHT_DISABLED},WebUIOmniboxPopup,WebUIOmniboxAimPopup,SpareRendererForSitePerProcess`,
  "--js-flags=--heap-growing-percent=40",
];

const IDLE_MS = 60_000;
/** At most this many prints at once share the browser; the rest wait (2 cores here). */
const MAX_PRINTS = 2;
/** Pages kept open between prints; more are closed when a print ends. */
const MAX_IDLE_PAGES = 2;

type Shared = { browser: Browser; context: BrowserContext; idle: Page[] };
let shared: Promise<Shared> | null = null;
let idleTimer: NodeJS.Timeout | null = null;
let active = 0;
const waiting: Array<() => void> = [];

export function chromiumMissing(): boolean {
  return !existsSync(/*turbopackIgnore: true*/ CHROMIUM_PATH);
}

function launch(): Promise<Shared> {
  if (chromiumMissing()) {
    throw new AppError(
      "unavailable",
      `PDF printing needs Chromium at ${CHROMIUM_PATH}, which is not installed on this server. Install it (apt-get install chromium; npm start does this) or use the print view and your browser's "Save as PDF".`,
    );
  }
  shared ??= (async () => {
    const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: PRINT_ARGS });
    return { browser, context: await browser.newContext(), idle: [] };
  })().catch((err) => {
    shared = null;
    throw new AppError(
      "unavailable",
      `Chromium could not be started for printing: ${(err as Error).message.split("\n")[0]}`,
    );
  });
  return shared;
}

async function acquire() {
  if (active >= MAX_PRINTS) await new Promise<void>((resolve) => waiting.push(resolve));
  active += 1;
  if (idleTimer) clearTimeout(idleTimer);
}

function release() {
  active -= 1;
  waiting.shift()?.();
  if (active === 0 && !waiting.length) {
    idleTimer = setTimeout(() => void closeBrowser(), IDLE_MS);
    idleTimer.unref();
  }
}

/**
 * Runs fn with `count` pages of the shared browser. Pages come from the pool when it has some, and go
 * back to it as fn leaves them (so fn should clear what it printed); after an error they are closed.
 */
export async function withPages<T>(count: number, fn: (pages: Page[]) => Promise<T>): Promise<T> {
  await acquire();
  try {
    const sp = launch();
    const s = await sp;
    const pages: Page[] = [];
    try {
      while (pages.length < count) {
        const page = s.idle.pop() ?? (await s.context.newPage());
        pages.push(page);
      }
      const result = await fn(pages);
      for (const p of pages) {
        if (!p.isClosed() && s.idle.length < MAX_IDLE_PAGES && shared === sp) s.idle.push(p);
        else await p.close().catch(() => {});
      }
      return result;
    } catch (err) {
      await Promise.all(pages.map((p) => p.close().catch(() => {})));
      throw err;
    }
  } finally {
    release();
  }
}

/** Closes the shared browser now (benchmarks and tests, so the process can exit). */
export async function closeBrowser() {
  const s = shared;
  shared = null;
  if (idleTimer) clearTimeout(idleTimer);
  await s?.then((x) => x.browser.close()).catch(() => {});
}

// axe-core over every page of the product, in both themes, at a desktop window and on a 10-inch
// tablet in portrait with touch on (800 × 1280): prints the violation counts per page and impact, and
// fails on any serious or critical one (the ones that stop a screen-reader user, a keyboard user or a
// reader in a dark room: names that hide the value shown, missing labels, low contrast).
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { BASE_URL, DEMO, DEMO_PASSWORD, demoProductionId } from "./support/browser";
import { THEME_STORAGE_KEY } from "@/components/theme-script";

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

const VIEWPORTS = {
  desktop: { viewport: { width: 1366, height: 900 }, hasTouch: false },
  tablet: { viewport: { width: 800, height: 1280 }, hasTouch: true },
} as const;
type ViewportName = keyof typeof VIEWPORTS;

/** Every page a member reaches from the production's tabs, plus the signed-out and list pages. */
const PAGES: Array<{ name: string; path: (id: number) => string; signedOut?: boolean }> = [
  { name: "sign-in", path: () => "/sign-in", signedOut: true },
  { name: "productions", path: () => "/productions" },
  { name: "overview", path: (id) => `/productions/${id}` },
  { name: "plot", path: (id) => `/productions/${id}/plot` },
  { name: "rig", path: (id) => `/productions/${id}/rig` },
  { name: "focus", path: (id) => `/productions/${id}/focus` },
  { name: "focus call", path: (id) => `/productions/${id}/focus/call` },
  { name: "cues", path: (id) => `/productions/${id}/cues` },
  { name: "studies", path: (id) => `/productions/${id}/studies` },
  { name: "checks", path: (id) => `/productions/${id}/checks` },
  { name: "settings", path: (id) => `/productions/${id}/settings` },
  { name: "team", path: (id) => `/productions/${id}/team` },
];

type AxeViolation = { id: string; impact: string | null; help: string; nodes: Array<{ target: unknown[]; failureSummary?: string }> };

/** A browser for one viewport and theme; the theme is remembered in localStorage before any page script runs. */
async function openThemed(name: ViewportName, dark: boolean): Promise<BrowserContext> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const context = await browser.newContext({ ...VIEWPORTS[name], baseURL: BASE_URL });
  context.on("close", () => void browser.close());
  await context.addInitScript(([key, value]) => localStorage.setItem(key, value), [THEME_STORAGE_KEY, dark ? "dark" : "light"] as const);
  return context;
}

async function audit(page: Page): Promise<AxeViolation[]> {
  await page.waitForLoadState("networkidle");
  // The theme toggle gets aria-pressed once React has hydrated: audit the page people use, not the HTML.
  await page.locator("[data-testid=theme-toggle][aria-pressed]").waitFor({ timeout: 60_000 });
  await page.addScriptTag({ content: AXE_SOURCE });
  return page.evaluate(async () => {
    // biome-ignore lint/suspicious/noExplicitAny: axe is injected as a page global
    const axe = (window as any).axe;
    const result = await axe.run(document, { resultTypes: ["violations"] });
    return result.violations.map((v: AxeViolation) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target, failureSummary: n.failureSummary })) }));
  });
}

function countsByImpact(violations: AxeViolation[]) {
  const counts: Record<string, number> = { critical: 0, serious: 0, moderate: 0, minor: 0 };
  for (const v of violations) counts[v.impact ?? "minor"] += v.nodes.length;
  return counts;
}

const summary: string[] = [];
afterAll(() => {
  console.log(`axe-core violations (nodes) per page:\n${summary.join("\n")}`);
});

for (const viewportName of Object.keys(VIEWPORTS) as ViewportName[]) {
  for (const dark of [false, true]) {
    describe(`axe-core, ${viewportName}, ${dark ? "dark" : "light"} theme`, () => {
      let context: BrowserContext;
      let page: Page;
      let productionId: number;
      beforeAll(async () => {
        context = await openThemed(viewportName, dark);
        page = await context.newPage();
      });
      afterAll(async () => {
        await context?.close();
      });

      for (const target of PAGES) {
        it(`${target.name}: no serious or critical violation`, async () => {
          if (!target.signedOut && productionId === undefined) {
            const r = await context.request.post("/api/auth/sign-in", { data: { email: DEMO.designer, password: DEMO_PASSWORD } });
            expect(r.ok(), await r.text()).toBe(true);
            productionId = await demoProductionId(page);
          }
          await page.goto(target.path(productionId), { timeout: 120_000 });
          const violations = await audit(page);
          const counts = countsByImpact(violations);
          summary.push(`  ${viewportName.padEnd(7)} ${dark ? "dark " : "light"} ${target.name.padEnd(12)} critical ${counts.critical}, serious ${counts.serious}, moderate ${counts.moderate}, minor ${counts.minor}`);
          const blocking = violations
            .filter((v) => v.impact === "serious" || v.impact === "critical")
            .map((v) => `${v.impact} ${v.id} (${v.help}) ×${v.nodes.length}: ${v.nodes.slice(0, 3).map((n) => `${JSON.stringify(n.target)} ${n.failureSummary ?? ""}`).join(" | ")}`);
          expect(blocking, `${target.name} (${viewportName}, ${dark ? "dark" : "light"})`).toEqual([]);
        });
      }
    });
  }
}

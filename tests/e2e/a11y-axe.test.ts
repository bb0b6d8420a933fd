// axe-core over every page of the product, in both themes, at a desktop window and on a 10-inch
// tablet in portrait with touch on (800 × 1280): prints the violation counts per page and impact, and
// fails on any serious or critical one (the ones that stop a screen-reader user, a keyboard user or a
// reader in a dark room: names that hide the value shown, missing labels, low contrast).
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { demoProductionId } from "./support/browser";
import { VIEWPORTS, type ViewportName, openThemed, signInAs } from "./support/a11y-browser";

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

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

type AxeViolation = {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: unknown[]; failureSummary?: string }>;
};

async function audit(page: Page): Promise<AxeViolation[]> {
  await page.waitForLoadState("networkidle");
  // The theme toggle gets aria-pressed once React has hydrated: audit the page people use, not the HTML.
  await page.locator("[data-testid=theme-toggle][aria-pressed]").waitFor({ timeout: 60_000 });
  await page.addScriptTag({ content: AXE_SOURCE });
  return page.evaluate(async () => {
    // biome-ignore lint/suspicious/noExplicitAny: axe is injected as a page global
    const axe = (window as any).axe;
    const result = await axe.run(document, { resultTypes: ["violations"] });
    return result.violations.map((v: AxeViolation) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      nodes: v.nodes.map((n) => ({ target: n.target, failureSummary: n.failureSummary })),
    }));
  });
}

/** The rule ids behind the moderate and minor counts, so the summary says what is left to fix. */
function lesser(violations: AxeViolation[]): string {
  const ids = violations.filter((v) => v.impact === "moderate" || v.impact === "minor").map((v) => v.id);
  return ids.length ? ` (${[...new Set(ids)].join(", ")})` : "";
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
            await signInAs(context, "designer");
            productionId = await demoProductionId(page);
          }
          await page.goto(target.path(productionId), { timeout: 120_000 });
          const violations = await audit(page);
          const counts = countsByImpact(violations);
          const line = `  ${viewportName.padEnd(7)} ${dark ? "dark " : "light"} ${target.name.padEnd(12)} critical ${counts.critical}, serious ${counts.serious}, moderate ${counts.moderate}, minor ${counts.minor}${lesser(violations)}`;
          summary.push(line);
          console.log(line);
          const blocking = violations
            .filter((v) => v.impact === "serious" || v.impact === "critical")
            .map(
              (v) =>
                `${v.impact} ${v.id} (${v.help}) ×${v.nodes.length}: ${v.nodes
                  .slice(0, 3)
                  .map((n) => `${JSON.stringify(n.target)} ${n.failureSummary ?? ""}`)
                  .join(" | ")}`,
            );
          expect(blocking, `${target.name} (${viewportName}, ${dark ? "dark" : "light"})`).toEqual([]);
        });
      }
    });
  }
}

// Touch and keyboard on the pages used up a ladder: every control in the rig table and the focus call
// is at least 44 × 44 CSS px on a touch tablet (WCAG 2.2 SC 2.5.5 target size, enhanced), the unit and
// Hung columns stay in view at 800 px, and the rig table works from the keyboard alone (skip link,
// arrow keys between cells, Enter edits, Escape cancels, focus back on the cell).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Locator, Page } from "playwright-core";
import { demoProductionId, screenshot } from "./support/browser";
import { openThemed, signInAs } from "./support/a11y-browser";
import { eventually } from "./support/wait";

const MIN_TARGET = 44; // WCAG 2.2 SC 2.5.5 (AAA): 44 by 44 CSS pixels

/** Every control under `root` whose tap area is smaller than 44 × 44 (a checkbox's tap area is its label). */
async function smallTargets(root: Locator) {
  return root.evaluate((el, min) => {
    const controls = el.querySelectorAll<HTMLElement>(
      "button, a[href], input, select, textarea, summary, [role=button]",
    );
    const small: string[] = [];
    for (const c of controls) {
      // A checkbox, a radio or a visually hidden file input is tapped through its label.
      const viaLabel =
        c instanceof HTMLInputElement &&
        (["checkbox", "radio", "file"].includes(c.type) || c.getBoundingClientRect().width <= 1);
      const area = (viaLabel ? (c.closest("label") ?? c.labels?.[0]) : null) ?? c;
      const r = area.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue; // not rendered (a hidden file input behind its label)
      if (r.width < min - 0.5 || r.height < min - 0.5)
        small.push(
          `${c.tagName.toLowerCase()} "${c.getAttribute("aria-label") ?? c.textContent?.trim().slice(0, 30)}" ${r.width.toFixed(0)}×${r.height.toFixed(0)}`,
        );
    }
    return { count: controls.length, small };
  }, MIN_TARGET);
}

describe("touch targets on a tablet (800 × 1280, touch)", () => {
  let context: BrowserContext;
  let page: Page;
  let productionId: number;
  beforeAll(async () => {
    context = await openThemed("tablet", true);
    await signInAs(context, "electrician");
    page = await context.newPage();
    productionId = await demoProductionId(page);
  });
  afterAll(async () => {
    await context?.close();
  });

  it("sees a coarse pointer (the sizes below are the touch sizes)", async () => {
    await page.goto(`/productions/${productionId}/rig`, { timeout: 120_000 });
    await page.getByTestId("rig-table").locator("[data-cell-control]").first().waitFor({ timeout: 60_000 });
    expect(await page.evaluate(() => matchMedia("(pointer: coarse)").matches)).toBe(true);
  });

  it("rig table: every control at least 44 × 44", async () => {
    const table = page.getByTestId("rig-table");
    await table.locator("[data-cell-control]").first().waitFor({ timeout: 60_000 });
    const { count, small } = await smallTargets(table);
    console.log(`rig table: ${count} controls, ${small.length} under 44 × 44`);
    expect(count).toBeGreaterThan(100); // the demo rig has 116 units, each with controls
    expect(small.slice(0, 10)).toEqual([]);
  });

  it("rig table: the unit and Hung columns stay in view when the table is scrolled across", async () => {
    const table = page.getByTestId("rig-table");
    const scroller = table.locator("xpath=..");
    const inView = () =>
      scroller.evaluate((box) => {
        const frame = box.getBoundingClientRect();
        const heads = [...box.querySelectorAll("thead th")];
        const seen = (text: string) => {
          const th = heads.find((h) => h.textContent?.trim().replace(/[▲▼]/g, "") === text);
          if (!th) return `no ${text} column`;
          const r = th.getBoundingClientRect();
          return r.left >= frame.left - 1 && r.right <= frame.right + 1 ? "in view" : "out of view";
        };
        return { unit: seen("Unit"), hung: seen("Hung") };
      });
    for (const to of ["middle", "end"] as const) {
      await scroller.evaluate(
        (box, where) => box.scrollTo({ left: where === "end" ? box.scrollWidth : box.scrollWidth / 2 }),
        to,
      );
      await eventually(inView).toEqual({ unit: "in view", hung: "in view" });
    }
    await screenshot(page, "a11y-rig-tablet-dark-scrolled");
  });

  it("focus call: every control at least 44 × 44", async () => {
    await page.goto(`/productions/${productionId}/focus/call`, { timeout: 120_000 });
    const call = page.getByTestId("focus-call");
    await call.waitFor({ timeout: 60_000 });
    await call.getByTestId("mark-focused").waitFor({ timeout: 60_000 });
    const { count, small } = await smallTargets(call);
    console.log(`focus call: ${count} controls, ${small.length} under 44 × 44`);
    expect(count).toBeGreaterThan(5);
    expect(small).toEqual([]);
    await screenshot(page, "a11y-focus-call-tablet-dark");
  });
});

describe("the rig table from the keyboard", () => {
  let context: BrowserContext;
  let page: Page;
  let productionId: number;
  beforeAll(async () => {
    context = await openThemed("desktop", false);
    await signInAs(context, "designer");
    page = await context.newPage();
    productionId = await demoProductionId(page);
    await page.goto(`/productions/${productionId}/rig`, { timeout: 120_000 });
    await page.getByTestId("rig-table").locator("[data-cell-control]").first().waitFor({ timeout: 60_000 });
  });
  afterAll(async () => {
    await context?.close();
  });

  const focused = () =>
    page.evaluate(() => document.activeElement?.getAttribute("aria-label") ?? document.activeElement?.id ?? "");

  it("offers a skip link first that lands on the page's content", async () => {
    await page.locator("body").focus();
    await page.keyboard.press("Tab");
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe("Skip to content");
    await page.keyboard.press("Enter");
    await eventually(focused).toBe("content");
  });

  it("names each cell with the value it shows", async () => {
    const circuit = page.getByTestId("rig-table").locator("button[aria-label^='Circuit ']").first();
    const shown = ((await circuit.textContent()) ?? "").trim();
    expect(shown).not.toBe("");
    expect(await circuit.getAttribute("aria-label")).toMatch(
      new RegExp(`^Circuit ${shown.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}, unit .+ on .+, edit$`),
    );
  });

  it("moves with the arrow keys, edits with Enter, cancels with Escape and keeps the focus on the cell", async () => {
    const cells = page.getByTestId("rig-table").locator("button[aria-label^='Circuit ']");
    const [first, second] = [
      await cells.nth(0).getAttribute("aria-label"),
      await cells.nth(1).getAttribute("aria-label"),
    ];
    await cells.nth(0).focus();
    await page.keyboard.press("ArrowDown");
    await eventually(focused).toBe(second);
    await page.keyboard.press("ArrowUp");
    await eventually(focused).toBe(first);
    await page.keyboard.press("ArrowRight");
    await eventually(focused).not.toBe(first);
    await page.keyboard.press("ArrowLeft");
    await eventually(focused).toBe(first);

    await page.keyboard.press("Enter");
    const editor = page.getByTestId("rig-table").locator("input:focus");
    await editor.waitFor();
    expect(await editor.getAttribute("aria-label")).toMatch(/^Circuit of unit /);
    await page.keyboard.type("zz-not-kept");
    await page.keyboard.press("Escape");
    await eventually(focused).toBe(first); // back on the cell, nothing saved
    await page.keyboard.press("Enter");
    await editor.waitFor();
    await page.keyboard.press("Enter"); // unchanged value: closes without a save
    await eventually(focused).toBe(first);
  });
});

// Both studies drawn in Chromium for the demo production: the coverage heat map with an acting area's
// dark spot, face light, and the shadow study with a performer dragged to a new mark (saved through the API);
// then both pages at tablet portrait (800 × 1280) and a laptop (1440 × 900) with no sideways scrolling.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { screenshot, signedIn, type SignedIn } from "./support/browser";
import { eventually, UI_TIMEOUT } from "./support/wait";
import { fitBounds, planToScreen } from "@/lib/plot/view";
import { stageBounds } from "@/lib/plot/stage-outline";

let s: SignedIn;
const made: string[] = [];
beforeAll(async () => {
  s = await signedIn("designer");
});
afterAll(async () => {
  for (const url of made.reverse()) await s.page.request.delete(url).catch(() => null);
  await s?.close();
});

async function create(path: string, key: string, data: object) {
  const r = await s.page.request.post(`/api/productions/${s.productionId}/${path}`, { data });
  expect(r.status()).toBe(201);
  const row = (await r.json())[key];
  made.push(`/api/productions/${s.productionId}/${path}/${row.id}`);
  return row;
}

const square = (cx: number, cy: number, r: number) => [
  { x: cx - r, y: cy - r },
  { x: cx + r, y: cy - r },
  { x: cx + r, y: cy + r },
  { x: cx - r, y: cy + r },
];

describe("studies", () => {
  it("draws the coverage heat map, the area table and a flagged area's dark spot, then face light", async () => {
    await create("area-zones", "areaZone", { name: "Study DC", polygon: square(0, 2, 1.2) });
    await create("area-zones", "areaZone", { name: "Study far USL", polygon: square(7, 9, 0.6) });
    const { page } = s;
    await page.goto(`/productions/${s.productionId}/studies`);
    const result = page.getByTestId("coverage-result");
    await result.and(page.locator("[data-state=ready]")).waitFor({ timeout: 120_000 });
    const canvas = page.getByTestId("study-canvas").first();
    await eventually(async () => Number(await canvas.getAttribute("data-draw-ms")) > 0, { timeout: UI_TIMEOUT }).toBe(
      true,
    );
    await page.getByTestId("heat-legend").first().waitFor();
    const row = page.getByTestId("area-table").getByRole("row", { name: /Study DC/ });
    await row.click();
    await page.getByTestId("dark-spot").waitFor();
    expect(await page.getByTestId("dark-spot").textContent()).toMatch(/Study DC: darkest at/);
    await page.getByRole("button", { name: "Draw a line" }).click();
    const box = (await canvas.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.6);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.7, box.y + box.height * 0.6, { steps: 5 });
    await page.mouse.up();
    await page.getByTestId("line-profile").waitFor();
    await screenshot(page, "studies-coverage");

    await page.getByLabel("Measure").selectOption("face");
    await eventually(
      async () => (await page.getByTestId("heat-legend").first().textContent())?.includes("light on faces") ?? false,
      { timeout: 120_000 },
    ).toBe(true);
    await screenshot(page, "studies-face-light");
  });

  it("draws the shadows of a performer and a panel, and a dragged performer's new mark is saved", async () => {
    const mark = await create("performer-marks", "performerMark", { name: "Study lead", x: 0, y: 3 });
    await create("scenic-panels", "scenicPanel", { name: "Study flat", x1: -3, y1: 7, x2: -1, y2: 7.5, height: 2.4 });
    const { page } = s;
    await page.goto(`/productions/${s.productionId}/studies?study=shadows`);
    await page.getByTestId("shadow-result").and(page.locator("[data-state=ready]")).waitFor({ timeout: 120_000 });
    await page.getByRole("button", { name: "Study lead" }).click();
    await page.getByTestId("shadow-table").getByText("Shadows of Study lead").waitFor();
    expect(await page.getByTestId("shadow-table").locator("tbody tr").count()).toBeGreaterThan(0);

    const production = (await (await page.request.get(`/api/productions/${s.productionId}`)).json()).production;
    const canvas = page.getByTestId("study-canvas");
    const box = (await canvas.boundingBox())!;
    const view = fitBounds(stageBounds(production), { width: box.width, height: box.height });
    const from = planToScreen(view, { x: 0, y: 3 });
    const to = planToScreen(view, { x: 2, y: 4 });
    await page.mouse.move(box.x + from.x, box.y + from.y);
    await page.mouse.down();
    await page.mouse.move(box.x + to.x, box.y + to.y, { steps: 8 });
    await page.mouse.up();
    await eventually(
      async () => {
        const rows = (await (await page.request.get(`/api/productions/${s.productionId}/performer-marks`)).json())
          .performerMarks;
        const now = rows.find((r: { id: number }) => r.id === mark.id);
        return Math.abs(now.x - 2) < 0.15 && Math.abs(now.y - 4) < 0.15 && now.version === 2;
      },
      { timeout: 60_000, message: "the dragged performer mark was not saved at its new place" },
    ).toBe(true);
    await page.getByTestId("shadow-result").and(page.locator("[data-state=ready]")).waitFor({ timeout: 60_000 });
    await screenshot(page, "studies-shadows");
  });
});

/** How far the page reaches past the window's right edge, in CSS pixels (0 when nothing scrolls sideways). */
async function sidewaysOverflow(page: SignedIn["page"]): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

describe("studies at tablet and laptop sizes", () => {
  for (const size of [
    { width: 800, height: 1280, name: "tablet-portrait" },
    { width: 1440, height: 900, name: "laptop" },
  ]) {
    it(`fits ${size.width} × ${size.height} without sideways scrolling, with the demo's areas and marks`, async () => {
      const at = await signedIn("designer", { width: size.width, height: size.height });
      try {
        const { page } = at;
        await page.goto(`/productions/${at.productionId}/studies`);
        await page.getByTestId("coverage-result").and(page.locator("[data-state=ready]")).waitFor({ timeout: 120_000 });
        // The demo seeds acting areas, so the area table is there from the start (seeders/*-demo-studies.cjs).
        await page
          .getByTestId("area-table")
          .getByRole("row", { name: /Mid centre/ })
          .waitFor();
        const canvas = page.getByTestId("study-canvas").first();
        await eventually(async () => Number(await canvas.getAttribute("data-draw-ms")) > 0).toBe(true);
        expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
        const box = (await canvas.boundingBox())!;
        expect(box.x).toBeGreaterThanOrEqual(0);
        expect(box.x + box.width).toBeLessThanOrEqual(size.width);
        await screenshot(page, `studies-coverage-${size.name}`);

        await page.goto(`/productions/${at.productionId}/studies?study=shadows`);
        await page.getByTestId("shadow-result").and(page.locator("[data-state=ready]")).waitFor({ timeout: 120_000 });
        await page.getByRole("button", { name: "Harbour master" }).click();
        await page.getByTestId("shadow-table").getByText("Shadows of Harbour master").waitFor();
        expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
        const shadowBox = (await page.getByTestId("study-canvas").boundingBox())!;
        expect(shadowBox.x + shadowBox.width).toBeLessThanOrEqual(size.width);
        await screenshot(page, `studies-shadows-${size.name}`);
      } finally {
        await at.close();
      }
    });
  }
});

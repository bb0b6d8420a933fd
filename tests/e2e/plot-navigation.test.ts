// Moving the view in Chromium, through the navigation hook the plot and the cue plan share: a
// middle-button drag pans the plot without selecting or saving anything, the wheel zooms about the
// pointer (the plan point under it stays under it), and the cue plan pans and frames itself again.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { DEMO, demoProductionId, openBrowser, signIn } from "./support/browser";

type View = { scale: number; ox: number; oy: number };
let browser: BrowserContext;

beforeAll(async () => {
  browser = await openBrowser({ width: 1280, height: 900 });
});
afterAll(async () => {
  await browser?.close();
});

const readView = async (page: Page) =>
  JSON.parse((await page.getByTestId("plot-canvas").getAttribute("data-view"))!) as View;
const planAt = (v: View, s: { x: number; y: number }) => ({ x: (s.x - v.ox) / v.scale, y: (v.oy - s.y) / v.scale });

async function slowDrag(
  page: Page,
  from: { x: number; y: number },
  by: { x: number; y: number },
  button: "left" | "middle",
) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down({ button });
  for (let i = 1; i <= 6; i++) await page.mouse.move(from.x + (by.x * i) / 6, from.y + (by.y * i) / 6);
  await page.mouse.up({ button });
}

describe("moving the view", () => {
  it("pans the plot with the middle button and zooms it about the pointer", async () => {
    const page = await browser.newPage();
    await signIn(page, DEMO.designer);
    const id = await demoProductionId(page);
    const stamp = async () =>
      (await (await page.request.get(`/api/productions/${id}/plot?only=stamp`)).json()).stamp as string;
    await page.goto(`/productions/${id}/plot`);
    await page.locator("[data-testid=plot-canvas][data-drawn]").waitFor();
    const box = (await page.getByTestId("plot-canvas").boundingBox())!;
    const stampBefore = await stamp();
    const v0 = await readView(page);

    // Middle-button drag from the middle of the canvas (whatever lies there): the view moves by the drag, exactly.
    const mid = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    await slowDrag(page, mid, { x: 120, y: -80 }, "middle");
    await expect.poll(async () => (await readView(page)).ox).toBeCloseTo(v0.ox + 120, 6);
    const v1 = await readView(page);
    expect(v1.oy).toBeCloseTo(v0.oy - 80, 6);
    expect(v1.scale).toBe(v0.scale);

    // Wheel toward the screen top zooms in; the plan point under the pointer stays under it.
    // Whole pixels: Chromium hands mouse and wheel events whole-pixel client coordinates.
    const pointer = { x: Math.round(box.x + box.width * 0.3), y: Math.round(box.y + box.height * 0.4) };
    const local = { x: pointer.x - box.x, y: pointer.y - box.y };
    const under = planAt(v1, local);
    await page.mouse.move(pointer.x, pointer.y);
    await page.mouse.wheel(0, -300);
    await expect.poll(async () => (await readView(page)).scale).toBeGreaterThan(v1.scale * 1.2);
    await page.waitForTimeout(300); // every wheel step drawn and the view at rest
    const v2 = await readView(page);
    const back = { x: v2.ox + v2.scale * under.x, y: v2.oy - v2.scale * under.y };
    expect(Math.hypot(back.x - local.x, back.y - local.y)).toBeLessThan(0.01); // the pointer's plan point, to a hundredth of a pixel

    // Nothing was selected or saved by moving the view.
    await page.getByTestId("side-panel").getByText("The plot", { exact: true }).waitFor();
    expect(await stamp()).toBe(stampBefore);
    await page.close();
  });

  it("pans the cue plan with a drag and frames the stage again on a double-click", async () => {
    const page = await browser.newPage();
    await signIn(page, DEMO.designer);
    await page.goto(`/productions/${await demoProductionId(page)}/cues`);
    const plan = page.getByTestId("cue-plan");
    const canvas = plan.locator("canvas").first();
    await canvas.waitFor();
    await plan.scrollIntoViewIfNeeded(); // the mouse only reaches what is on screen
    const pixels = () => canvas.evaluate((c: HTMLCanvasElement) => c.toDataURL());
    // The look as first framed, once it has stopped changing (its levels arrive after the canvas).
    let framed = "";
    await expect
      .poll(
        async () => {
          const [a, b] = [await pixels(), await new Promise<string>((r) => setTimeout(() => r(pixels()), 400))];
          framed = b;
          return a === b;
        },
        { timeout: 15_000 },
      )
      .toBe(true);
    const box = (await plan.boundingBox())!;
    await slowDrag(page, { x: box.x + box.width / 2, y: box.y + box.height / 2 }, { x: 90, y: 40 }, "left");
    await expect.poll(pixels).not.toBe(framed);
    await page.mouse.dblclick(box.x + box.width / 2, box.y + box.height / 2);
    await expect.poll(pixels).toBe(framed);
    await page.close();
  });
});

// The plot in Chromium: the designer uploads and calibrates an underlay, draws a pipe, hangs units,
// drags a focus mark and sees the server's numbers; the electrician sees the same plot read-only.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { DEMO, demoProductionId, openBrowser, screenshot, signIn } from "./support/browser";
import { makePng } from "../support/png";

type View = { scale: number; ox: number; oy: number };
let browser: BrowserContext;
let productionId = 0;

beforeAll(async () => {
  browser = await openBrowser({ width: 1440, height: 900 });
});
afterAll(async () => {
  await browser?.close();
});

async function openPlot(email: string) {
  await browser.clearCookies();
  const page = await browser.newPage();
  await signIn(page, email);
  productionId = await demoProductionId(page);
  await page.goto(`/productions/${productionId}/plot`);
  await page.locator("[data-testid=plot-canvas][data-view]").waitFor();
  return page;
}

/** Screen point (page coordinates) of a plan point, from the view the canvas publishes. */
async function toPage(page: Page, p: { x: number; y: number }) {
  const canvas = page.getByTestId("plot-canvas");
  const view = JSON.parse((await canvas.getAttribute("data-view"))!) as View;
  const box = (await canvas.boundingBox())!;
  return { x: box.x + view.ox + view.scale * p.x, y: box.y + view.oy - view.scale * p.y };
}

async function drag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  for (let i = 1; i <= 8; i++)
    await page.mouse.move(from.x + ((to.x - from.x) * i) / 8, from.y + ((to.y - from.y) * i) / 8);
  await page.mouse.up();
}

async function plotData(page: Page) {
  return (await page.request.get(`/api/productions/${productionId}/plot`)).json();
}

describe("the designer works the plot", () => {
  it("uploads and calibrates an underlay, draws a pipe, hangs units, and focuses one", async () => {
    const page = await openPlot(DEMO.designer);
    await screenshot(page, "plot-designer-light");

    // Underlay: a 400 × 300 px grid image; calibrate by dragging across 200 px of it and calling that 10 m.
    await page
      .getByTestId("underlay-file")
      .setInputFiles({ name: "groundplan.png", mimeType: "image/png", buffer: makePng(400, 300) });
    await page.getByRole("button", { name: "Upload" }).click();
    await page.getByTestId("underlay-info").filter({ hasText: "groundplan.png" }).waitFor();
    const before = (await plotData(page)).underlays[0];
    await page.getByRole("button", { name: "Calibrate scale" }).click();
    const a = { x: before.offsetX + 0.5, y: before.offsetY - 1 }; // inside the image, on the stage
    const b = { x: a.x + 2, y: a.y }; // 200 px at 1 cm a pixel
    await drag(page, await toPage(page, a), await toPage(page, b));
    await page.getByTestId("draft-distance").fill("10 m");
    await page.getByRole("button", { name: "Apply scale" }).click();
    await page.getByTestId("underlay-info").filter({ hasText: "1 px = 0.05 m" }).waitFor();
    const calibrated = (await plotData(page)).underlays[0];
    expect(calibrated.metresPerPixel).toBeCloseTo(0.05, 2); // 10 m over the picked 200 px, within a pixel of picking
    await page.getByTestId("underlay-lock").click(); // saved first, then shown checked
    await page.getByTestId("underlay-info").filter({ hasText: "locked" }).waitFor();

    // A new pipe near the back of the stage.
    await page.getByRole("button", { name: "Pipe", exact: true }).click();
    await drag(page, await toPage(page, { x: -4, y: 7.8 }), await toPage(page, { x: 4, y: 7.8 }));
    await page.getByTestId("draft-name").fill("Test pipe");
    await page.getByTestId("draft-trim").fill("6.5 m");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await page.getByTestId("position-panel").waitFor();
    const pipe = (await plotData(page)).positions.find((p: { name: string }) => p.name === "Test pipe");
    expect(pipe).toMatchObject({ kind: "overhead-pipe", trimHeight: 6.5 });

    // Hang two units: pick a type on the shelf, click the pipe twice.
    await page.getByTestId("type-shelf").getByRole("button", { name: "Profile 26°" }).click();
    await page.mouse.click(...xy(await toPage(page, { x: 2, y: 7.8 })));
    await expect
      .poll(
        async () =>
          (await plotData(page)).fixtures.filter((f: { positionId: number }) => f.positionId === pipe.id).length,
      )
      .toBe(1);
    await page.mouse.click(...xy(await toPage(page, { x: -2, y: 7.8 })));
    await expect
      .poll(
        async () =>
          (await plotData(page)).fixtures.filter((f: { positionId: number }) => f.positionId === pipe.id).length,
      )
      .toBe(2);
    const hung = (await plotData(page)).fixtures.filter((f: { positionId: number }) => f.positionId === pipe.id);
    // numbered from stage left: the unit at x = 2 (stage left of the other) is 1
    expect(hung.find((f: { x: number }) => f.x > 0).unitNumber).toBe("1");
    expect(hung.find((f: { x: number }) => f.x < 0).unitNumber).toBe("2");
    expect(hung[0].computed.lensHeight).toBeCloseTo(6.5 - 0.45, 9); // trim less the type's lens drop (DESIGN.md)
    await page.keyboard.press("Escape");

    // Focus: a cyc unit on the 4th Electric has its own mark; select it and drag the mark 3 m downstage.
    const data = await plotData(page);
    const cyc = data.fixtures.find(
      (f: { positionName: string; focusPointId: number | null }) =>
        f.positionName === "4th Electric" && f.focusPointId === null,
    );
    await page.mouse.click(...xy(await toPage(page, cyc)));
    await page
      .getByTestId("fixture-title")
      .filter({ hasText: `Unit ${cyc.unitNumber} · 4th Electric` })
      .waitFor();
    const throwBefore = await page.getByTestId("num-throw").textContent();
    const mark = cyc.computed.focus;
    await drag(page, await toPage(page, mark), await toPage(page, { x: mark.x, y: mark.y - 3 }));
    await expect
      .poll(async () => (await plotData(page)).fixtures.find((f: { id: number }) => f.id === cyc.id).version)
      .toBeGreaterThan(cyc.version);
    const saved = (await plotData(page)).fixtures.find((f: { id: number }) => f.id === cyc.id);
    expect(saved.focusY).toBeCloseTo(mark.y - 3, 1);
    await page.locator("[data-testid=beam-numbers][data-preview=no]").waitFor();
    const expected = `${saved.computed.throw.toFixed(2)} m`; // metric production: two decimals (lib/optics formatLength)
    await expect.poll(() => page.getByTestId("num-throw").textContent()).toBe(expected);
    expect(expected).not.toBe(throwBefore);
    expect(await page.getByTestId("num-deck-length").textContent()).toBe(
      `${saved.computed.deck.lengthAlong.toFixed(2)} m`,
    );
    await screenshot(page, "plot-designer-focus");

    await page.getByTestId("theme-toggle").click();
    await page.waitForTimeout(300);
    await screenshot(page, "plot-designer-dark");
    await page.getByTestId("theme-toggle").click();
    await page.close();
  });

  it("answers bad input at the field and the server saves nothing", async () => {
    const page = await openPlot(DEMO.designer);
    const data = await plotData(page);
    const f = data.fixtures.find((x: { positionName: string }) => x.positionName === "1st Electric");
    await page.mouse.click(...xy(await toPage(page, f)));
    await page.getByTestId("fixture-panel").waitFor();
    await page.getByTestId("field-cone").fill("200");
    await page.getByTestId("field-cone").press("Enter");
    await page.getByText("Cone must be more than 0° and less than 180°.").waitFor();
    await page.getByTestId("field-throw").fill("0.5 m");
    await page.getByTestId("field-throw").press("Enter");
    await page.getByText(/shorter than the drop/).waitFor();
    const after = (await plotData(page)).fixtures.find((x: { id: number }) => x.id === f.id);
    expect(after.version).toBe(f.version);
    await page.close();
  });
});

describe("the electrician sees the plot read-only", () => {
  it("has no editing tools, no inputs for focus, and the API refuses a focus change", async () => {
    const page = await openPlot(DEMO.electrician);
    await page.getByTestId("read-only-badge").waitFor();
    expect(await page.getByRole("button", { name: "Pipe", exact: true }).count()).toBe(0);
    expect(await page.getByTestId("type-shelf").count()).toBe(0);
    const data = await plotData(page);
    const cyc = data.fixtures.find(
      (f: { positionName: string; focusPointId: number | null }) =>
        f.positionName === "4th Electric" && f.focusPointId === null,
    );
    await page.mouse.click(...xy(await toPage(page, cyc)));
    await page.getByTestId("fixture-panel").waitFor();
    expect(await page.locator("[data-testid=field-cone]").evaluate((el) => el.tagName)).toBe("SPAN");
    expect(await page.getByTestId("field-throw").count()).toBe(0);
    expect(await page.getByTestId("underlay-file").count()).toBe(0);
    // Dragging the mark only pans the view; nothing is saved.
    await drag(
      page,
      await toPage(page, cyc.computed.focus),
      await toPage(page, { x: cyc.computed.focus.x, y: cyc.computed.focus.y - 2 }),
    );
    await page.waitForTimeout(500);
    const after = (await plotData(page)).fixtures.find((f: { id: number }) => f.id === cyc.id);
    expect(after.version).toBe(cyc.version);
    const r = await page.request.patch(`/api/productions/${productionId}/fixtures/${cyc.id}`, {
      data: { version: cyc.version, focusX: 0, focusY: 0 },
    });
    expect(r.status()).toBe(403);
    await screenshot(page, "plot-electrician");
    await page.close();
  });
});

const xy = (p: { x: number; y: number }) => [p.x, p.y] as const;

// Another session's change reaches an open plot without a reload: designer A (a second browser, its own
// session) moves a unit's focus mark through the API; designer B's plot, left open with that unit
// selected, shows the server's new numbers within a few seconds (the plot polls a change token).
// The demo has one designer account, so A and B are two sessions of it in two separate browsers.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { DEMO, demoProductionId, openBrowser, screenshot, signIn } from "./support/browser";

type View = { scale: number; ox: number; oy: number };
type Fixture = {
  id: number;
  version: number;
  unitNumber: string;
  positionName: string;
  focusPointId: number | null;
  x: number;
  y: number;
  focusX: number | null;
  focusY: number | null;
  computed: { throw: number; focus: { x: number; y: number } };
};

let a: BrowserContext;
let b: BrowserContext;

beforeAll(async () => {
  [a, b] = await Promise.all([openBrowser({ width: 1280, height: 860 }), openBrowser({ width: 1440, height: 900 })]);
});
afterAll(async () => {
  await Promise.all([a?.close(), b?.close()]);
});

describe("live updates on the plot", () => {
  it("shows another session's focus change without a reload", async () => {
    const pageB = await b.newPage();
    await signIn(pageB, DEMO.designer);
    const productionId = await demoProductionId(pageB);
    const read = async () =>
      (await (await pageB.request.get(`/api/productions/${productionId}/plot`)).json()).fixtures as Fixture[];
    // A unit on a pipe (boom units fan out on screen), away from the 4th Electric units the other plot test drags.
    const unit = (await read()).find(
      (f) => /Electric$/.test(f.positionName) && f.positionName !== "4th Electric" && f.computed.focus,
    )!;
    expect(unit).toBeTruthy();
    const mark = unit.computed.focus;

    await pageB.goto(`/productions/${productionId}/plot`);
    const canvas = pageB.getByTestId("plot-canvas");
    await pageB.locator("[data-testid=plot-canvas][data-drawn]").waitFor();
    const view = JSON.parse((await canvas.getAttribute("data-view"))!) as View;
    const box = (await canvas.boundingBox())!;
    await pageB.mouse.click(box.x + view.ox + view.scale * unit.x, box.y + view.oy - view.scale * unit.y);
    await pageB
      .getByTestId("fixture-title")
      .filter({ hasText: `Unit ${unit.unitNumber} · ${unit.positionName}` })
      .waitFor();
    const throwBefore = await pageB.getByTestId("num-throw").textContent();
    await pageB.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));

    // Session A moves the mark 1.5 m downstage, through the same route the editor uses.
    const pageA = await a.newPage();
    await signIn(pageA, DEMO.designer);
    const moved = await pageA.request.patch(`/api/productions/${productionId}/fixtures/${unit.id}`, {
      data: { version: unit.version, focusPointId: null, focusX: mark.x, focusY: mark.y - 1.5 },
    });
    expect(moved.status()).toBe(200);
    const saved = (await moved.json()).fixture as Fixture;
    const expected = `${saved.computed.throw.toFixed(2)} m`; // metric production: two decimals (lib/optics formatLength)
    expect(expected).not.toBe(throwBefore);

    // B's panel follows within a few seconds (poll every 3 s), and B's page was never reloaded.
    await expect
      .poll(() => pageB.getByTestId("num-throw").textContent(), { timeout: 12_000, interval: 250 })
      .toBe(expected);
    expect(await pageB.evaluate(() => (window as unknown as { __sameDocument?: boolean }).__sameDocument)).toBe(true);
    await screenshot(pageB, "plot-live-update");

    // Put the mark back so other tests see the demo as seeded.
    const back = await pageA.request.patch(`/api/productions/${productionId}/fixtures/${unit.id}`, {
      data: { version: saved.version, focusPointId: unit.focusPointId, focusX: unit.focusX, focusY: unit.focusY },
    });
    expect(back.status()).toBe(200);
    await Promise.all([pageA.close(), pageB.close()]);
  });

  it("lets the designer drag a landmark's end on the plot, saved with its version", async () => {
    const page = await b.newPage();
    await signIn(page, DEMO.designer);
    const productionId = await demoProductionId(page);
    const made = await page.request.post(`/api/productions/${productionId}/landmarks`, {
      data: { name: "Test lip", x1: -3, y1: -1, x2: 3, y2: -1 },
    });
    expect(made.status()).toBe(201);
    const landmark = (await made.json()).landmark as { id: number; version: number; x2: number; y2: number };

    await page.goto(`/productions/${productionId}/plot`);
    await page.locator("[data-testid=plot-canvas][data-drawn]").waitFor();
    const canvas = page.getByTestId("plot-canvas");
    const view = JSON.parse((await canvas.getAttribute("data-view"))!) as View;
    const box = (await canvas.boundingBox())!;
    const at = (p: { x: number; y: number }) => ({
      x: box.x + view.ox + view.scale * p.x,
      y: box.y + view.oy - view.scale * p.y,
    });
    const from = at({ x: 3, y: -1 });
    const to = at({ x: 4, y: -2 }); // whole metres: on the visible grid, so the snap keeps them
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let i = 1; i <= 8; i++)
      await page.mouse.move(from.x + ((to.x - from.x) * i) / 8, from.y + ((to.y - from.y) * i) / 8);
    await page.mouse.up();

    const read = async () =>
      (
        (await (await page.request.get(`/api/productions/${productionId}/plot`)).json()).landmarks as Array<{
          id: number;
          version: number;
          x1: number;
          x2: number;
          y2: number;
        }>
      ).find((l) => l.id === landmark.id)!;
    await expect.poll(async () => (await read()).version, { timeout: 10_000 }).toBeGreaterThan(landmark.version);
    const saved = await read();
    expect(saved.x2).toBeCloseTo(4, 2);
    expect(saved.y2).toBeCloseTo(-2, 2);
    expect(saved.x1).toBeCloseTo(-3, 6); // the other end stays
    await screenshot(page, "plot-landmark-dragged");
    expect(
      (await page.request.delete(`/api/productions/${productionId}/landmarks/${landmark.id}`)).status(),
    ).toBeLessThan(300);
    await page.close();
  });
});

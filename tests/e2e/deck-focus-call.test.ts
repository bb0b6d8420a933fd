// The focus call on tablets and a phone: whatever the position's size, the unit strip wraps and scrolls
// inside itself and the page never grows wider than the screen, so Next, the position's PDF and
// "Mark focused" stay reachable. The demo's 1st Electric (20 units) and a 40-unit pipe of a fresh production.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { type SignedIn, screenshot, signedIn } from "./support/browser";

const SCREENS = [
  { name: "tablet-portrait", width: 800, height: 1280 },
  { name: "tablet-landscape", width: 1280, height: 800 },
  { name: "phone", width: 390, height: 844 },
] as const;

let electrician: SignedIn;
let designer: SignedIn;
beforeAll(async () => {
  [electrician, designer] = await Promise.all([
    signedIn("electrician", { width: 800, height: 1280 }),
    signedIn("designer", { width: 800, height: 1280 }),
  ]);
});
afterAll(async () => {
  await Promise.all([electrician?.close(), designer?.close()]);
});

/** A fresh production of the designer's with one 40-unit overhead pipe; returns its id and the pipe's id. */
async function productionWith40(page: Page): Promise<{ id: number; positionId: number }> {
  const api = page.context().request;
  const post = async (url: string, data: unknown) => {
    const r = await api.post(url, { data });
    expect(r.status(), `${url}: ${await r.text()}`).toBe(201);
    return r.json();
  };
  const id = (await post("/api/productions", { name: `Forty on a pipe ${Date.now()}` })).production.id as number;
  const type = (
    await post(`/api/productions/${id}/fixture-types`, {
      name: "Wash 40",
      family: "fresnel",
      coneMinDeg: 15,
      coneMaxDeg: 60,
      peakCandela: 20000,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).fixtureType;
  const position = (
    await post(`/api/productions/${id}/positions`, {
      name: "Long pipe",
      kind: "overhead-pipe",
      x1: -10,
      y1: 2,
      x2: 10,
      y2: 2,
      trimHeight: 7,
    })
  ).position;
  const fixtures = Array.from({ length: 40 }, (_, i) => ({
    positionId: position.id,
    fixtureTypeId: type.id,
    unitNumber: String(i + 1),
    x: -10 + i * (20 / 39),
    y: 2,
    channel: i + 101,
    focusX: -4 + (i % 9),
    focusY: 1 + (i % 4),
  }));
  await post(`/api/productions/${id}/fixtures`, { fixtures });
  return { id, positionId: position.id };
}

/** Each control's box lies inside the viewport's width, and the document is no wider than the viewport. */
async function expectControlsOnScreen(page: Page, label: string) {
  const width = page.viewportSize()!.width;
  const { scrollWidth, clientWidth } = await page.evaluate(() => ({
    scrollWidth: document.documentElement.scrollWidth,
    clientWidth: document.documentElement.clientWidth,
  }));
  expect(scrollWidth, `${label}: the page scrolls sideways`).toBeLessThanOrEqual(clientWidth);
  for (const control of [
    page.getByRole("button", { name: "Next unit" }),
    page.getByTestId("call-pdf"),
    page.getByTestId("mark-focused").or(page.getByTestId("unmark-focused")),
  ]) {
    const box = await control.first().boundingBox();
    expect(box, `${label}: a control is missing`).not.toBeNull();
    expect(box!.x, label).toBeGreaterThanOrEqual(0);
    expect(box!.x + box!.width, `${label}: a control runs off the right edge`).toBeLessThanOrEqual(width);
  }
  // The strip holds every unit and scrolls within itself rather than stretching the page.
  const strip = await page.getByTestId("unit-strip").boundingBox();
  expect(strip!.x + strip!.width, `${label}: the unit strip runs off screen`).toBeLessThanOrEqual(width);
}

async function checkEveryScreen(page: Page, url: string, units: number, shot: string) {
  for (const screen of SCREENS) {
    await page.setViewportSize({ width: screen.width, height: screen.height });
    await page.goto(url);
    await page.getByTestId("mark-focused").or(page.getByTestId("unmark-focused")).first().waitFor();
    await expect(page.getByTestId("unit-strip").getByRole("button").count()).resolves.toBe(units);
    await expectControlsOnScreen(page, `${units} units, ${screen.name}`);
    await screenshot(page, `${shot}-${screen.name}`);
  }
}

describe("the focus call fits the screen", () => {
  it("keeps the controls on screen for the demo's 20-unit 1st Electric", async () => {
    const { page, productionId } = electrician;
    const list = (await (await page.request.get(`/api/productions/${productionId}/positions`)).json())
      .positions as Array<{ id: number; name: string }>;
    const first = list.find((p) => p.name === "1st Electric");
    expect(first, "the demo has a 1st Electric").toBeDefined();
    await checkEveryScreen(
      page,
      `/productions/${productionId}/focus/call?position=${first!.id}`,
      20,
      "deck-focus-call-20",
    );
  }, 240_000);

  it("keeps the controls on screen for a 40-unit pipe, and the last unit can be picked from the strip", async () => {
    const { page } = designer;
    const { id, positionId } = await productionWith40(page);
    await checkEveryScreen(page, `/productions/${id}/focus/call?position=${positionId}`, 40, "deck-focus-call-40");
    // On the phone the last unit sits in the strip's scrolled part; picking it makes it current.
    const last = page.getByTestId("unit-strip").getByRole("button", { name: /^Unit 40\b/ });
    await last.click();
    await expect.poll(() => last.getAttribute("aria-current"), { timeout: 30_000 }).toBe("true");
    await expectControlsOnScreen(page, "40 units, phone, last unit picked");
  }, 300_000);
});

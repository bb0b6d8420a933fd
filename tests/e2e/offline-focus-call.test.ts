// The focus call with the network gone (Chromium, a tablet viewport): the position is kept on the device by
// the service worker, so the page reloads offline; units marked focused, as-focused notes and barn doors wait
// as "waiting to send" and go when the network returns. A unit someone else changed meanwhile comes back as a
// conflict (theirs / mine again) and nothing is overwritten silently. Screenshot of the focus call offline.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { APIRequestContext, Page } from "playwright-core";
import { type SignedIn, screenshot, signedIn } from "./support/browser";

type Row = { id: number; unitNumber: string; version: number; focused: boolean; focusNotes: string | null };

let deck: SignedIn; // the tablet on the bridge
let booth: SignedIn; // someone else, on another device, online all along
let productionId: number;
let positionId: number;

/** A fresh production with one 4-unit pipe, so no other test's marks get in the way. */
async function productionWithPipe(api: APIRequestContext) {
  const post = async (url: string, data: unknown) => {
    const r = await api.post(url, { data });
    expect(r.status(), `${url}: ${await r.text()}`).toBe(201);
    return r.json();
  };
  const id = (await post("/api/productions", { name: `Offline bridge ${Date.now()}` })).production.id as number;
  const type = (
    await post(`/api/productions/${id}/fixture-types`, {
      name: "Bridge profile",
      family: "profile",
      coneMinDeg: 19,
      coneMaxDeg: 36,
      peakCandela: 30000,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).fixtureType;
  const position = (
    await post(`/api/productions/${id}/positions`, {
      name: "FOH Bridge",
      kind: "overhead-pipe",
      x1: -4,
      y1: -6,
      x2: 4,
      y2: -6,
      trimHeight: 8,
    })
  ).position;
  const fixtures = [1, 2, 3, 4].map((n) => ({
    positionId: position.id,
    fixtureTypeId: type.id,
    unitNumber: String(n),
    x: -4 + (n - 1) * 2.5,
    y: -6,
    channel: 200 + n,
    focusX: -3 + n,
    focusY: 2,
  }));
  await post(`/api/productions/${id}/fixtures`, { fixtures });
  return { id, positionId: position.id as number };
}

async function rows(api: APIRequestContext): Promise<Map<string, Row>> {
  const r = await api.get(`/api/productions/${productionId}/fixtures`);
  expect(r.status()).toBe(200);
  const list = (await r.json()).fixtures as Row[];
  return new Map(list.map((f) => [f.unitNumber, f]));
}

const pickUnit = (page: Page, n: number) =>
  page
    .getByTestId("unit-strip")
    .getByRole("button", { name: new RegExp(`^Unit ${n}\\b`) })
    .click();

beforeAll(async () => {
  [deck, booth] = await Promise.all([
    signedIn("designer", { width: 800, height: 1280 }),
    signedIn("designer", { width: 1280, height: 800 }),
  ]);
  ({ id: productionId, positionId } = await productionWithPipe(booth.context.request));
  // What the deck sends, in the test's log: shows which write went when, should a check fail.
  deck.page.on("response", (r) => {
    if (r.request().method() === "PATCH") console.log(`deck PATCH ${new URL(r.url()).pathname} → ${r.status()}`);
  });
  deck.page.on("requestfailed", (r) => {
    if (r.method() === "PATCH")
      console.log(`deck PATCH ${new URL(r.url()).pathname} failed: ${r.failure()?.errorText}`);
  });
  deck.page.on("console", (m) => {
    if (m.type() === "error" && !m.text().includes("ERR_INTERNET_DISCONNECTED"))
      console.log(`deck console: ${m.text()}`);
  });
}, 120_000);
afterAll(async () => {
  await Promise.all([deck?.close(), booth?.close()]);
});

describe("the focus call offline", () => {
  it("reloads with the network gone, queues marks and notes, and sends them when it returns", async () => {
    const { page, context } = deck;
    const url = `/productions/${productionId}/focus/call?position=${positionId}`;
    await page.goto(url);
    await page.getByTestId("mark-focused").waitFor();
    // The worker has kept this position's page, code and fixtures.
    await page.locator("html[data-focus-kept=yes]").waitFor({ timeout: 60_000 });
    expect(await page.evaluate(() => navigator.serviceWorker.controller?.scriptURL ?? null)).toMatch(/\/sw\.js\?v=/);

    await context.setOffline(true);
    await page.reload();
    await page.getByTestId("mark-focused").waitFor();
    await expect.poll(() => page.getByTestId("outbox-status").textContent()).toMatch(/^Offline/);

    // Unit 1: marked focused and on to the next unit.
    await pickUnit(page, 1);
    await page.getByTestId("mark-focused").click();
    await expect.poll(() => page.getByTestId("call-announce").textContent()).toMatch(/^Unit 2/);
    // Unit 2: barn doors, an as-focused note, then marked focused where it is.
    await page.getByTestId("barn-door-top").fill("in halfway");
    await page.getByRole("button", { name: "Save barn doors" }).click();
    await page.getByLabel("As-focused notes").fill("shuttered off the pros arch");
    await page.getByRole("button", { name: "Save as-focused notes" }).click();
    await page.getByTestId("mark-focused-stay").click();

    await expect.poll(() => page.getByTestId("strip-waiting").count()).toBe(2);
    await expect
      .poll(() => page.getByTestId("outbox-waiting").textContent())
      .toMatch(/as-focused notes, marked focused$/);
    const waiting = await page.getByTestId("outbox-waiting").textContent();
    expect(waiting).toContain("unit 1 on FOH Bridge: Marked focused");
    // Only the leaf that changed is sent.
    expect(waiting).toContain("unit 2 on FOH Bridge: Barn door top, as-focused notes, marked focused");
    await expect(page.getByTestId("call-progress").textContent()).resolves.toBe("2 of 4 focused");
    await screenshot(page, "offline-focus-call");

    // Nothing has reached the server yet.
    const before = await rows(booth.context.request);
    expect(before.get("1")!.focused).toBe(false);
    expect(before.get("2")!.focusNotes).toBeNull();

    await context.setOffline(false);
    await expect.poll(() => page.getByTestId("strip-waiting").count(), { timeout: 30_000 }).toBe(0);
    const after = await rows(booth.context.request);
    expect(after.get("1")).toMatchObject({ focused: true });
    expect(after.get("2")).toMatchObject({
      focused: true,
      focusNotes: "shuttered off the pros arch",
      barnDoorTop: "in halfway",
    });
    // One write per unit: each row moved on by exactly one version.
    expect(after.get("1")!.version).toBe(before.get("1")!.version + 1);
    expect(after.get("2")!.version).toBe(before.get("2")!.version + 1);
  }, 180_000);

  it("brings back a unit changed meanwhile as a conflict, per unit: theirs stays until mine is sent again", async () => {
    const { page, context } = deck;
    await context.setOffline(true);
    await expect.poll(() => page.getByTestId("outbox-status").textContent()).toMatch(/^Offline/);
    await pickUnit(page, 3);
    await page.getByLabel("As-focused notes").fill("mine from the deck");
    await page.getByRole("button", { name: "Save as-focused notes" }).click();
    await pickUnit(page, 4);
    await page.getByTestId("mark-focused-stay").click();
    await expect.poll(() => page.getByTestId("strip-waiting").count()).toBe(2);

    // Meanwhile, in the booth, someone else writes unit 3's note.
    const three = (await rows(booth.context.request)).get("3")!;
    const r = await booth.context.request.patch(`/api/productions/${productionId}/fixtures/${three.id}`, {
      data: { version: three.version, focusNotes: "theirs from the booth" },
    });
    expect(r.status()).toBe(200);

    await context.setOffline(false);
    const card = page.getByTestId(`outbox-conflict-${three.id}`);
    await card.waitFor({ timeout: 45_000 }).catch(async (err) => {
      console.log(`outbox after reconnecting: ${await page.getByTestId("outbox").textContent()}`);
      throw err;
    });
    const text = await card.textContent();
    expect(text).toContain("theirs from the booth");
    expect(text).toContain("mine from the deck");
    // Unit 4 had no conflict and went through; unit 3 kept the other person's note.
    await expect.poll(async () => (await rows(booth.context.request)).get("4")!.focused).toBe(true);
    expect((await rows(booth.context.request)).get("3")!.focusNotes).toBe("theirs from the booth");
    await screenshot(page, "offline-focus-call-conflict");

    await card.getByRole("button", { name: "Send mine again" }).click();
    // The card gives way to "waiting to send" at once; the write follows.
    await card.waitFor({ state: "detached", timeout: 30_000 });
    await expect
      .poll(async () => (await rows(booth.context.request)).get("3")!.focusNotes, { timeout: 30_000 })
      .toBe("mine from the deck");
    await expect.poll(() => page.getByTestId("strip-waiting").count(), { timeout: 30_000 }).toBe(0);
  }, 180_000);

  it("leaves every other page alone: the worker controls only the focus call", async () => {
    const { page, context } = deck;
    await context.setOffline(false);
    await page.goto(`/productions/${productionId}/rig`);
    expect(await page.evaluate(() => navigator.serviceWorker.controller)).toBeNull();
    const scopes = await page.evaluate(async () =>
      (await navigator.serviceWorker.getRegistrations()).map((r) => new URL(r.scope).pathname),
    );
    expect(scopes).toEqual([`/productions/${productionId}/focus/call`]);
  }, 60_000);

  it("opens the installed app (the manifest's start) straight into the focus call this tablet followed last", async () => {
    const { page } = deck;
    const manifest = await (await page.request.get("/manifest.webmanifest")).json();
    await page.goto(manifest.start_url);
    await page.waitForURL(new RegExp(`/productions/${productionId}/focus/call`));
    await page.getByTestId("focus-call").waitFor();
  }, 60_000);
});

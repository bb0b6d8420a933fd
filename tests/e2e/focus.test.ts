// Focus charts in Chromium: 120 charts printed to PDF in every layout (page counts checked with pdfinfo,
// the first page turned into a PNG with pdftoppm), and the electrician's focus call on a tablet.
import { execFileSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { eventually, textOf } from "./support/wait";
import { setTheme } from "./support/theme";

const RESULTS = path.resolve(process.env.TEST_RESULTS_DIR ?? "test-results");
const PDF_DIR = path.join(RESULTS, "focus-pdf");

let designer: SignedIn;
let tablet: SignedIn; // the electrician on a 10-inch tablet in portrait
beforeAll(async () => {
  [designer, tablet] = await Promise.all([signedIn("designer"), signedIn("electrician", { width: 800, height: 1280 })]);
  mkdirSync(PDF_DIR, { recursive: true });
  mkdirSync(path.join(RESULTS, "screenshots"), { recursive: true });
});
afterAll(async () => {
  await Promise.all([designer?.close(), tablet?.close()]);
});

function pdfPages(file: string): number {
  const info = execFileSync("pdfinfo", [file], { encoding: "utf8" });
  return Number(info.match(/^Pages:\s+(\d+)/m)![1]);
}

/** A fresh production of the designer's with 120 fixtures on two positions of 60, built through the API. */
async function productionWith120(page: Page): Promise<number> {
  const api = page.context().request;
  const post = async (url: string, data: unknown) => {
    const r = await api.post(url, { data });
    expect(r.status(), `${url}: ${await r.text()}`).toBe(201);
    return r.json();
  };
  const id = (await post("/api/productions", { name: `Focus print ${Date.now()}` })).production.id as number;
  const type = (
    await post(`/api/productions/${id}/fixture-types`, {
      name: "Profile 26",
      family: "profile",
      coneMinDeg: 26,
      coneMaxDeg: 26,
      peakCandela: 40000,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).fixtureType;
  const point = (await post(`/api/productions/${id}/focus-points`, { name: "Centre", x: 0, y: 3 })).focusPoint;
  for (const [n, y] of [
    [1, -7],
    [2, 2],
  ] as const) {
    const pos = (
      await post(`/api/productions/${id}/positions`, {
        name: `Pipe ${n}`,
        kind: y < 0 ? "foh-bridge" : "overhead-pipe",
        x1: -7,
        y1: y,
        x2: 7,
        y2: y,
        trimHeight: 7.5,
      })
    ).position;
    const fixtures = Array.from({ length: 60 }, (_, i) => ({
      positionId: pos.id,
      fixtureTypeId: type.id,
      unitNumber: String(i + 1),
      x: -7 + i * (14 / 59),
      y,
      channel: (n - 1) * 60 + i + 1,
      ...(i % 2 ? { focusPointId: point.id } : { focusX: -4 + (i % 9), focusY: 1 + (i % 5) }),
      ...(i % 3 === 0 ? { shutterCuts: [{ label: "top", a: { x: -6, y: -1.5 }, b: { x: 6, y: -1.5 } }] } : {}),
    }));
    await post(`/api/productions/${id}/fixtures`, { fixtures });
  }
  return id;
}

describe("printing 120 focus charts to PDF", () => {
  it("gives ceil(120/n) pages for 1, 2, 4 and 6 charts a page, and the first page renders", async () => {
    const { page } = designer;
    const id = await productionWith120(page);
    for (const n of [1, 2, 4, 6]) {
      const r = await page
        .context()
        .request.get(`/api/productions/${id}/focus/pdf?perPage=${n}&paper=${n === 2 ? "Letter" : "A4"}&tz=UTC`, {
          timeout: 120_000,
        });
      expect(r.status()).toBe(200);
      expect(r.headers()["content-type"]).toBe("application/pdf");
      const file = path.join(PDF_DIR, `focus-120-${n}up.pdf`);
      writeFileSync(file, await r.body());
      // arithmetic: 120 charts, n a page (each position's 60 divides evenly into 1, 2, 4 and 6)
      expect(pdfPages(file)).toBe(Math.ceil(120 / n));
      execFileSync("pdftoppm", [
        "-png",
        "-r",
        "60",
        "-f",
        "1",
        "-l",
        "1",
        "-singlefile",
        file,
        path.join(RESULTS, "screenshots", `focus-pdf-${n}up-page1`),
      ]);
    }
    // The print view shows the same sheets for the browser's own print.
    await page.goto(`/productions/${id}/focus/print?perPage=6&paper=A4&tz=UTC`);
    await eventually(() => page.getByTestId("focus-sheet").count()).toBe(20);
    await screenshot(page, "focus-print-view-6up");
  }, 300_000); // four PDFs of 120 charts: about 30 s on a quiet machine, several times that on a loaded one
});

describe("the electrician's focus call on a tablet", () => {
  it("opens one position, marks units focused, and prints that position", async () => {
    const { page, productionId } = tablet;
    await page.goto(`/productions/${productionId}/focus`);
    await page.getByTestId("chart-list").waitFor();
    const boomId = await page
      .getByTestId("filter-position")
      .locator("option", { hasText: "Boom SR 2" })
      .getAttribute("value");
    await page.getByTestId("filter-position").selectOption(boomId!);
    await eventually(() => page.getByTestId("focus-chart").count()).toBe(4);
    await screenshot(page, "focus-list-tablet");

    await page.getByTestId("open-focus-call").click();
    await page.getByTestId("focus-call").waitFor();
    await page.getByTestId("mark-focused").waitFor();
    // How many the server holds as focused already (an earlier run on a kept database may have marked some).
    const position = Number(boomId);
    const onBoom = (await (await page.request.get(`/api/productions/${productionId}/fixtures`)).json()).fixtures.filter(
      (f: { positionId: number }) => f.positionId === position,
    );
    const done = onBoom.filter((f: { focused: boolean }) => f.focused).length;
    await textOf(page.getByTestId("call-progress")).toBe(`${done} of 4 focused`);
    // The unit the call opened on (the first not yet focused) stays on screen when marked without moving on,
    // for its notes; undone again, the run below starts from the same state.
    const shown = () => page.getByTestId("focus-chart").first().getAttribute("data-fixture-id");
    const opened = await shown();
    await page.getByTestId("mark-focused-stay").click();
    await textOf(page.getByTestId("focused-line")).toMatch(/^Focused /);
    expect(await shown()).toBe(opened);
    await page.getByTestId("unmark-focused").click();
    await textOf(page.getByTestId("call-progress")).toBe(`${done} of 4 focused`);
    await page.getByTestId("mark-focused").click();
    await textOf(page.getByTestId("call-progress")).toBe(`${done + 1} of 4 focused`);
    // "Focused — next unit" moved on; mark this one without moving, then check who and when.
    await page.getByTestId("mark-focused-stay").click();
    await textOf(page.getByTestId("focused-line")).toMatch(/^Focused \d{1,2} \w{3} \d{4}, \d\d:\d\d by Teodor Brask$/);
    await page.getByLabel("As-focused notes").fill("Top shutter trimmed off the lip.");
    await page.getByRole("button", { name: "Save as-focused notes" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: /^Saved\.$/ })
      .first()
      .waitFor();
    await expect(page.getByLabel("Designer notes").count()).resolves.toBe(0); // read-only for the electrician
    await screenshot(page, "focus-call-tablet-light");
    await setTheme(page, true);
    await screenshot(page, "focus-call-tablet-dark");

    const href = await page.getByTestId("call-pdf").getAttribute("href");
    const r = await page.context().request.get(href!, { timeout: 120_000 });
    expect(r.status()).toBe(200);
    const file = path.join(PDF_DIR, "boom-sr-2.pdf");
    writeFileSync(file, await r.body());
    expect(pdfPages(file)).toBe(1); // 4 units at 4 a page
  });
});

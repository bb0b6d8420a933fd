// On paper and starting out, in Chromium: the printed plot with its key and title block, a new production's
// starter types and a copy from another production, the import preview's old → new list, and the owner
// archiving, restoring and deleting a production.
import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import { postViaBrowser, signUpThroughMail } from "../support/sign-up";
import { openBrowser, type SignedIn, screenshot, signedIn } from "./support/browser";
import { eventually, textOf } from "./support/wait";

type Box = { x: number; y: number; w: number; h: number };
const overlaps = (a: Box, b: Box) =>
  Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x) > 1e-6 &&
  Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y) > 1e-6;

let designer: SignedIn;
let fresh: BrowserContext;
let page: Page;
const dir = mkdtempSync(path.join(os.tmpdir(), "paper-e2e-"));

beforeAll(async () => {
  designer = await signedIn("designer", { width: 1440, height: 900 });
  // A fresh account of its own for what creates productions, so the demo designer keeps landing on the demo.
  fresh = await openBrowser({ width: 1440, height: 900 });
  page = await fresh.newPage();
  await signUpThroughMail(postViaBrowser(page), { name: "Paper Tester", email: `paper-${Date.now()}@example.test` });
}, 120_000);
afterAll(async () => {
  await designer?.close();
  await fresh?.close();
});

async function newProduction(name: string): Promise<number> {
  const r = await page.request.post("/api/productions", { data: { name, venue: "Test hall", displayUnits: "metric" } });
  expect(r.status()).toBe(201);
  return (await r.json()).production.id;
}

describe("the printed plot", () => {
  it("fits the window, carries a key of the symbols in use and a title block, and keeps labels apart", async () => {
    const { page: p, productionId } = designer;
    const api = async (url: string) => (await p.request.get(url)).json();
    const fixtures: Array<{ fixtureTypeId: number }> = (await api(`/api/productions/${productionId}/fixtures`))
      .fixtures;
    const production = (await api(`/api/productions/${productionId}`)).production;
    for (const [paper, orient] of [
      ["A3", "landscape"],
      ["A4", "portrait"],
    ]) {
      await p.goto(`/productions/${productionId}/plot/print?paper=${paper}&orient=${orient}`);
      await p.getByTestId("print-sheet").waitFor();
      // no sideways scrolling at 1440 px: the sheet shrinks to the window on screen
      const sideways = await p.evaluate(
        () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
      );
      expect(sideways).toBeLessThanOrEqual(0);
      // the key: one entry per type in use, counts adding up to every unit
      const inUse = new Set(fixtures.map((f) => f.fixtureTypeId));
      await eventually(() => p.getByTestId("key-entry").count()).toBe(inUse.size);
      const counts = await p.getByTestId("key-count").allTextContents();
      expect(counts.reduce((n, c) => n + Number(c.replace(/\D/g, "")), 0)).toBe(fixtures.length);
      // the title block
      await textOf(p.getByTestId("title-production")).toContain(production.name.slice(0, 10));
      await textOf(p.getByTestId("title-scale")).toMatch(/1:\d+/);
      await textOf(p.getByTestId("title-revision")).toMatch(/REVISION/i);
      // values are written out in full, not cut short, on a narrow portrait sheet too
      await textOf(p.getByTestId("title-paper")).toContain(`${paper}, ${orient}`);
      await textOf(p.getByTestId("title-date")).toMatch(/\d{4}-\d\d-\d\d/);
      await textOf(p.getByTestId("title-designer")).toMatch(/DESIGNER\s*\S/i);
      // labels: none on another (boxes written by the sheet in millimetres)
      const boxes: Box[] = (
        await p.getByTestId("sheet-label").evaluateAll((els) => els.map((e) => e.getAttribute("data-box")))
      ).map((b) => {
        const [x, y, w, h] = String(b).split(",").map(Number);
        return { x, y, w, h };
      });
      expect(boxes.length).toBeGreaterThan(0);
      for (let i = 0; i < boxes.length; i++)
        for (let j = i + 1; j < boxes.length; j++) expect(overlaps(boxes[i], boxes[j])).toBe(false);
      // the scale bar sits in its own cell, clear of the title block's text
      const bar = await p.getByTestId("scale-bar").boundingBox();
      const datum = await p.getByTestId("title-datum").boundingBox();
      expect(bar && datum).toBeTruthy();
      expect(
        overlaps(
          { x: bar!.x, y: bar!.y, w: bar!.width, h: bar!.height },
          { x: datum!.x, y: datum!.y, w: datum!.width, h: datum!.height },
        ),
      ).toBe(false);
      await screenshot(p, `plot-print-${paper}-${orient}`);
    }
    await p.emulateMedia({ media: "print" });
    await screenshot(p, "plot-print-key-title-block");
    await p.emulateMedia({ media: "screen" });
  });
});

describe("starter types for a new production", () => {
  it("offers the starter shelf on a new production's overview, and copies types from another production", async () => {
    const first = await newProduction(`Paper starter ${Date.now()}`);
    await page.goto(`/productions/${first}`);
    await page.getByRole("heading", { name: "No fixture types yet" }).waitFor();
    await screenshot(page, "new-production-no-types");
    await page.getByTestId("add-starter-set").click();
    await textOf(page.getByTestId("add-types-message")).toBe(`Added ${STARTER_TYPES.length} types.`);
    const types = async (id: number) =>
      (
        (await (await page.request.get(`/api/productions/${id}/fixture-types`)).json()).fixtureTypes as Array<{
          name: string;
        }>
      ).map((t) => t.name);
    expect((await types(first)).sort()).toEqual(STARTER_TYPES.map((t) => t.name).sort());

    const second = await newProduction(`Paper copy ${Date.now()}`);
    await page.goto(`/productions/${second}/rig`);
    await page
      .getByRole("button", { name: /fixture types/i })
      .first()
      .click();
    const panel = page.getByRole("region", { name: "Fixture types" });
    await panel.getByText("Copy types from another production").click();
    const copyButton = panel.getByTestId("copy-types");
    await textOf(copyButton).toBe(`Copy ${STARTER_TYPES.length} types`);
    // leave one out
    await panel.getByRole("checkbox", { name: new RegExp(STARTER_TYPES[0].name) }).uncheck();
    await textOf(copyButton).toBe(`Copy ${STARTER_TYPES.length - 1} types`);
    await screenshot(page, "rig-copy-types");
    await copyButton.click();
    await textOf(panel.getByTestId("add-types-message")).toBe(`Added ${STARTER_TYPES.length - 1} types.`);
    await eventually(async () => (await types(second)).length).toBe(STARTER_TYPES.length - 1);
    expect(await types(second)).not.toContain(STARTER_TYPES[0].name);
  });
});

describe("the import preview", () => {
  it("counts new, changed and unchanged rows and lists each changed field old → new", async () => {
    const id = await newProduction(`Paper import ${Date.now()}`);
    const post = async (what: string, data: unknown) => {
      const r = await page.request.post(`/api/productions/${id}/${what}`, { data });
      expect(r.status(), `${what}: ${await r.text()}`).toBeLessThan(300);
      return r.json();
    };
    await post("rig/starter-types", { names: [STARTER_TYPES[1].name] });
    const { position } = await post("positions", {
      name: "LX1",
      kind: "overhead-pipe",
      x1: -5,
      y1: 2,
      x2: 5,
      y2: 2,
      trimHeight: 7,
    });
    const typeId = (await (await page.request.get(`/api/productions/${id}/fixture-types`)).json()).fixtureTypes[0].id;
    await post("fixtures", {
      fixtures: [
        {
          positionId: position.id,
          fixtureTypeId: typeId,
          unitNumber: "1",
          x: -1,
          y: 2,
          channel: 1,
          colour: "pale lavender",
        },
        { positionId: position.id, fixtureTypeId: typeId, unitNumber: "2", x: 1, y: 2, channel: 2 },
      ],
    });
    const file = path.join(dir, "changes.csv");
    writeFileSync(
      file,
      `Position,Unit,Type,Channel,Colour\r\nLX1,1,${STARTER_TYPES[1].name},11,light frost\r\nLX1,2,${STARTER_TYPES[1].name},2,\r\nLX1,3,${STARTER_TYPES[1].name},3,full CTB\r\n`,
    );
    await page.goto(`/productions/${id}/rig`);
    await page.getByTestId("rig-table").waitFor();
    await page.getByRole("button", { name: "Import a file" }).click();
    await page.getByTestId("import-file").setInputFiles(file);
    await textOf(page.getByTestId("import-count-new")).toBe("1");
    await textOf(page.getByTestId("import-count-changed")).toBe("1");
    await textOf(page.getByTestId("import-count-unchanged")).toBe("1");
    const change = page.getByTestId("import-change");
    expect(await change.count()).toBe(1);
    await textOf(change).toContain("LX1, unit 1");
    await textOf(change.getByTestId("import-change-channel")).toMatch(/Channel: 1\s*→?\s*(becomes)?\s*11/);
    await textOf(change.getByTestId("import-change-colour")).toMatch(/pale lavender.*light frost/);
    await screenshot(page, "rig-import-preview-changes");
  });
});

describe("archiving and deleting a production", () => {
  it("archives off the list, restores, and deletes only after the name is typed", async () => {
    const name = `Paper archive ${Date.now()}`;
    const id = await newProduction(name);
    await page.goto("/productions");
    await page.getByRole("button", { name: `Archive ${name}` }).click();
    const archived = page.getByTestId("archived-productions");
    await archived.waitFor();
    await eventually(() => page.getByTestId("production-list").getByText(name).count()).toBe(0);
    await archived.locator("summary").click();
    await screenshot(page, "productions-archived");
    await archived.getByRole("button", { name: `Restore ${name}` }).click();
    await page.getByTestId("production-list").getByText(name).waitFor();

    await page.getByRole("button", { name: `Delete ${name}…` }).click();
    const dialog = page.getByTestId("delete-production-dialog");
    await dialog.waitFor();
    const confirm = dialog.getByRole("button", { name: "Delete for good" });
    await dialog.getByLabel(/Type the production's name/).fill("Paper archive");
    expect(await confirm.isDisabled()).toBe(true);
    await dialog.getByLabel(/Type the production's name/).fill(name.toLowerCase());
    expect(await confirm.isDisabled()).toBe(false);
    await screenshot(page, "production-delete-dialog");
    await confirm.click();
    await dialog.waitFor({ state: "detached" });
    await eventually(() => page.getByText(name).count()).toBe(0);
    expect((await page.request.get(`/api/productions/${id}`)).status()).toBe(404);
  });
});

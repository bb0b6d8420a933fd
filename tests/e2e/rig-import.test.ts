// The electrician's path through the rig in Chromium: look at the table, import a CSV, fix the
// reported error, import again, and export .xlsx.
import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import ExcelJS from "exceljs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { DEMO, SCREENSHOTS, openBrowser, screenshot, signIn, demoProductionId } from "./support/browser";

let browser: BrowserContext;
beforeAll(async () => {
  browser = await openBrowser({ width: 1440, height: 900 });
});
afterAll(async () => {
  await browser?.close();
});

const dir = mkdtempSync(path.join(os.tmpdir(), "rig-e2e-"));
const csvFile = (name: string, text: string) => {
  const file = path.join(dir, name);
  writeFileSync(file, text);
  return file;
};

async function openRig(page: Page) {
  await signIn(page, DEMO.electrician);
  const id = await demoProductionId(page);
  await page.goto(`/productions/${id}/rig`);
  await page.getByTestId("rig-table").waitFor();
  return id;
}

describe("rig import and export as the electrician", () => {
  it("imports a CSV, fixes a reported error, imports again and exports .xlsx", async () => {
    const page = await browser.newPage();
    const id = await openRig(page);
    // One row per fixture the server holds (other test files may have hung units in the demo).
    const held = (await (await page.request.get(`/api/productions/${id}/fixtures`)).json()).fixtures.length;
    expect(held).toBeGreaterThanOrEqual(116);
    expect(await page.getByTestId("rig-row").count()).toBe(held);
    await screenshot(page, "rig-hanging-electrician");
    await page.screenshot({ path: path.join(SCREENSHOTS, "rig-hanging-electrician-viewport.png") });

    const fixtures: Array<{ positionName: string; unitNumber: string; id: number }> = await page.evaluate(async (pid) => (await (await fetch(`/api/productions/${pid}/fixtures`)).json()).fixtures, id);
    const [a, b] = fixtures;
    const header = "Position;Unit;Circuit;DMX address;Hung\r\n";
    const bad = csvFile("patch.csv", `\ufeff${header}${a.positionName};${a.unitNumber};C-101;1;yes\r\n${b.positionName};${b.unitNumber};C-102;600;yes\r\n`);

    await page.getByRole("button", { name: "Import a file" }).click();
    await page.getByTestId("import-file").setInputFiles(bad);
    await page.getByTestId("import-errors").waitFor();
    expect(await page.getByTestId("import-errors").textContent()).toContain("Row 3, DMX address: DMX address must be 1–512");
    expect(await page.getByTestId("import-commit").isDisabled()).toBe(true);
    await screenshot(page, "rig-import-preview-error");
    await page.screenshot({ path: path.join(SCREENSHOTS, "rig-import-preview-error-viewport.png") });

    const good = csvFile("patch-fixed.csv", `\ufeff${header}${a.positionName};${a.unitNumber};C-101;1;yes\r\n${b.positionName};${b.unitNumber};C-102;2;yes\r\n`);
    await page.getByTestId("import-file").setInputFiles(good);
    await page.getByTestId("import-errors").waitFor({ state: "detached" });
    await page.getByTestId("import-summary").filter({ hasText: "2 to update" }).waitFor();
    await screenshot(page, "rig-import-preview-ok");
    await page.getByTestId("import-commit").click();
    await page.getByTestId("import-done").waitFor();
    expect(await page.getByTestId("import-done").textContent()).toMatch(/updated/);
    await page.getByRole("button", { name: /Edit Circuit of unit .* on / }).first().waitFor();
    expect(await page.getByTestId("rig-table").textContent()).toContain("C-102");

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("export-xlsx").click()]);
    expect(download.suggestedFilename()).toMatch(/hanging\.xlsx$/);
    const saved = path.join(dir, "export.xlsx");
    await download.saveAs(saved);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(saved);
    const sheet = wb.worksheets[0];
    expect(sheet.getRow(1).getCell(1).value).toBe("Position");
    expect(sheet.rowCount).toBe(held + 1); // a header row and one row per fixture
    await page.close();
  });

  it("shows the patching view and the stock counts, in the dark theme too", async () => {
    const page = await browser.newPage();
    await openRig(page);
    await page.getByRole("button", { name: "Patching" }).click();
    await page.getByRole("columnheader", { name: /Universe/ }).waitFor();
    await screenshot(page, "rig-patching");
    await page.getByRole("button", { name: "Pulling stock" }).click();
    await page.getByTestId("stock-panel").waitFor();
    expect(await page.getByTestId("stock-panel").textContent()).toContain("Colour cuts");
    await page.getByTestId("theme-toggle").click();
    await screenshot(page, "rig-stock-dark");
    await page.getByRole("button", { name: "Hanging" }).click();
    await screenshot(page, "rig-hanging-dark");
    await page.getByTestId("theme-toggle").click();
    await page.close();
  });

  it("lets the electrician edit a circuit inline but not a colour", async () => {
    const page = await browser.newPage();
    await openRig(page);
    expect(await page.getByRole("button", { name: /^Edit Colour of/ }).count()).toBe(0);
    const cell = page.getByRole("button", { name: /^Edit Dimmer of/ }).first();
    await cell.click();
    const input = page.getByRole("textbox", { name: /^Dimmer of/ });
    await input.fill("D-E2E");
    await input.press("Enter");
    await page.getByRole("button", { name: /^Edit Dimmer of/ }).filter({ hasText: "D-E2E" }).waitFor();
    await page.close();
  });
});

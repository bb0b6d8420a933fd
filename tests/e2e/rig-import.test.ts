// The electrician's path through the rig in Chromium: look at the table, import a CSV, fix the
// reported error, import again, and export .xlsx.
import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import ExcelJS from "exceljs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_FIXTURE_COUNT } from "../support/demo";
import { SCREENSHOTS, type SignedIn, screenshot, signedIn } from "./support/browser";
import { setTheme } from "./support/theme";
import { eventually, textOf } from "./support/wait";

let electrician: SignedIn;
beforeAll(async () => {
  electrician = await signedIn("electrician", { width: 1440, height: 900 });
});
afterAll(async () => {
  await electrician?.close();
});

const dir = mkdtempSync(path.join(os.tmpdir(), "rig-e2e-"));
const csvFile = (name: string, text: string) => {
  const file = path.join(dir, name);
  writeFileSync(file, text);
  return file;
};

/** A new page on the demo's rig, for each test its own. */
async function openRig() {
  const page = await electrician.context.newPage();
  await page.goto(`/productions/${electrician.productionId}/rig`);
  await page.getByTestId("rig-table").waitFor();
  return { page, id: electrician.productionId };
}

describe("rig import and export as the electrician", () => {
  it("imports a CSV, fixes a reported error, imports again and exports .xlsx", async () => {
    const { page, id } = await openRig();
    // One row per fixture the server holds (other test files may have hung units in the demo).
    const held = (await (await page.request.get(`/api/productions/${id}/fixtures`)).json()).fixtures.length;
    expect(held).toBeGreaterThanOrEqual(DEMO_FIXTURE_COUNT);
    await eventually(() => page.getByTestId("rig-row").count()).toBe(held);
    await screenshot(page, "rig-hanging-electrician");
    await page.screenshot({ path: path.join(SCREENSHOTS, "rig-hanging-electrician-viewport.png") });

    const fixtures: Array<{ positionName: string; unitNumber: string; id: number }> = await page.evaluate(
      async (pid) => (await (await fetch(`/api/productions/${pid}/fixtures`)).json()).fixtures,
      id,
    );
    const [a, b] = fixtures;
    const header = "Position;Unit;Circuit;DMX address;Hung\r\n";
    const bad = csvFile(
      "patch.csv",
      `\ufeff${header}${a.positionName};${a.unitNumber};C-101;1;yes\r\n${b.positionName};${b.unitNumber};C-102;600;yes\r\n`,
    );

    await page.getByRole("button", { name: "Import a file" }).click();
    await page.getByTestId("import-file").setInputFiles(bad);
    await textOf(page.getByTestId("import-errors")).toContain("Row 3, DMX address: DMX address must be 1–512");
    expect(await page.getByTestId("import-commit").isDisabled()).toBe(true);
    await screenshot(page, "rig-import-preview-error");
    await page.screenshot({ path: path.join(SCREENSHOTS, "rig-import-preview-error-viewport.png") });

    const good = csvFile(
      "patch-fixed.csv",
      `\ufeff${header}${a.positionName};${a.unitNumber};C-101;1;yes\r\n${b.positionName};${b.unitNumber};C-102;2;yes\r\n`,
    );
    await page.getByTestId("import-file").setInputFiles(good);
    await page.getByTestId("import-errors").waitFor({ state: "detached" });
    await page.getByTestId("import-summary").filter({ hasText: "2 to update" }).waitFor();
    await screenshot(page, "rig-import-preview-ok");
    await page.getByTestId("import-commit").click();
    await textOf(page.getByTestId("import-done")).toMatch(/updated/);
    await textOf(page.getByTestId("rig-table")).toContain("C-102"); // the table reloads after the import

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
    const { page } = await openRig();
    await page.getByRole("button", { name: "Patching" }).click();
    await page.getByRole("columnheader", { name: /Universe/ }).waitFor();
    await screenshot(page, "rig-patching");
    await page.getByRole("button", { name: "Pulling stock" }).click();
    await textOf(page.getByTestId("stock-panel")).toContain("Colour cuts");
    await setTheme(page, true);
    await screenshot(page, "rig-stock-dark");
    await page.getByRole("button", { name: "Hanging" }).click();
    await screenshot(page, "rig-hanging-dark");
    await setTheme(page, false);
    await page.close();
  });

  it("lets the electrician edit a circuit inline but not a colour", async () => {
    const { page } = await openRig();
    const cell = page.getByRole("button", { name: /^Dimmer .*, unit .*, edit$/ }).first();
    await cell.waitFor(); // the editable cells are drawn: a Colour one would be among them
    expect(await page.getByRole("button", { name: /^Colour .*, edit$/ }).count()).toBe(0);
    await cell.click();
    const input = page.getByRole("textbox", { name: /^Dimmer of/ });
    await input.fill("D-E2E");
    await input.press("Enter");
    await page
      .getByRole("button", { name: /^Dimmer D-E2E, unit .*, edit$/ })
      .filter({ hasText: "D-E2E" })
      .waitFor();
    await page.close();
  });
});

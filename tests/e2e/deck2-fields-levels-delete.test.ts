// What a crew hit on the cue sheet, the level grid, the rig table and the types table (issue: "On deck and
// on paper", items 7, 9a, 13 and 15), each checked in Chromium at 1440 × 900 with screenshots saved.
import { afterAll, describe, expect, it } from "vitest";
import type { Locator, Page } from "playwright-core";
import { type SignedIn, screenshot, signedIn } from "./support/browser";
import { eventually, textOf } from "./support/wait";
import { setTheme } from "./support/theme";

const SCREEN = { width: 1440, height: 900 };
const sessions: SignedIn[] = [];
async function as(role: Parameters<typeof signedIn>[0]) {
  const s = await signedIn(role, SCREEN);
  sessions.push(s);
  return s;
}
afterAll(async () => {
  for (const s of sessions) await s.close();
});

/** How a control is drawn: its border, and its outline once focused. */
const looks = (l: Locator) =>
  l.evaluate((el) => {
    const s = getComputedStyle(el);
    return { borderWidth: s.borderTopWidth, borderColor: s.borderTopColor, outline: s.outlineStyle };
  });
const transparent = (c: string) => c === "transparent" || /rgba\(.*,\s*0\)$/.test(c);

describe("the cue sheet: editable fields look editable, the rest read only", () => {
  it("the stage manager's page and call note are outlined, take a focus ring and sit on the row's baseline", async () => {
    const { page, productionId } = await as("stageManager");
    await page.goto(`/productions/${productionId}/cues`);
    await page.getByRole("heading", { name: "Cue sheet" }).waitFor();
    for (const theme of [false, true]) {
      await setTheme(page, theme);
      for (const label of ["Page for cue 1", "Call note for cue 1"]) {
        const field = page.getByLabel(label, { exact: true });
        await field.waitFor();
        const before = await looks(field);
        expect(Number.parseFloat(before.borderWidth)).toBeGreaterThanOrEqual(1);
        expect(transparent(before.borderColor)).toBe(false);
        await field.focus();
        await page.keyboard.press("Shift+Tab");
        await page.keyboard.press("Tab"); // keyboard focus, so :focus-visible applies
        expect((await looks(field)).outline).not.toBe("none");
      }
      await screenshot(page, `deck2-cue-sheet-stage-manager-${theme ? "dark" : "light"}`);
    }
    await setTheme(page, false);
    // The page number shares the row's baseline with the cue number beside it.
    const row = page.getByTestId("sheet-row-1");
    const align = await row.locator("td").evaluateAll((tds) => tds.map((td) => getComputedStyle(td).verticalAlign));
    expect(new Set(align)).toEqual(new Set(["baseline"]));
    const cueBase = await row.locator("td").first().locator("span.font-semibold").first().boundingBox();
    const pageBox = await page.getByLabel("Page for cue 1", { exact: true }).boundingBox();
    // the input's text baseline and the number's: their boxes' bottoms differ by no more than the input's padding
    expect(Math.abs(cueBase!.y + cueBase!.height - (pageBox!.y + pageBox!.height))).toBeLessThan(12);
  });

  it("the viewer and the electrician see page and call note as plain text in both themes", async () => {
    for (const role of ["viewer", "electrician"] as const) {
      const { page, productionId } = await as(role);
      await page.goto(`/productions/${productionId}/cues`);
      await page.getByRole("heading", { name: "Cue sheet" }).waitFor();
      expect(await page.getByLabel("Page for cue 1", { exact: true }).count()).toBe(0);
      expect(await page.getByLabel("Call note for cue 1", { exact: true }).count()).toBe(0);
      expect(await page.getByTestId("cue-sheet").locator("input, textarea").count()).toBe(0);
      const readOnly = page.getByTestId("sheet-row-1").locator('[data-readonly="true"]').first();
      await readOnly.waitFor();
      expect(Number.parseFloat((await looks(readOnly)).borderWidth)).toBe(0);
      await textOf(page.getByText(/page and call note are the stage manager's/)).toMatch(/stage manager's/);
      for (const theme of [false, true]) {
        await setTheme(page, theme);
        await screenshot(page, `deck2-cue-sheet-${role}-${theme ? "dark" : "light"}`);
      }
      await setTheme(page, false);
    }
  });
});

describe("cue levels", () => {
  it("the electrician reads the levels, with no way to write them", async () => {
    const { page, productionId } = await as("electrician");
    await page.goto(`/productions/${productionId}/cues`);
    await page.getByRole("link", { name: "Levels (read only)" }).click();
    await page.getByRole("heading", { name: "Levels (read only)" }).waitFor();
    await page.locator('[data-testid^="grid-ch-"]').first().waitFor();
    expect(await page.getByLabel(/Type levels/).count()).toBe(0);
    expect(await page.getByTestId("level-grid").locator("input:not(#grid-jump)").count()).toBe(0);
    await screenshot(page, "deck2-levels-electrician");
  });

  it("a channel with no unit (999) warns and needs a second Enter; the grid fills a 1440 × 900 window", async () => {
    const { page, productionId } = await as("designer");
    await page.goto(`/productions/${productionId}/cues`);
    const box = page.getByLabel(/Type levels/);
    await box.waitFor();
    const feedback = page.locator("#level-entry-feedback");
    await box.fill("cue 9901");
    await box.press("Enter");
    await feedback.filter({ hasText: /Cue 9901 (created|selected)/ }).waitFor();
    try {
      await box.fill("999 50");
      await box.press("Enter");
      await feedback.filter({ hasText: "Channel 999 has no unit in the rig" }).waitFor();
      expect(await feedback.getAttribute("role")).toBe("alert");
      expect(await page.getByTestId("grid-ch-999").count()).toBe(0); // nothing recorded yet
      await page.getByRole("button", { name: "Record anyway" }).waitFor();
      await screenshot(page, "deck2-levels-stray-channel-warning");
      await box.press("Enter");
      await feedback.filter({ hasText: "Cue 9901: channel 999 at 50 %" }).waitFor();
      await page.getByTestId("grid-ch-999").waitFor();

      // A known channel goes straight in, with no question.
      await box.fill("1 40");
      await box.press("Enter");
      await feedback.filter({ hasText: "Cue 9901: channel 1 at 40 %" }).waitFor();

      // The grid scrolled to the top of the window shows more than 8 cues × 18 channels.
      const scroller = page.getByTestId("level-grid-scroll");
      await scroller.evaluate((el) => {
        el.scrollTop = 0;
        el.closest("section")?.scrollIntoView({ block: "start" });
      });
      await eventually(async () => {
        const vh = SCREEN.height;
        const inView = (l: Locator) =>
          l.evaluateAll(
            (els, h) =>
              els.filter((e) => {
                const r = e.getBoundingClientRect();
                return r.top >= 0 && r.bottom <= h && r.width > 0;
              }).length,
            vh,
          );
        return {
          cues: (await inView(scroller.locator("thead th button"))) > 8,
          channels: (await inView(page.locator('[data-testid^="grid-ch-"]'))) >= 18,
        };
      }).toEqual({ cues: true, channels: true });
      await screenshot(page, "deck2-levels-grid-1440x900");
    } finally {
      await deleteCue(page, productionId, 9901);
    }
  });
});

async function deleteCue(page: Page, productionId: number, number: number) {
  const list = await (await page.request.get(`/api/productions/${productionId}/cues`)).json();
  const cue = (list.cues as Array<{ id: number; number: number; version: number }>).find((c) => c.number === number);
  if (!cue) return;
  const r = await page.request.delete(`/api/productions/${productionId}/cues/${cue.id}?version=${cue.version}`);
  expect(r.status()).toBe(200);
}

describe("the rig table", () => {
  it("the designer deletes a unit from its row and Undo hangs it again", async () => {
    const { page, productionId } = await as("designer");
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-table").waitFor();
    const rows = page.getByTestId("rig-row");
    const before = await rows.count();
    const del = page.getByRole("button", { name: /^Delete unit \S+ on [^,]+$/ }).first();
    const name = (await del.getAttribute("aria-label"))!;
    const [, unit, position] = /^Delete unit (\S+) on (.+)$/.exec(name)!;
    await del.click();
    await page
      .getByRole("status")
      .filter({ hasText: `Deleted unit ${unit} on ${position}.` })
      .waitFor();
    await eventually(() => rows.count()).toBe(before - 1);
    expect(await page.getByRole("button", { name, exact: true }).count()).toBe(0);
    await screenshot(page, "deck2-rig-deleted-undo");

    await page.getByRole("button", { name: `Undo: delete unit ${unit} on ${position}` }).click();
    await page
      .getByRole("status")
      .filter({ hasText: /hung again/ })
      .waitFor();
    await eventually(() => rows.count()).toBe(before);
    await page.getByRole("button", { name, exact: true }).waitFor();
  });

  it("the electrician has no delete in the rig table", async () => {
    const { page, productionId } = await as("electrician");
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-table").waitFor();
    expect(await page.getByRole("button", { name: /^Delete unit / }).count()).toBe(0);
  });
});

describe("fixture types: mounting and body width", () => {
  it("the designer sets a mounting; the electrician sees it read only", async () => {
    const designer = await as("designer");
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-table").waitFor();
    await page
      .getByRole("button", { name: /fixture types/i })
      .first()
      .click();
    const panel = page.getByRole("region", { name: "Fixture types" });
    await panel.waitFor();
    for (const header of ["Mounting", "Lens rise", "Body width"])
      await panel.getByRole("columnheader", { name: header, exact: true }).waitFor();
    const edit = panel.getByRole("button", { name: /^Edit Mounting of / }).first();
    const typeName = ((await edit.getAttribute("aria-label")) ?? "").replace(/^Edit Mounting of /, "");
    const was = ((await edit.textContent()) ?? "").trim();
    await edit.click();
    await panel.getByLabel(`Mounting of ${typeName}`).selectOption({ label: "Over-hung (rail or truss top)" });
    const shown = panel.getByRole("button", { name: `Edit Mounting of ${typeName}` });
    await shown.filter({ hasText: "Over-hung" }).waitFor();
    await screenshot(page, "deck2-types-mounting-designer");

    const electrician = await as("electrician");
    await electrician.page.goto(`/productions/${productionId}/rig`);
    await electrician.page.getByTestId("rig-table").waitFor();
    await electrician.page
      .getByRole("button", { name: /fixture types/i })
      .first()
      .click();
    const theirs = electrician.page.getByRole("region", { name: "Fixture types" });
    await theirs.waitFor();
    expect(await theirs.getByRole("button", { name: /^Edit Mounting of / }).count()).toBe(0);
    await theirs
      .getByRole("button", { name: /^Edit Power \(W\) of / })
      .first()
      .waitFor(); // theirs to change
    await textOf(theirs.getByTestId("types-rights")).toMatch(/the rest are the designer's/);
    await screenshot(electrician.page, "deck2-types-electrician");

    // put the demo back
    await shown.click();
    await panel.getByLabel(`Mounting of ${typeName}`).selectOption({ label: was });
    await panel
      .getByRole("button", { name: `Edit Mounting of ${typeName}` })
      .filter({ hasText: was })
      .waitFor();
  });
});

// Notes where the work is: a note filed from a unit's notes button in the rig shows as that unit's badge in
// the rig and on the plot; on the plot, "What lights this spot?" takes a tap on the stage, ranks the units
// reaching it in a chosen cue (the same ranking the API gives for that point), and one tap on a row files a
// note on that unit.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { screenshot, signedIn, type SignedIn } from "./support/browser";
import { eventually, UI_TIMEOUT } from "./support/wait";

type View = { scale: number; ox: number; oy: number };
type Fixture = {
  id: number;
  unitNumber: string;
  positionName: string;
  channel: number | null;
  cell: string | null;
  focusX: number | null;
  focusY: number | null;
  focusPointId: number | null;
};
let designer: SignedIn;
let api = "";
const created: number[] = [];

beforeAll(async () => {
  designer = await signedIn("designer", { width: 1440, height: 900 });
  api = `/api/productions/${designer.productionId}`;
});
afterAll(async () => {
  for (const id of created) await designer?.page.request.delete(`${api}/notes/${id}`);
  await designer?.close();
});

const getJson = async (page: Page, url: string) => (await page.request.get(url)).json();

/** The ids of notes whose text contains `marker` (to clean up what this test filed). */
async function notesWith(page: Page, marker: string) {
  const notes = (await getJson(page, `${api}/notes`)).notes as Array<{ id: number; body: string; subjectId: number }>;
  return notes.filter((n) => n.body.includes(marker));
}

async function openPlot(page: Page) {
  await page.goto(`/productions/${designer.productionId}/plot`);
  await page.locator("[data-testid=plot-canvas][data-drawn=yes]").waitFor({ timeout: 60_000 });
}

/** Page coordinates of a plan point, from the view the canvas publishes. */
async function toPage(page: Page, p: { x: number; y: number }) {
  const canvas = page.getByTestId("plot-canvas");
  const view = JSON.parse((await canvas.getAttribute("data-view"))!) as View;
  const box = (await canvas.boundingBox())!;
  return { x: box.x + view.ox + view.scale * p.x, y: box.y + view.oy - view.scale * p.y };
}

describe("notes badges and the plot's spot question", () => {
  it("a note filed from a unit's notes button in the rig shows as its badge there and on the plot", async () => {
    const { page } = designer;
    const marker = `badge-e2e-${Date.now() % 100000}`;
    const fixtures = (await getJson(page, `${api}/fixtures`)).fixtures as Fixture[];
    const unit = fixtures.filter((f) => f.cell == null).at(-1)!;
    const counts = (await getJson(page, `${api}/notes/counts`)).counts as Record<string, { open: number }>;
    const before = counts[`fixture:${unit.id}`]?.open ?? 0;
    const name = `unit ${unit.unitNumber}, ${unit.positionName}`;
    const label = (n: number) =>
      n === 0 ? `No open notes on ${name}` : `${n} open note${n === 1 ? "" : "s"} on ${name}`;

    await page.goto(`/productions/${designer.productionId}/rig`);
    const button = page.getByTestId("rig-table").getByRole("button", { name: label(before), exact: true });
    await button.waitFor({ timeout: 60_000 });
    await button.click();
    const dialog = page.getByRole("dialog", { name: `Notes on ${name}` });
    await dialog.waitFor({ timeout: UI_TIMEOUT });
    await dialog.getByLabel("New note").fill(`Re-seat the colour frame (${marker})`);
    await dialog.getByRole("button", { name: "Add note" }).click();
    await dialog
      .getByRole("status")
      .filter({ hasText: `Note added on ${name}` })
      .waitFor({ timeout: UI_TIMEOUT });
    created.push(...(await notesWith(page, marker)).map((n) => n.id));
    expect(created).toHaveLength(1);
    await dialog.getByText(`Re-seat the colour frame (${marker})`).waitFor();
    await screenshot(page, "notes-badge-dialog");
    await dialog.getByRole("button", { name: "Close the notes" }).click();
    // The badge follows at once (the write refreshes the one counts query).
    const after = page.getByTestId("rig-table").getByRole("button", { name: label(before + 1), exact: true });
    await after.waitFor({ timeout: UI_TIMEOUT });
    expect(await after.getAttribute("data-note-count")).toBe(String(before + 1));
    await screenshot(page, "notes-badge-rig");

    await openPlot(page);
    // Every unit with open notes gets a badge drawn on the canvas (the fitted view shows the whole rig).
    const withNotes = Object.entries(
      (await getJson(page, `${api}/notes/counts`)).counts as Record<string, { open: number }>,
    ).filter(([k, c]) => k.startsWith("fixture:") && c.open > 0).length;
    await eventually(async () => Number(await page.getByTestId("plot-canvas").getAttribute("data-note-badges"))).toBe(
      withNotes,
    );
    await screenshot(page, "notes-badge-plot");
  });

  it("a tap on the plot ranks the units reaching that spot in a cue, and one tap files a note on one", async () => {
    const { page } = designer;
    const cues = (await getJson(page, `${api}/cues`)).cues as Array<{ id: number; levels: Record<string, number> }>;
    const fixtures = (await getJson(page, `${api}/fixtures`)).fixtures as Fixture[];
    const points = new Map(
      ((await getJson(page, `${api}/focus-points`)).focusPoints as Array<{ id: number; x: number; y: number }>).map(
        (p) => [p.id, p],
      ),
    );
    const markOf = (f: Fixture) =>
      f.focusPointId != null
        ? points.get(f.focusPointId)
        : f.focusX != null && f.focusY != null
          ? { x: f.focusX, y: f.focusY }
          : undefined;
    // Units up in some cue with a mark: each mark is lit in that cue.
    const candidates = cues.flatMap((c) =>
      fixtures
        .filter((f) => f.channel != null && (c.levels?.[f.channel] ?? 0) > 0 && markOf(f))
        .map((f) => ({ cue: c, lit: f, mark: markOf(f)! })),
    );
    expect(candidates.length, "the demo has a unit up in a cue with a focus mark").toBeGreaterThan(0);

    await openPlot(page);
    await page.getByTestId("spot-mode").click();
    const panel = page.getByTestId("spot-panel");
    await panel.waitFor();
    // A mark the panel itself does not cover, so the tap lands on the stage.
    const box = (await panel.boundingBox())!;
    let chosen = candidates[0];
    let at = await toPage(page, chosen.mark);
    for (const c of candidates) {
      const p = await toPage(page, c.mark);
      const covered =
        p.x > box.x - 10 && p.x < box.x + box.width + 10 && p.y > box.y - 10 && p.y < box.y + box.height + 10;
      if (!covered) {
        chosen = c;
        at = p;
        break;
      }
    }
    const { cue, lit, mark } = chosen;
    await panel.getByLabel("In cue").selectOption(String(cue.id));
    await page.mouse.click(at.x, at.y);
    const rows = panel.getByTestId("spot-row");
    await rows.first().waitFor({ timeout: UI_TIMEOUT });
    await screenshot(page, "notes-spot-ranked");

    // The panel's ranking is the server's for the point the tap picked (a pixel from the mark).
    const picked = { x: Number(await panel.getAttribute("data-x")), y: Number(await panel.getAttribute("data-y")) };
    expect(Math.hypot(picked.x - mark.x, picked.y - mark.y)).toBeLessThan(0.1);
    const answer = await (await page.request.post(`${api}/notes/spot`, { data: { ...picked, cueId: cue.id } })).json();
    const ranked = answer.contributions as Array<{ fixtureId: number; label: string }>;
    expect(ranked.length).toBeGreaterThan(0);
    expect(ranked.some((c) => c.fixtureId === lit.id)).toBe(true);
    await eventually(async () => (await rows.count()) === ranked.length).toBe(true);
    for (const [i, c] of ranked.slice(0, 5).entries()) expect(await rows.nth(i).textContent()).toContain(c.label);

    // One tap on the top row: a note on that unit with the finding written in.
    const top = ranked[0];
    await rows
      .first()
      .getByRole("button", { name: `Note on ${top.label}` })
      .click();
    const dialog = page.getByRole("dialog", { name: `Notes on ${top.label}` });
    await dialog.waitFor({ timeout: UI_TIMEOUT });
    const text = await dialog.getByLabel("New note").inputValue();
    expect(text).toMatch(/lx/);
    const marker = `spot-e2e-${Date.now() % 100000}`;
    await dialog.getByLabel("New note").fill(`${text}Trim the spill (${marker})`);
    await dialog.getByRole("button", { name: "Add note" }).click();
    await dialog.getByRole("status").filter({ hasText: "Note added" }).waitFor({ timeout: UI_TIMEOUT });
    await screenshot(page, "notes-spot-note");
    const filed = await notesWith(page, marker);
    created.push(...filed.map((n) => n.id));
    expect(filed.map((n) => n.subjectId)).toEqual([top.fixtureId]);
  });
});

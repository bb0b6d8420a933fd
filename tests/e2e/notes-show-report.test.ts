// The stage manager files a show report with a lamp out; the electrician finds the resulting work note in the
// work call and marks it done (screenshots of both steps).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { screenshot, signedIn, type SignedIn } from "./support/browser";
import { eventually, UI_TIMEOUT } from "./support/wait";

let sm: SignedIn;
let el: SignedIn;
beforeAll(async () => {
  [sm, el] = await Promise.all([signedIn("stageManager"), signedIn("electrician")]);
});
afterAll(async () => {
  await sm?.close();
  await el?.close();
});

describe("notes: show report to work call", () => {
  it("a lamp out logged in the show report reaches the electrician's work call, and Done closes it with who and when", async () => {
    const { productionId } = sm;
    const api = `/api/productions/${productionId}`;
    const performance = `Evening e2e ${Date.now() % 100000}`;

    await sm.page.goto(`/productions/${productionId}/notes/show-reports`);
    await sm.page.getByLabel("Performance").fill(performance);
    await sm.page.getByLabel("How it went").fill("Clean show; one unit dark in the second half.");
    await sm.page.getByRole("button", { name: "Log a lamp out or fault" }).click();
    const unit = sm.page.getByLabel("Entry 1: unit");
    const unitValue = await unit.locator("option").nth(1).getAttribute("value");
    await unit.selectOption(unitValue!);
    await sm.page.getByLabel("Seen").fill("dark from the top of act two");
    await sm.page.getByRole("button", { name: "File and send to the team" }).click();
    await sm.page
      .getByRole("status")
      .filter({ hasText: "Report sent to the team: 1 note written." })
      .waitFor({ timeout: UI_TIMEOUT });
    await sm.page.getByRole("heading", { name: new RegExp(performance) }).waitFor();
    await screenshot(sm.page, "notes-show-report-filed");

    const notes = (await (await el.page.request.get(`${api}/notes`)).json()).notes as Array<{
      id: number;
      body: string;
      subjectId: number;
      kind: string;
      status: string;
    }>;
    const note = notes.find((n) => n.body.includes(performance))!;
    expect([note.kind, note.status, note.subjectId]).toEqual(["work", "open", Number(unitValue)]);

    await el.page.goto(`/productions/${productionId}/notes/work-call`);
    const row = el.page.getByTestId(`work-call-note-${note.id}`);
    await row.waitFor({ timeout: UI_TIMEOUT });
    expect(await row.textContent()).toContain("dark from the top of act two");
    await screenshot(el.page, "notes-work-call-before-done");
    await row.getByRole("button", { name: /Mark done/ }).click();
    await row.waitFor({ state: "detached", timeout: UI_TIMEOUT });
    await screenshot(el.page, "notes-work-call-after-done");

    const me = (await (await el.page.request.get("/api/auth/me")).json()).user;
    await eventually(async () => {
      const all = (await (await el.page.request.get(`${api}/notes`)).json()).notes as Array<{
        id: number;
        status: string;
        closedBy: number | null;
      }>;
      const n = all.find((x) => x.id === note.id)!;
      return [n.status, n.closedBy];
    }).toEqual(["done", me.id]);
  });

  it("the stage manager saves a draft, edits it, then sends it; once sent it can no longer be edited", async () => {
    const { page, productionId } = sm;
    const api = `/api/productions/${productionId}`;
    const performance = `Draft e2e ${Date.now() % 100000}`;
    await page.goto(`/productions/${productionId}/notes/show-reports`);
    await page.getByLabel("Performance").fill(performance);
    await page.getByLabel("How it went").fill("Half written at the interval.");
    await page.getByRole("button", { name: "Add a lighting item" }).click();
    await page.getByLabel("Item 1").fill(`Haze too thin in act one (${performance})`);
    await page.getByRole("button", { name: "Save as a draft" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: `Draft saved for ${performance}` })
      .waitFor({ timeout: UI_TIMEOUT });
    type Listed = { id: number; performance: string; status: string; summary: string; noteIds: number[] };
    const listed = async () =>
      ((await (await page.request.get(`${api}/notes/show-reports`)).json()).showReports as Listed[]).find(
        (r) => r.performance === performance,
      );
    const draft = (await listed())!;
    expect([draft.status, draft.noteIds]).toEqual(["draft", []]);
    await page.getByTestId(`report-status-${draft.id}`).filter({ hasText: "Draft, not sent" }).waitFor();

    // Leave the form, come back to the draft through its Edit button, finish it and send it.
    await page.getByRole("button", { name: "Stop editing (keeps the saved draft)" }).click();
    await page.getByRole("button", { name: `Edit ${performance}` }).click();
    await expect.poll(() => page.getByLabel("How it went").inputValue()).toBe("Half written at the interval.");
    await page.getByLabel("How it went").fill("Clean second half; haze note for the crew.");
    await screenshot(page, "notes-show-report-draft-editing");
    await page.getByRole("button", { name: "Save and send to the team" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "Report sent to the team: 1 note written." })
      .waitFor({ timeout: UI_TIMEOUT });
    await page.getByTestId(`report-status-${draft.id}`).filter({ hasText: "Sent" }).waitFor();
    expect(await page.getByRole("button", { name: `Edit ${performance}` }).count()).toBe(0);
    const sent = (await listed())!;
    expect([sent.status, sent.summary, sent.noteIds.length]).toEqual([
      "sent",
      "Clean second half; haze note for the crew.",
      1,
    ]);
    await screenshot(page, "notes-show-report-draft-sent");
    // The stage manager wrote the note, so may take it back: the demo keeps no stray work note.
    expect((await page.request.delete(`${api}/notes/${sent.noteIds[0]}`)).ok()).toBe(true);
  });
});

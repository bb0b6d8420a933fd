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
});

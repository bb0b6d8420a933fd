// Revisions in Chromium: the designer issues a revision, recolours a unit, issues the next one and sees it
// listed with that change in its group; the rig marks a unit changed since then with the side bar; with the
// mail server down a revision is still issued and its e-mail waits in the outbox with the failure.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailStandIn, stopMailStandIn } from "./support/mail-stand-in";
import { screenshot, signedIn, type SignedIn } from "./support/browser";

let designer: SignedIn;
const tag = String(Date.now()).slice(-6);

beforeAll(async () => {
  designer = await signedIn("designer");
}, 120_000);
afterAll(async () => {
  await startMailStandIn(); // never leave the stand-in stopped for the tests after this one
  await designer?.close();
});

type Fixture = { id: number; version: number; unitNumber: string; positionName: string; channel: number | null };

async function issue(label: string, note: string) {
  const { page } = designer;
  await page.getByLabel("Letter or label").fill(label);
  await page.getByLabel("Issued for").selectOption("focus");
  await page.getByLabel("Note").fill(note);
  await page.getByRole("button", { name: "Issue revision" }).click();
  await page.getByRole("heading", { name: `Revision ${label}`, exact: true }).waitFor();
}

async function recolour(colour: string): Promise<Fixture> {
  const { page, productionId } = designer;
  const list = (await (await page.request.get(`/api/productions/${productionId}/fixtures`)).json())
    .fixtures as Fixture[];
  const unit = list[list.length - 1];
  const r = await page.request.patch(`/api/productions/${productionId}/fixtures/${unit.id}`, {
    data: { version: unit.version, colour },
  });
  expect(r.status()).toBe(200);
  return unit;
}

describe("revisions", () => {
  it("issues a revision and lists it with what changed since the one before, grouped", async () => {
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/revisions`);
    await issue(`E2E ${tag} a`, "before the recolour");

    const unit = await recolour(`e2e lavender ${tag}`);
    await issue(`E2E ${tag} b`, "after the recolour");

    // Listed among the issued revisions, newest first.
    const list = page.getByRole("table", { name: "Issued revisions" });
    await expect.poll(() => list.getByRole("row").nth(1).innerText()).toContain(`E2E ${tag} b`);
    // Its change list names the unit in the recoloured group, with before and after.
    const revisionCard = page
      .locator("section")
      .filter({ has: page.getByRole("heading", { name: `Revision E2E ${tag} b`, exact: true }) });
    const group = revisionCard.getByRole("region", { name: "Fixtures recoloured" });
    const line = group.getByRole("listitem").filter({ hasText: `unit ${unit.unitNumber}` });
    await expect.poll(() => line.innerText()).toContain(`e2e lavender ${tag}`);
    await screenshot(page, "revisions-issued");

    // A change after the latest revision: the rig marks that unit with the side bar.
    const again = await recolour(`e2e pale rose ${tag}`);
    const since = await (await page.request.get(`/api/productions/${productionId}/revisions/latest`)).json();
    expect(since.latest.label).toBe(`E2E ${tag} b`);
    expect(since.fixtureIds).toContain(again.id);
    const seen: string[] = [];
    page.on("console", (m) => seen.push(`console ${m.type()}: ${m.text()}`));
    page.on("response", (r) => {
      if (r.url().includes("/revisions/latest")) seen.push(`${r.status()} ${r.url()}`);
    });
    await page.goto(`/productions/${productionId}/rig`);
    await page.getByTestId("rig-row").first().waitFor();
    await screenshot(page, "revisions-rig-before-marker");
    const marked = page.locator(`[data-testid="rig-row"][data-changed-since="E2E ${tag} b"]`);
    const end = Date.now() + 20_000;
    while ((await marked.count()) === 0 && Date.now() < end) await page.waitForTimeout(500);
    expect(await marked.count(), seen.join("\n")).toBeGreaterThanOrEqual(1);
    await screenshot(page, "revisions-rig-marker");

    // History one click away from the revision's line: the unit's colour changes with who made them.
    await page.goto(`/productions/${productionId}/history?entity=fixture&id=${unit.id}`);
    const rows = page.getByRole("table", { name: /History of unit/ }).getByRole("row");
    await expect.poll(() => rows.nth(1).innerText()).toMatch(new RegExp(`e2e lavender ${tag}\\s+e2e pale rose ${tag}`));
  }, 180_000);

  it("issues a revision with the mail server down, its e-mail queued with the failure in the outbox", async () => {
    const { page, productionId } = designer;
    await page.goto(`/productions/${productionId}/revisions`);
    await stopMailStandIn();
    try {
      await issue(`E2E ${tag} c`, "mail server down");
      await page.getByText(/e-mails? queued for the team/).waitFor();
      // The failure is written once the first try (after the response) has been refused: reload until it shows.
      const subject = `revision E2E ${tag} c`;
      await expect
        .poll(
          async () => {
            await page.goto(`/productions/${productionId}/team/outbox`);
            const item = page.getByRole("listitem").filter({ hasText: subject }).first();
            if (!(await item.count())) return "";
            await item.locator("summary").click();
            return item.innerText();
          },
          { timeout: 30_000, interval: 1000 },
        )
        .toMatch(/The mail server refused or did not answer/);
      await screenshot(page, "revisions-mail-queued");
    } finally {
      await startMailStandIn();
    }
  }, 120_000);
});

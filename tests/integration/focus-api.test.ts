// Focus-chart downloads (PDF, Excel) and the focus fields, through the route handlers and the role table.
import { describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { ApiSession, BASE_URL, DEMO_USERS, demoProductionId, demoSession, freshUser } from "./support/api";

/** A raw GET with the session's cookie, for binary bodies. */
async function download(s: ApiSession, path: string) {
  const cookie = s.cookie;
  const res = await fetch(BASE_URL + path, { headers: { cookie } });
  return {
    status: res.status,
    type: res.headers.get("content-type") ?? "",
    sheets: res.headers.get("x-sheet-count"),
    body: Buffer.from(await res.arrayBuffer()),
  };
}

describe("focus chart downloads", () => {
  it("the electrician gets one position's charts as a PDF with ceil(n/4) pages", async () => {
    const s = await demoSession("electrician");
    const id = await demoProductionId(s);
    const fixtures = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures as Array<{
      positionId: number;
      positionName: string;
    }>;
    const boom = fixtures.find((f) => f.positionName === "Boom SL 1")!;
    const count = fixtures.filter((f) => f.positionId === boom.positionId).length;
    const r = await download(
      s,
      `/api/productions/${id}/focus/pdf?position=${boom.positionId}&perPage=4&paper=Letter&tz=Europe/London`,
    );
    expect(r.status).toBe(200);
    expect(r.type).toBe("application/pdf");
    expect(r.body.subarray(0, 5).toString()).toBe("%PDF-");
    // arithmetic: 4 charts a page
    expect(Number(r.sheets)).toBe(Math.ceil(count / 4));
    expect((r.body.toString("latin1").match(/\/Type\s*\/Page(?!s)/g) ?? []).length).toBe(Math.ceil(count / 4));
  });

  it("answers a bad layout and a bad channel range with 400 naming the field", async () => {
    const s = await demoSession("viewer");
    const id = await demoProductionId(s);
    const bad = await s.get(`/api/productions/${id}/focus/pdf?perPage=3`);
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors).toHaveProperty("perPage");
    const range = await s.get(`/api/productions/${id}/focus/xlsx?chFrom=20&chTo=10`);
    expect(range.status).toBe(400);
    expect(range.json.error.fieldErrors).toHaveProperty("chTo");
    const tz = await s.get(`/api/productions/${id}/focus/pdf?tz=Mars/Olympus`);
    expect(tz.status).toBe(400);
    expect(tz.json.error.fieldErrors).toHaveProperty("tz");
  });

  it("hides the production from outsiders (404) for both downloads", async () => {
    const { session } = await freshUser("focus-outsider");
    const s = await demoSession("viewer");
    const id = await demoProductionId(s);
    expect((await session.get(`/api/productions/${id}/focus/pdf`)).status).toBe(404);
    expect((await session.get(`/api/productions/${id}/focus/xlsx`)).status).toBe(404);
  });

  it("the viewer exports the focus data to Excel, one row a fixture", async () => {
    const s = await demoSession("viewer");
    const id = await demoProductionId(s);
    const total = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures.length as number;
    const r = await download(s, `/api/productions/${id}/focus/xlsx`);
    expect(r.status).toBe(200);
    expect(r.type).toContain("spreadsheetml");
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(r.body as unknown as ArrayBuffer);
    const ws = wb.getWorksheet("Focus charts")!;
    expect(ws.rowCount).toBe(total + 1);
    const headers = (ws.getRow(1).values as string[]).filter(Boolean);
    expect(headers).toEqual(
      expect.arrayContaining(["Position", "Unit", "Focus mark", "Pool at deck", "Cuts", "Status"]),
    );
  });
});

describe("focus fields by role", () => {
  it("the electrician marks focused (time and who) and writes as-focused notes, not designer notes", async () => {
    const s = await demoSession("electrician");
    const id = await demoProductionId(s);
    const f = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures.find(
      (x: { positionName: string; focused: boolean }) => x.positionName === "3rd Electric" && !x.focused,
    );
    const marked = await s.patch(`/api/productions/${id}/fixtures/${f.id}`, {
      version: f.version,
      focused: true,
      focusNotes: "Shuttered off the border.",
    });
    expect(marked.status).toBe(200);
    expect(marked.json.fixture.focused).toBe(true);
    expect(marked.json.fixture.focusedBy).toBeGreaterThan(0);
    expect(Date.now() - Date.parse(marked.json.fixture.focusedAt)).toBeLessThan(5 * 60_000);
    const notes = await s.patch(`/api/productions/${id}/fixtures/${f.id}`, {
      version: marked.json.fixture.version,
      notes: "designer words",
    });
    expect(notes.status).toBe(403);
    const stale = await s.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, focused: false });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.focused).toBe(true);
  });

  it("the stage manager and the viewer cannot mark focused", async () => {
    for (const email of [DEMO_USERS.stageManager, DEMO_USERS.viewer]) {
      const s = await new ApiSession().signIn(email);
      const id = await demoProductionId(s);
      const f = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures[0];
      expect(
        (await s.patch(`/api/productions/${id}/fixtures/${f.id}`, { version: f.version, focused: !f.focused })).status,
      ).toBe(403);
    }
  });
});

// Parts and links over HTTP: the designer edits parts with the cue, the sheet's running times and
// standbys follow them, the files carry them, and the usual rules (roles, 409, 400 by field) hold.
import { beforeAll, describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { type ApiSession, BASE_URL, demoProductionId, demoSession, freshUser } from "./support/api";

let own: ApiSession;
let base: string;
let cookie: string;

beforeAll(async () => {
  ({ session: own } = await freshUser("cue-parts"));
  const p = await own.post("/api/productions", { name: "Parts Test Show", venue: "Test Hall", displayUnits: "metric" });
  base = `/api/productions/${p.json.production.id}/cues`;
  cookie = own.cookie;
});

const create = async (number: number, body: object = {}) => {
  const r = await own.post(base, { number, ...body });
  expect(r.status).toBe(201);
  return r.json.cue;
};
const file = async (format: string) => fetch(`${BASE_URL}${base}/export?format=${format}`, { headers: { cookie } });

describe("parts", () => {
  it("are written and read back with the cue, and bump its version", async () => {
    const cue = await create(1, { upTime: 3, levels: { 1: 60, 2: 60, 3: 60 } });
    const r = await own.patch(`${base}/${cue.id}`, {
      version: cue.version,
      parts: [{ part: 2, label: "sky", upTime: "10", downTime: 4, delay: "1:00", channels: [3, 2] }],
    });
    expect(r.status).toBe(200);
    expect(r.json.cue).toMatchObject({
      version: 2,
      parts: [{ part: 2, label: "sky", upTime: 10, downTime: 4, delay: 60, channels: [2, 3] }],
    });
    expect((await own.get(`${base}/${cue.id}`)).json.cue.parts).toHaveLength(1);
  });

  it("make the running time the slowest moving group's", async () => {
    const sheet = (await own.get(`${base}/summary`)).json;
    // common practice, no source: channels 2 and 3 come up in part 2 after a 60 s wait over 10 s
    expect(sheet.rows[0]).toMatchObject({ number: 1, up: 3, runningTime: 70 });
  });

  it("refuse bad parts with the field named, writing nothing", async () => {
    const cue = (await own.get(base)).json.cues[0];
    const bad = async (parts: unknown) => own.patch(`${base}/${cue.id}`, { version: cue.version, parts });
    const twice = await bad([
      { part: 1, upTime: 1, channels: [5] },
      { part: 2, upTime: 1, channels: [5] },
    ]);
    expect(twice.status).toBe(400);
    expect(twice.json.error.fieldErrors.parts.join(" ")).toMatch(/channel 5 is in part 1 and part 2/);
    expect((await bad([{ part: 21, upTime: 1, channels: [] }])).status).toBe(400);
    expect((await bad([{ part: 1, upTime: "abc", channels: [] }])).json.error.fieldErrors).toHaveProperty([
      "parts.0.upTime",
    ]);
    expect((await bad([{ part: 1, upTime: 1, channels: [0] }])).status).toBe(400);
    expect((await own.get(`${base}/${cue.id}`)).json.cue).toMatchObject({ version: cue.version, parts: [{ part: 2 }] });
  });

  it("answer a stale write with 409 and the current parts", async () => {
    const cue = (await own.get(base)).json.cues[0];
    const stale = await own.patch(`${base}/${cue.id}`, { version: cue.version - 1, parts: [] });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.parts).toEqual(cue.parts);
  });

  it("travel through USITT ASCII (PART records), CSV and Excel", async () => {
    await create(2, { levels: { 1: 0 } });
    const ascii = await (await file("ascii")).text();
    expect(ascii).toContain("PART 2\r\nUP 10 60\r\nDOWN 4 60\r\n"); // from memory: UP time [delay] inside a part
    const before = (await own.get(base)).json.cues;
    const again = await own.post(`${base}/import`, { text: ascii });
    expect(again.status).toBe(200);
    const after = (await own.get(base)).json.cues;
    expect(after.map((c: { parts: unknown }) => c.parts)).toEqual(before.map((c: { parts: unknown }) => c.parts));
    const csv = await (await file("csv")).text();
    expect(csv).toContain("part 2 (sky) 10/4 wait 1:00: ch 2-3");
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(Buffer.from(await (await file("xlsx")).arrayBuffer()) as never);
    const parts = book.getWorksheet("Parts")!;
    expect(parts.getRow(2).values).toEqual([undefined, "1", 2, "sky", 10, 4, 60, "2-3"]);
  });

  it("are the designer's: the stage manager of the demo cannot write them", async () => {
    const sm = await demoSession("stageManager");
    const demo = await demoProductionId(sm);
    const cues = (await sm.get(`/api/productions/${demo}/cues`)).json.cues;
    const r = await sm.patch(`/api/productions/${demo}/cues/${cues[0].id}`, { version: cues[0].version, parts: [] });
    expect(r.status).toBe(403);
    expect(r.json.error.fieldErrors).toHaveProperty("parts");
  });
});

describe("links", () => {
  let ids: Record<number, { id: number; version: number }>;
  beforeAll(async () => {
    const list = (await own.get(base)).json.cues;
    for (const c of list) await own.request("DELETE", `${base}/${c.id}?version=${c.version}`);
    ids = {};
    ids[10] = await create(10, { levels: { 1: 80 }, follow: 2, link: 20 });
    ids[11] = await create(11, { levels: { 2: 60 } });
    ids[20] = await create(20, { levels: { 1: 0 }, upTime: 1, downTime: 6 });
  });

  it("set the running order of the sheet, its standbys and the linked cue's moves", async () => {
    const sheet = (await own.get(`${base}/summary`)).json;
    expect(sheet.rows.map((r: { number: number; reached: boolean }) => [r.number, r.reached])).toEqual([
      [10, true],
      [20, true],
      [11, false],
    ]);
    expect(sheet.standbys[0]).toEqual({ cueIds: [ids[10].id, ids[20].id], label: "10 and 20" });
    expect(sheet.rows[1]).toMatchObject({
      after: 10,
      linked: true,
      startsBy: "follow",
      up: 1,
      down: 1,
      runningTime: 6,
    });
  });

  it("follow a renumber of the linked cue", async () => {
    const r = await own.post(`${base}/renumber`, { from: 20, to: 20, start: 30, step: 1 });
    expect(r.status).toBe(200);
    const cue10 = (await own.get(`${base}/${ids[10].id}`)).json.cue;
    expect(cue10.link).toBe(30);
  });

  it("move once when a renumber shifts a range onto its own numbers", async () => {
    // 10 → 11, 11 → 12: the link 10 → 30 is untouched, and a link to 11 must become 12, not 13.
    const cue30 = (await own.get(`${base}/${ids[20].id}`)).json.cue;
    await own.patch(`${base}/${cue30.id}`, { version: cue30.version, link: 11 });
    const r = await own.post(`${base}/renumber`, { from: 10, to: 11, start: 11, step: 1 });
    expect(r.status).toBe(200);
    expect((await own.get(`${base}/${ids[20].id}`)).json.cue.link).toBe(12);
  });
});

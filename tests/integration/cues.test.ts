// The cue routes over HTTP: roles, validation, optimistic locking, import in one transaction, exports.
import { beforeAll, describe, expect, it } from "vitest";
import { ApiSession, demoProductionId, freshUser } from "./support/api";

const DEMO = {
  designer: "maren.oduya@quillmere.test",
  electrician: "teodor.brask@quillmere.test",
  stageManager: "ines.calloway@quillmere.test",
  viewer: "rafe.lindqvist@quillmere.test",
};

let designer: ApiSession;
let sm: ApiSession;
let viewer: ApiSession;
let pid: number;
let base: string;

beforeAll(async () => {
  designer = await new ApiSession().signIn(DEMO.designer);
  sm = await new ApiSession().signIn(DEMO.stageManager);
  viewer = await new ApiSession().signIn(DEMO.viewer);
  pid = await demoProductionId(designer);
  base = `/api/productions/${pid}/cues`;
});

async function newCue(number: number, body: object = {}) {
  const r = await designer.post(base, { number, ...body });
  expect(r.status).toBe(201);
  return r.json.cue;
}

describe("reading", () => {
  it("lists the demo cues in running order with their moves and the rig's channels", async () => {
    const r = await viewer.get(base);
    expect(r.status).toBe(200);
    const numbers = r.json.cues.map((c: { number: number }) => c.number);
    expect(numbers.length).toBeGreaterThanOrEqual(30);
    expect([...numbers].sort((a, b) => a - b)).toEqual(numbers);
    expect(r.json.channels.length).toBeGreaterThan(0);
  });

  it("gives the stage manager a summary with running times and standbys", async () => {
    const r = await sm.get(`${base}/summary`);
    expect(r.status).toBe(200);
    const row = r.json.rows[3];
    expect(row.summary).toMatch(/up|down|no level changes/);
    expect(row.runningTime).toBeGreaterThanOrEqual(row.upTime);
    expect(r.json.standbys.length).toBeLessThan(r.json.rows.length); // the demo has follows, so some cues share a standby
  });

  it("hides the cues of a production from outsiders (404)", async () => {
    const { session } = await freshUser("cue-outsider");
    expect((await session.get(base)).status).toBe(404);
    expect((await session.get(`${base}/summary`)).status).toBe(404);
  });
});

describe("writing, by role", () => {
  it("lets the designer create a cue with times and levels", async () => {
    const cue = await newCue(901.5, { label: "Test look", upTime: "1:30", downTime: "5.5", levels: { 1: 50, 2: 100 } });
    expect(cue).toMatchObject({ number: 901.5, upTime: 90, downTime: 5.5, levels: { 1: 50, 2: 100 }, version: 1 });
  });

  it("lets the stage manager edit a call note and a page, but not a level or a time", async () => {
    const cue = await newCue(902);
    const ok = await sm.patch(`${base}/${cue.id}`, { version: cue.version, callNote: "GO on the door slam", page: "41" });
    expect(ok.status).toBe(200);
    expect(ok.json.cue).toMatchObject({ callNote: "GO on the door slam", page: "41", version: 2 });
    const level = await sm.patch(`${base}/${cue.id}`, { version: 2, levels: { 5: 80 } });
    expect(level.status).toBe(403);
    expect(level.json.error.fieldErrors).toHaveProperty("levels");
    const time = await sm.patch(`${base}/${cue.id}`, { version: 2, upTime: 3 });
    expect(time.status).toBe(403);
    expect((await sm.post(base, { number: 903 })).status).toBe(403);
  });

  it("refuses every write from a viewer", async () => {
    const cue = await newCue(904);
    expect((await viewer.patch(`${base}/${cue.id}`, { version: cue.version, callNote: "x" })).status).toBe(403);
    expect((await viewer.post(base, { number: 905 })).status).toBe(403);
    expect((await viewer.request("DELETE", `${base}/${cue.id}?version=1`)).status).toBe(403);
  });

  it("answers a stale write with 409 and the current values, and loses nothing", async () => {
    const cue = await newCue(906, { levels: { 3: 40 } });
    const first = await designer.patch(`${base}/${cue.id}`, { version: 1, levels: { 3: 60 } });
    expect(first.status).toBe(200);
    const stale = await sm.patch(`${base}/${cue.id}`, { version: 1, callNote: "late" });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current).toMatchObject({ id: cue.id, version: 2, levels: { 3: 60 }, callNote: null });
    expect((await designer.get(`${base}/${cue.id}`)).json.cue.levels).toEqual({ 3: 60 });
  });

  it("names the field for bad input", async () => {
    const bad = async (body: object) => (await designer.post(base, body)).json.error?.fieldErrors ?? {};
    expect(await bad({ number: 907, levels: { 1: 120 } })).toHaveProperty(["levels.1"]);
    expect(await bad({ number: 907, levels: { 1: -5 } })).toHaveProperty(["levels.1"]);
    expect(await bad({ number: 907, upTime: "abc" })).toHaveProperty("upTime");
    expect(await bad({ number: "x" })).toHaveProperty("number");
    await newCue(908);
    const dup = await designer.post(base, { number: "908.000" });
    expect(dup.status).toBe(400);
    expect(dup.json.error.message).toMatch(/Cue 908 already exists/);
  });

  it("removes a move with null so the channel tracks again", async () => {
    const cue = await newCue(909, { levels: { 7: 30, 8: 40 } });
    const r = await designer.patch(`${base}/${cue.id}`, { version: 1, levels: { 7: null } });
    expect(r.json.cue.levels).toEqual({ 8: 40 });
  });
});

describe("renumbering and import in a production of one's own", () => {
  let own: ApiSession;
  let ownBase: string;
  beforeAll(async () => {
    ({ session: own } = await freshUser("cue-owner"));
    const p = await own.post("/api/productions", { name: "Cue Test Show", venue: "Test Hall", displayUnits: "metric" });
    ownBase = `/api/productions/${p.json.production.id}/cues`;
  });

  const FILE = ["IDENT 3:0", "CUE 1", "TEXT Opening", "UP 5", "CHAN 1@50 2@FL", "CUE 2", "UP 3 1", "DOWN 8", "FOLLOW 2", "CHAN 1@0 2@FL 3@H80", "CUE 3", "CHAN 3@40", "ENDDATA", ""].join("\r\n");

  it("imports a USITT ASCII file, then exports it so it reads back the same", async () => {
    const r = await own.post(`${ownBase}/import`, { text: FILE });
    expect(r.status).toBe(200);
    expect(r.json.imported).toBe(3);
    const list = (await own.get(ownBase)).json.cues;
    expect(list.map((c: { number: number }) => c.number)).toEqual([1, 2, 3]);
    // Full-state reading: cue 3 lists only channel 3, so 2 goes out there (an explicit move to 0).
    expect(list[2].levels).toEqual({ 2: 0, 3: 40 });
    expect(list[1]).toMatchObject({ upTime: 3, delay: 1, downTime: 8, follow: 2, levels: { 1: 0, 3: 50 } });
    const out = await fetch(`${process.env.APP_URL ?? "http://127.0.0.1:3000"}${ownBase}/export?format=ascii`, { headers: { cookie: (own as unknown as { cookie: string }).cookie } });
    const text = await out.text();
    expect(text.startsWith("IDENT 3:0\r\n")).toBe(true);
    const again = await own.post(`${ownBase}/import`, { text });
    expect(again.status).toBe(200);
    expect((await own.get(ownBase)).json.cues.map((c: { levels: object }) => c.levels)).toEqual(list.map((c: { levels: object }) => c.levels));
  });

  it("imports nothing when one line is bad, and names the line", async () => {
    const before = (await own.get(ownBase)).json.cues;
    const bad = FILE.replace("CHAN 3@40", "CHAN 3@120");
    const r = await own.post(`${ownBase}/import`, { text: bad });
    expect(r.status).toBe(400);
    expect(r.json.error.message).toMatch(/Line 12: level 120 for channel 3 is above 100/);
    expect(r.json.error.fieldErrors).toHaveProperty(["line 12"]);
    const truncated = await own.post(`${ownBase}/import`, { text: FILE.replace("ENDDATA\r\n", "") });
    expect(truncated.json.error.message).toMatch(/without ENDDATA/);
    expect((await own.get(ownBase)).json.cues).toEqual(before);
  });

  it("renumbers a range and refuses one that would collide", async () => {
    const ok = await own.post(`${ownBase}/renumber`, { from: 2, to: 3, start: 10, step: 5 });
    expect(ok.status).toBe(200);
    expect((await own.get(ownBase)).json.cues.map((c: { number: number }) => c.number)).toEqual([1, 10, 15]);
    const clash = await own.post(`${ownBase}/renumber`, { from: 10, to: 15, start: 0.5, step: 1 });
    expect(clash.status).toBe(400);
  });

  it("exports CSV with formula cells neutralised, and an Excel workbook", async () => {
    const list = (await own.get(ownBase)).json.cues;
    await own.patch(`${ownBase}/${list[0].id}`, { version: list[0].version, label: "=HYPERLINK(1)" });
    const cookie = (own as unknown as { cookie: string }).cookie;
    const url = `${process.env.APP_URL ?? "http://127.0.0.1:3000"}${ownBase}/export`;
    const csv = await (await fetch(`${url}?format=csv`, { headers: { cookie } })).text();
    expect(csv).toContain("'=HYPERLINK(1)"); // OWASP CSV injection: leading = is neutralised
    const xlsx = await fetch(`${url}?format=xlsx`, { headers: { cookie } });
    expect(xlsx.headers.get("content-type")).toMatch(/spreadsheetml/);
    expect(Buffer.from(await xlsx.arrayBuffer()).subarray(0, 2).toString()).toBe("PK"); // .xlsx is a zip (ECMA-376)
    expect((await fetch(`${url}?format=pdf`, { headers: { cookie } })).status).toBe(400);
  });
});

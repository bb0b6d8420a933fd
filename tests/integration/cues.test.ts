// The cue routes over HTTP: roles, validation, optimistic locking, import in one transaction, exports.
// USITT ASCII details (FOLLOWON, delays on UP and DOWN, Hxx levels) are from memory, as REFERENCE.md says.
import * as mariadb from "mariadb";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type ApiSession, demoProductionId, demoSession, freshUser } from "./support/api";

let designer: ApiSession;
let sm: ApiSession;
let viewer: ApiSession;
let pid: number;
let base: string;

beforeAll(async () => {
  designer = await demoSession("designer");
  sm = await demoSession("stageManager");
  viewer = await demoSession("viewer");
  pid = await demoProductionId(designer);
  base = `/api/productions/${pid}/cues`;
});

// The cues this file adds (numbered from 900 up) go again, so that the file can run twice on one
// database (npm run test:cluster runs it through each of two app servers).
afterAll(async () => {
  const cues: Array<{ id: number; number: number; version: number }> = (await designer.get(base)).json.cues;
  for (const c of cues.filter((c) => c.number >= 900))
    expect((await designer.request("DELETE", `${base}/${c.id}?version=${c.version}`)).status).toBe(200);
});

async function newCue(number: number, body: object = {}) {
  const r = await designer.post(base, { number, ...body });
  expect(r.status).toBe(201);
  return r.json.cue;
}

describe("reading", () => {
  // The demo seeder (seeders/…-demo-production.cjs) makes 30 cues: for i = 0…29 the number is i + 0.5 for
  // i < 2, else i − 1; so 0.5, 1.5, then 1 … 28. Cues this file adds are numbered from 900 up.
  const DEMO_NUMBERS = [0.5, 1, 1.5, ...Array.from({ length: 27 }, (_, k) => k + 2)];

  it("lists the demo cues in running order with their moves and the rig's channels", async () => {
    const r = await viewer.get(base);
    expect(r.status).toBe(200);
    const numbers: number[] = r.json.cues.map((c: { number: number }) => c.number);
    expect(numbers.filter((n) => n < 900)).toEqual(DEMO_NUMBERS);
    // Hand-worked from the seeder: the demo rig has 14 + 14 + 4 + 4 + 20 + 16 + 16 + 10 + 5 + 5 + 4 + 4 = 116
    // units, one channel each, numbered 1–116.
    const channels: number[] = r.json.channels.map((c: { channel: number }) => c.channel);
    expect(channels.length).toBe(116);
    expect(Math.min(...channels)).toBe(1);
    expect(Math.max(...channels)).toBe(116);
  });

  it("gives the stage manager exact running times, move counts and standbys for named demo cues", async () => {
    const r = await sm.get(`${base}/summary`);
    expect(r.status).toBe(200);
    const cue = (n: number) => r.json.rows.find((row: { number: number }) => row.number === n);
    // Cue 0.5 "House to half" (i = 0, first in number order too): up 5 s, down 7 s (i % 4 = 0), no delay. Its
    // moves, from the seeder's formulas with 116 channels: channel 1 + (23k mod 116) at level ((29k) mod 11)·10 for k = 0…5:
    // ch 1 @ 0, 24 @ 70, 47 @ 30, 70 @ 100, 93 @ 60, 116 @ 20. From dark that is 5 channels up and none down,
    // so only the up fade runs: 0 + 5 = 5 s (the 7 s down fade moves nothing). Common practice, no source.
    expect(cue(0.5)).toMatchObject({
      label: "House to half",
      upTime: 5,
      downTime: 7,
      delay: 0,
      up: 5,
      down: 0,
      runningTime: 5,
    });
    expect(cue(0.5).summary).toMatch(/^5 up · from dark · brighter: /);
    const list = (await sm.get(base)).json.cues;
    expect(list.find((c: { number: number }) => c.number === 0.5).levels).toEqual({
      1: 0,
      24: 70,
      47: 30,
      70: 100,
      93: 60,
      116: 20,
    });
    // Cue 1 "Dawn on the harbour" (inserted as i = 2): up 8 s, no down time. The seeder gives levels by the
    // cue's place in number order, j = 1 here (0.5, 1, 1.5, …), for k = 0…6: channel 1 + ((17j + 23k) mod 116)
    // at ((13j + 29k) mod 11)·10 → 18 @ 20, 41 @ 90, 64 @ 50, 87 @ 10, 110 @ 80, 17 @ 40, 40 @ 0. None of these
    // is lit in cue 0.5, so six go up and 40 stays out: 6 up, 0 down, running 0 + 8 = 8 s.
    expect(cue(1)).toMatchObject({
      label: "Dawn on the harbour",
      upTime: 8,
      downTime: null,
      up: 6,
      down: 0,
      runningTime: 8,
      callNote: "Standby on the foghorn",
    });
    expect(cue(1).summary).toMatch(/^6 up · brighter: /);
    expect(list.find((c: { number: number }) => c.number === 1).levels).toEqual({
      17: 40,
      18: 20,
      40: 0,
      41: 90,
      64: 50,
      87: 10,
      110: 80,
    });
    // Cue 7 "Lightning" (i = 8) follows on after 2 s, within the 5 s standby window (Throwline's choice), so
    // it and cue 8 are called as one standby; so are cue 16 (i = 17, follow 2 s) and cue 17.
    const groupOf = (n: number) => r.json.standbys.find((g: { cueIds: number[] }) => g.cueIds.includes(cue(n).id));
    expect(groupOf(7)).toEqual({ cueIds: [cue(7).id, cue(8).id], label: "7 and 8" });
    expect(groupOf(16)).toEqual({ cueIds: [cue(16).id, cue(17).id], label: "16 and 17" });
    expect(groupOf(6).cueIds).toEqual([cue(6).id]);
  });

  it("carries the demo rig's patch in the cue file and as CSV", async () => {
    const url = `${process.env.APP_URL ?? "http://127.0.0.1:3000"}${base}/export`;
    const cookie = viewer.cookie;
    const text = await (await fetch(`${url}?format=ascii`, { headers: { cookie } })).text();
    // Hand-worked from the seeder: channels 1–44 are one-slot units patched 1/1 … 1/44; channel 45 is the first
    // 8-slot LED wash at 1/45, so channel 46 starts at 45 + 8 = 53. PATCH layout from memory.
    expect(text).toMatch(/\r\nPATCH 1 1<1@FL 2<2@FL 3<3@FL /);
    expect(text).toMatch(/[ ]45<45@FL[ \r]/);
    expect(text).toMatch(/[ ]46<53@FL[ \r]/);
    const csv = await (await fetch(`${url}?format=patch`, { headers: { cookie } })).text();
    expect(csv.split("\r\n").slice(0, 2)).toEqual(["Channel,Universe,Address,Absolute address", "1,1,1,1"]);
    expect(csv).toContain("\r\n46,1,53,53\r\n");
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
    const ok = await sm.patch(`${base}/${cue.id}`, {
      version: cue.version,
      callNote: "GO on the door slam",
      page: "41",
    });
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

  it("keeps a down fade's own wait, clears it with null, and names it when it is bad", async () => {
    const cue = await newCue(910, { upTime: 3, downTime: 6, delay: 0, downDelay: "1.5" });
    expect(cue).toMatchObject({ delay: 0, downDelay: 1.5, downTime: 6 });
    const cleared = await designer.patch(`${base}/${cue.id}`, { version: cue.version, downDelay: null });
    expect(cleared.json.cue).toMatchObject({ downDelay: null, version: 2 });
    const bad = await designer.post(base, { number: 911, downDelay: "soon" });
    expect(bad.json.error.fieldErrors).toHaveProperty("downDelay");
    // A down wait is a timing, so the stage manager may not set it (DESIGN.md roles: times are the designer's).
    expect((await sm.patch(`${base}/${cue.id}`, { version: 2, downDelay: 2 })).status).toBe(403);
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
  let ownId: number;
  beforeAll(async () => {
    ({ session: own } = await freshUser("cue-owner"));
    const p = await own.post("/api/productions", { name: "Cue Test Show", venue: "Test Hall", displayUnits: "metric" });
    ownId = p.json.production.id;
    ownBase = `/api/productions/${ownId}/cues`;
  });

  const FILE = [
    "IDENT 3:0",
    "CUE 1",
    "TEXT Opening",
    "UP 5",
    "CHAN 1@50 2@FL",
    "CUE 2",
    "UP 3 1",
    "DOWN 8",
    "FOLLOWON 2",
    "CHAN 1@0 2@FL 3@H80",
    "CUE 3",
    "DOWN 4 2.5",
    "CHAN 3@40",
    "ENDDATA",
    "",
  ].join("\r\n");

  it("imports a USITT ASCII file, then exports it so it reads back the same", async () => {
    const r = await own.post(`${ownBase}/import`, { text: FILE });
    expect(r.status).toBe(200);
    expect(r.json.imported).toBe(3);
    const list = (await own.get(ownBase)).json.cues;
    expect(list.map((c: { number: number }) => c.number)).toEqual([1, 2, 3]);
    // Full-state reading: cue 3 lists only channel 3, so 2 goes out there (an explicit move to 0).
    expect(list[2].levels).toEqual({ 2: 0, 3: 40 });
    // H80 = 128/255 = 50.196 % (from memory), stored as 50; the import says it rounded.
    expect(list[1]).toMatchObject({
      upTime: 3,
      delay: 1,
      downDelay: null,
      downTime: 8,
      follow: 2,
      levels: { 1: 0, 3: 50 },
    });
    expect(r.json.notices).toContainEqual({
      line: 10,
      message:
        "1 level was rounded to whole percentages (Throwline keeps whole percentages), the first on line 10: H80 → 50",
    });
    // `DOWN 4 2.5` with no delay on UP: the down fade waits 2.5 s on its own; the up fade does not wait.
    expect(list[2]).toMatchObject({ delay: 0, downDelay: 2.5, downTime: 4 });
    const out = await fetch(`${process.env.APP_URL ?? "http://127.0.0.1:3000"}${ownBase}/export?format=ascii`, {
      headers: { cookie: own.cookie },
    });
    const text = await out.text();
    expect(text.startsWith("IDENT 3:0\r\n")).toBe(true);
    expect(text).toContain("\r\nFOLLOWON 2\r\n"); // from memory: the standard's follow keyword
    expect(text).toContain("\r\nCUE 3\r\nUP 5\r\nDOWN 4 2.5\r\n");
    const again = await own.post(`${ownBase}/import`, { text });
    expect(again.status).toBe(200);
    const back = (await own.get(ownBase)).json.cues;
    expect(back.map((c: { levels: object }) => c.levels)).toEqual(list.map((c: { levels: object }) => c.levels));
    expect(back.map((c: { downDelay: number | null }) => c.downDelay)).toEqual([null, null, 2.5]);
  });

  it("refuses a file with no cues instead of emptying the list, and keeps what a replacing import removed", async () => {
    const before = (await own.get(ownBase)).json.cues;
    for (const text of ["IDENT 3:0\r\nENDDATA\r\n", "IDENT 3:0\r\n$TL-PAGE 4\r\n$OTHER x\r\nENDDATA\r\n"]) {
      const r = await own.post(`${ownBase}/import`, { text });
      expect(r.status).toBe(400);
      expect(r.json.error.message).toMatch(/holds no cues, so importing it would delete every cue/);
    }
    expect((await own.get(ownBase)).json.cues).toEqual(before);
    // A replacing import logs the cues it replaced, fields, moves and parts, so it can be undone.
    const r = await own.post(`${ownBase}/import`, { text: FILE });
    expect(r.status).toBe(200);
    const u = new URL(process.env.DATABASE_URL!);
    const db = await mariadb.createConnection({
      host: u.hostname,
      port: Number(u.port),
      user: decodeURIComponent(u.username),
      password: decodeURIComponent(u.password),
      database: u.pathname.slice(1),
    });
    try {
      const [row] = await db.query(
        "SELECT `before` FROM change_entries WHERE production_id = ? AND entity = 'cue' ORDER BY id DESC LIMIT 1",
        [ownId],
      );
      const logged = typeof row.before === "string" ? JSON.parse(row.before) : row.before;
      expect(logged.cues).toBe(before.length);
      const strip = ({ id: _i, version: _v, updatedAt: _u, ...c }: Record<string, unknown>) => c;
      expect(logged.replaced).toEqual(before.map(strip));
    } finally {
      await db.end();
    }
  });

  it("exports the patch in the cue file and as CSV", async () => {
    const cookie = own.cookie;
    const url = `${process.env.APP_URL ?? "http://127.0.0.1:3000"}${ownBase}/export`;
    const csv = await fetch(`${url}?format=patch`, { headers: { cookie } });
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-disposition")).toMatch(/Cue-Test-Show-patch\.csv/);
    // A production with no fixtures has an empty patch: the header row only.
    expect(await csv.text()).toBe("Channel,Universe,Address,Absolute address\r\n");
  });

  it("imports nothing when one line is bad, and names the line", async () => {
    const before = (await own.get(ownBase)).json.cues;
    const bad = FILE.replace("CHAN 3@40", "CHAN 3@120");
    const r = await own.post(`${ownBase}/import`, { text: bad });
    expect(r.status).toBe(400);
    expect(r.json.error.message).toMatch(/Line 13: level 120 for channel 3 is above 100/);
    expect(r.json.error.fieldErrors).toHaveProperty(["line 13"]);
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
    const cookie = own.cookie;
    const url = `${process.env.APP_URL ?? "http://127.0.0.1:3000"}${ownBase}/export`;
    const csv = await (await fetch(`${url}?format=csv`, { headers: { cookie } })).text();
    expect(csv).toContain("'=HYPERLINK(1)"); // OWASP CSV injection: leading = is neutralised
    const xlsx = await fetch(`${url}?format=xlsx`, { headers: { cookie } });
    expect(xlsx.headers.get("content-type")).toMatch(/spreadsheetml/);
    expect(
      Buffer.from(await xlsx.arrayBuffer())
        .subarray(0, 2)
        .toString(),
    ).toBe("PK"); // .xlsx is a zip (ECMA-376)
    expect((await fetch(`${url}?format=pdf`, { headers: { cookie } })).status).toBe(400);
  });
});

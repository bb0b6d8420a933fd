// The coverage and shadow studies through the API against MariaDB: a small invented rig whose light is
// worked by hand, the colour list and dimmer curves, acting-area uniformity, face light, shadows, the
// performer-mark and scenery-panel CRUD with versions, the exports and the role rules.
import { describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { type ApiSession, BASE_URL, demoProductionId, demoSession, freshUser } from "./support/api";

const R2 = Math.SQRT2;

/** Unit 1 hangs 5 m over a cell centre (0.05, 2.05) and points straight down; unit 2 is an LED wash far SR. */
async function studied() {
  const { session: s } = await freshUser("studies");
  const id = (await s.post("/api/productions", { name: "Studies test" })).json.production.id as number;
  const p = `/api/productions/${id}`;
  const pos = (
    await s.post(`${p}/positions`, { name: "LX1", kind: "overhead-pipe", x1: -7, y1: 2, x2: 7, y2: 2, trimHeight: 7 })
  ).json.position;
  const profile = (
    await s.post(`${p}/fixture-types`, {
      name: "Test profile",
      family: "profile",
      coneMinDeg: 30,
      coneMaxDeg: 30,
      defaultSoftnessDeg: 5,
      peakCandela: 10_000,
      lensApertureM: 0.15,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).json.fixtureType;
  const led = (
    await s.post(`${p}/fixture-types`, {
      name: "Test LED",
      family: "led-wash",
      coneMinDeg: 30,
      coneMaxDeg: 30,
      defaultSoftnessDeg: 5,
      peakCandela: 10_000,
      lensApertureM: 0.15,
      dmxModes: [{ name: "wide", footprint: 8 }],
    })
  ).json.fixtureType;
  const unit = (
    n: string,
    type: any,
    at: { x: number; y: number; z: number },
    focus: { x: number; y: number },
    extra: object = {},
  ) => ({
    positionId: pos.id,
    fixtureTypeId: type.id,
    unitNumber: n,
    x: at.x,
    y: at.y,
    lensHeight: at.z,
    focusX: focus.x,
    focusY: focus.y,
    coneDeg: 30,
    softnessDeg: 5,
    ...extra,
  });
  const hung = await s.post(`${p}/fixtures`, {
    fixtures: [
      unit("1", profile, { x: 0.05, y: 2.05, z: 5 }, { x: 0.05, y: 2.05 }, { channel: 1, colour: "pale lavender" }),
      unit("2", led, { x: -4.95, y: 2.05, z: 5 }, { x: -4.95, y: 2.05 }, { channel: 2 }),
      // 45° up and 45° off the audience direction from the face at (0.05, 2.05, 1.55), 5 m out in plan
      unit(
        "3",
        profile,
        { x: 0.05 + 5 / R2, y: 2.05 - 5 / R2, z: 6.55 },
        { x: 0.05, y: 2.05 },
        { channel: 3, coneDeg: 40 },
      ),
      // a high steep light and a low front light on the performer at (0.05, 4)
      unit("4", profile, { x: 0.05, y: 3, z: 8 }, { x: 0.05, y: 4 }, { channel: 4 }),
      unit("5", profile, { x: 0.05, y: -6, z: 2.2 }, { x: 0.05, y: 4 }, { channel: 5 }),
    ],
  });
  expect(hung.status).toBe(201);
  return { s, id, p };
}

const coverage = (s: ApiSession, p: string, body: object) =>
  s.post(`${p}/studies/coverage`, { resolution: 0.1, ...body });

function cell(grid: any, x: number, y: number): number {
  const bytes = Buffer.from(grid.values, "base64");
  const values = new Float32Array(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
  const col = Math.round((x - grid.originX) / grid.resolution);
  const row = Math.round((y - grid.originY) / grid.resolution);
  expect(Math.abs(grid.originX + col * grid.resolution - x)).toBeLessThan(1e-9);
  return values[row * grid.cols + col];
}

describe("coverage study", () => {
  it("gives I/h² under a unit at full, the stated tungsten curve at half, linear LED, and the colour's transmission", async () => {
    const { s, p } = await studied();
    const full = await coverage(s, p, { source: { kind: "channels", levels: { "1": 100 } } });
    expect(full.status).toBe(200);
    // 10,000 cd, 5 m straight down → 400 lx (REFERENCE.md, inverse-square law)
    expect(cell(full.json.grid, 0.05, 2.05)).toBeCloseTo(400, 3);
    // the colour is not in the list yet: counted at 100 % and named in a warning
    expect(full.json.warnings.join(" ")).toMatch(/"pale lavender".*100 %/);
    expect(full.json.lights[0].missingColours).toEqual(["pale lavender"]);

    const half = await coverage(s, p, { source: { kind: "channels", levels: { "1": 50, "2": 50 } } });
    // tungsten from memory: light ∝ level^2.3 → 400·0.5^2.3 = 81.2 lx; the LED wash is linear → 200 lx
    expect(cell(half.json.grid, 0.05, 2.05)).toBeCloseTo(400 * 0.5 ** 2.3, 2);
    expect(cell(half.json.grid, -4.95, 2.05)).toBeCloseTo(200, 2);
    expect(half.json.curves).toEqual(["linear", "tungsten"]);

    const added = await s.post(`${p}/studies/colours`, { name: "pale lavender", percent: 60 });
    expect(added.status).toBe(201);
    const tinted = await coverage(s, p, { source: { kind: "channels", levels: { "1": 100 } } });
    expect(cell(tinted.json.grid, 0.05, 2.05)).toBeCloseTo(240, 2); // 400 lx × 60 %
    expect(tinted.json.warnings.join(" ")).not.toMatch(/pale lavender/);
  });

  it("reads a cue's tracked state", async () => {
    const { s, p } = await studied();
    const q1 = (await s.post(`${p}/cues`, { number: 1, levels: { "1": 100 } })).json.cue;
    const q2 = (await s.post(`${p}/cues`, { number: 2, levels: { "2": 100 } })).json.cue;
    const r = await coverage(s, p, { source: { kind: "cue", cueId: q2.id } });
    expect(r.status).toBe(200);
    // channel 1 tracks into cue 2 (tracking), so both pools are up at full
    expect(cell(r.json.grid, 0.05, 2.05)).toBeCloseTo(400, 2);
    expect(cell(r.json.grid, -4.95, 2.05)).toBeCloseTo(400, 2);
    expect(r.json.stateLabel).toMatch(/^Cue 2/);
    expect(q1.id).not.toBe(q2.id);
    const missing = await coverage(s, p, { source: { kind: "cue", cueId: 999_999 } });
    expect(missing.status).toBe(404);
  });

  it("reports each acting area's min, mean, max and uniformity; a dark area gets 0, never a division by zero", async () => {
    const { s, p } = await studied();
    const sq = (cx: number, cy: number, r: number) => [
      { x: cx - r, y: cy - r },
      { x: cx + r, y: cy - r },
      { x: cx + r, y: cy + r },
      { x: cx - r, y: cy + r },
    ];
    await s.post(`${p}/area-zones`, { name: "Centre", polygon: sq(0.05, 2.05, 0.12) }); // 3 × 3 cells
    await s.post(`${p}/area-zones`, { name: "Far corner", polygon: sq(6, 8, 0.5) });
    const r = await coverage(s, p, { source: { kind: "channels", levels: { "1": 100 } } });
    const centre = r.json.areas.find((a: any) => a.name === "Centre");
    const dark = r.json.areas.find((a: any) => a.name === "Far corner");
    expect(centre.count).toBe(9);
    // hand-worked: corners 0.1414 m off the axis → E = I·h/d³ with d² = 25.02; edges d² = 25.01; centre 400 lx (cosine law)
    const e = (d2: number) => (10_000 * 5) / d2 ** 1.5;
    const mean = (400 + 4 * e(25.01) + 4 * e(25.02)) / 9;
    expect(centre.max).toBeCloseTo(400, 2);
    expect(centre.min).toBeCloseTo(e(25.02), 2);
    expect(centre.mean).toBeCloseTo(mean, 2);
    expect(centre.uniformity).toBeCloseTo(e(25.02) / mean, 4); // U0 = Emin/Eavg (EN 12464-1)
    expect(dark.mean).toBe(0);
    expect(dark.uniformity).toBe(0);
    expect(dark.averageToMinimum).toBeNull();
    expect(dark.flags).toEqual(expect.arrayContaining(["uniformity", "dimmer"]));

    const csv = await s.request("POST", `${p}/studies/coverage/areas`, {
      source: { kind: "channels", levels: { "1": 100 } },
      format: "csv",
    });
    expect(csv.status).toBe(200);
    expect(csv.json.raw.split("\n")[0]).toMatch(/^Area,Min \(lx\),Mean \(lx\),Max \(lx\),Uniformity/);
    expect(csv.json.raw).toMatch(/Far corner,0,0,0,0,/);
    const res = await fetch(BASE_URL + `${p}/studies/coverage/areas`, {
      method: "POST",
      headers: { cookie: s.cookie, "content-type": "application/json" },
      body: JSON.stringify({ source: { kind: "channels", levels: { "1": 100 } }, format: "xlsx" }),
    });
    expect(res.headers.get("content-type")).toMatch(/spreadsheetml/);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(await res.arrayBuffer());
    const sheet = book.getWorksheet("Areas")!;
    const names: string[] = [];
    sheet.eachRow((row) => names.push(String(row.getCell(1).value)));
    expect(names).toEqual(expect.arrayContaining(["Centre", "Far corner", "Area"]));
    const bad = await s.post(`${p}/studies/coverage/areas`, { source: { kind: "full" }, format: "pdf" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.error.fieldErrors)).toContain("format");
  });

  it("lights a face by the hand-worked 45° up, 45° off case and names the key", async () => {
    const { s, p } = await studied();
    const r = await coverage(s, p, {
      source: { kind: "channels", levels: { "3": 100 } },
      measure: { kind: "face", facingDeg: -90 },
    });
    expect(r.status).toBe(200);
    expect(r.json.measure).toEqual({ kind: "face", planeHeight: 1.55, facingDeg: -90 });
    // E_v = I·cos(incidence)/d²: S − P = (5/√2, −5/√2, 5), d² = 50, cos = (5/√2)/(5√2) = ½ → 10,000·½/50 = 100 lx
    expect(cell(r.json.grid, 0.05, 2.05)).toBeCloseTo(100, 1);
    const key = new Int32Array(new Uint8Array(Buffer.from(r.json.grid.key, "base64")).buffer);
    const g = r.json.grid;
    const k = Math.round((2.05 - g.originY) / g.resolution) * g.cols + Math.round((0.05 - g.originX) / g.resolution);
    expect(r.json.lights[key[k]].unitLabel).toBe("LX1 3");
    // facing upstage, the same unit is behind the face
    const back = await coverage(s, p, {
      source: { kind: "channels", levels: { "3": 100 } },
      measure: { kind: "face", facingDeg: 90 },
    });
    expect(cell(back.json.grid, 0.05, 2.05)).toBe(0);
  });

  it("refuses a bad request naming the field", async () => {
    const { s, p } = await studied();
    const r = await coverage(s, p, { source: { kind: "channels", levels: { "1": 140 } } });
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.json.error.fieldErrors)).toMatch(/from 0 to 100/);
    const res = await coverage(s, p, { source: { kind: "full" }, resolution: 0.001 });
    expect(res.status).toBe(400);
    expect(res.json.error.fieldErrors.resolution[0]).toMatch(/at least 0.05 m/);
  });
});

describe("shadow study", () => {
  it("a high steep light casts a short, sharp shadow; a low front light throws the head onto the back wall", async () => {
    const { s, p } = await studied();
    const mark = await s.post(`${p}/performer-marks`, { name: "Lead", x: 0.05, y: 4 });
    expect(mark.status).toBe(201);
    expect(mark.json.performerMark).toMatchObject({ height: 1.75, shoulderWidth: 0.5, version: 1 }); // the defaults
    const r = await s.post(`${p}/studies/shadows`, { source: { kind: "channels", levels: { "4": 100, "5": 100 } } });
    expect(r.status).toBe(200);
    const lead = r.json.occluders.find((o: any) => o.name === "Lead");
    const steep = lead.shadows.find((x: any) => x.unitLabel === "LX1 4");
    const low = lead.shadows.find((x: any) => x.unitLabel === "LX1 5");
    // similar triangles (REFERENCE.md shadows): from (y 3, z 8) over the far shoulder top (y 4.25, z 1.75) the tip
    // lands 1.75/6.25 of the edge-to-lens run beyond it: y = 4.25 + 0.28·1.25 = 4.6, so 0.35 m of shadow
    expect(steep.lands).toBe("deck");
    expect(steep.length).toBeCloseTo(0.35, 6);
    expect(steep.penumbraWidth).toBeCloseTo(0.15 * 0.28, 6); // D·b/a with b/a = 0.28
    // from (y −6, z 2.2) over (4.25, 1.75) the ray meets the wall at y 10 first: 1.75 − 0.45·5.75/10.25 = 1.4976 m up
    expect(low.lands).toBe("wall");
    expect(low.wallHeight).toBeCloseTo(1.75 - (0.45 * 5.75) / 10.25, 6);
    expect(low.penumbraWidth).toBeCloseTo(0.15 * (5.75 / 10.25), 6);
    expect(low.penumbraWidth).toBeGreaterThan(steep.penumbraWidth);
    expect(steep.umbra.length).toBeGreaterThanOrEqual(3);
  });

  it("keeps performer marks and panels versioned: a stale write gets 409 with the current row", async () => {
    const { s, p } = await studied();
    const m = (await s.post(`${p}/performer-marks`, { name: "Chorus 1", x: 1, y: 3 })).json.performerMark;
    const moved = await s.patch(`${p}/performer-marks/${m.id}`, { version: m.version, x: 2 });
    expect(moved.status).toBe(200);
    const stale = await s.patch(`${p}/performer-marks/${m.id}`, { version: m.version, x: 3 });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.x).toBe(2);
    const bad = await s.post(`${p}/performer-marks`, { name: "Giant", x: 0, y: 0, height: 9 });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors.height[0]).toMatch(/Performer height must be at most 3 m/);
    const flat = await s.post(`${p}/scenic-panels`, { name: "Flat", x1: 1, y1: 6, x2: 1, y2: 6, height: 3 });
    expect(flat.status).toBe(400);
    const panel = await s.post(`${p}/scenic-panels`, { name: "Wall unit", x1: -2, y1: 6, x2: 2, y2: 6, height: 3 });
    expect(panel.status).toBe(201);
    const list = (await s.get(`${p}/scenic-panels`)).json.scenicPanels;
    expect(list.map((x: any) => x.name)).toEqual(["Wall unit"]);
    const shadows = (await s.post(`${p}/studies/shadows`, { source: { kind: "full" } })).json;
    expect(shadows.occluders.map((o: any) => o.kind)).toEqual(["performer", "panel"]);
  });
});

describe("roles", () => {
  it("every member may run a study; only designers and electricians place performers", async () => {
    const sm = await demoSession("stageManager");
    const id = await demoProductionId(sm);
    const r = await sm.post(`/api/productions/${id}/studies/coverage`, { source: { kind: "full" }, resolution: 0.5 });
    expect(r.status).toBe(200);
    expect(r.json.lights.length).toBeGreaterThan(0);
    const viewer = await demoSession("viewer");
    expect((await viewer.post(`/api/productions/${id}/performer-marks`, { name: "Nope", x: 0, y: 0 })).status).toBe(
      403,
    );
    const { session: outsider } = await freshUser("outsider");
    expect((await outsider.post(`/api/productions/${id}/studies/coverage`, { source: { kind: "full" } })).status).toBe(
      404,
    );
    expect((await sm.get(`/api/productions/${id}/studies/colours`)).status).toBe(200);
  });
});

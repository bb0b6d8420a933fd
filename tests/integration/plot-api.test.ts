// The plot's own routes: acting areas, landmarks, underlay uploads, the change token; and the role rules.
import { describe, expect, it } from "vitest";
import { type ApiSession, BASE_URL, demoProductionId, demoSession, freshUser } from "./support/api";
import { DEMO_FIXTURE_COUNT } from "../support/demo";
import { makePng } from "../support/png";
import { fromPlotFixtureWire } from "@/lib/plot/slim-fixtures";

async function ownProduction() {
  const { session } = await freshUser("plot");
  const id = (await session.post("/api/productions", { name: "Plot test" })).json.production.id as number;
  return { s: session, id };
}

async function upload(s: ApiSession, id: number, bytes: Uint8Array, name: string, type = "image/png") {
  const form = new FormData();
  form.set("file", new Blob([bytes as unknown as ArrayBuffer], { type }), name);
  const res = await fetch(`${BASE_URL}/api/productions/${id}/uploads`, {
    method: "POST",
    body: form,
    headers: { cookie: s.cookie },
  });
  return { status: res.status, json: await res.json() };
}

describe("acting areas", () => {
  it("creates, lists, updates with a version, 409s a stale write, deletes", async () => {
    const { s, id } = await ownProduction();
    const polygon = [
      { x: -2, y: 1 },
      { x: 2, y: 1 },
      { x: 2, y: 4 },
      { x: -2, y: 4 },
    ];
    const made = await s.post(`/api/productions/${id}/area-zones`, { name: "Centre", polygon });
    expect(made.status).toBe(201);
    const zone = made.json.areaZone;
    expect(zone.polygon).toEqual(polygon);
    expect((await s.get(`/api/productions/${id}/area-zones`)).json.areaZones).toHaveLength(1);
    const renamed = await s.patch(`/api/productions/${id}/area-zones/${zone.id}`, {
      version: zone.version,
      name: "Centre stage",
    });
    expect(renamed.json.areaZone.name).toBe("Centre stage");
    const stale = await s.patch(`/api/productions/${id}/area-zones/${zone.id}`, {
      version: zone.version,
      name: "Nope",
    });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.name).toBe("Centre stage");
    expect((await s.request("DELETE", `/api/productions/${id}/area-zones/${zone.id}`)).status).toBe(200);
    expect((await s.get(`/api/productions/${id}/area-zones`)).json.areaZones).toHaveLength(0);
  });

  it("names the field for bad input and saves nothing", async () => {
    const { s, id } = await ownProduction();
    const r = await s.post(`/api/productions/${id}/area-zones`, {
      name: "",
      polygon: [
        { x: 0, y: 0 },
        { x: 500, y: "a" },
      ],
    });
    expect(r.status).toBe(400);
    expect(Object.keys(r.json.error.fieldErrors)).toEqual(expect.arrayContaining(["name", "polygon"]));
    expect((await s.get(`/api/productions/${id}/area-zones`)).json.areaZones).toHaveLength(0);
  });
});

describe("landmarks", () => {
  it("creates a named line and refuses one with both ends together", async () => {
    const { s, id } = await ownProduction();
    const ok = await s.post(`/api/productions/${id}/landmarks`, { name: "lip", x1: -5, y1: -1.5, x2: 5, y2: -1.5 });
    expect(ok.status).toBe(201);
    const dot = await s.post(`/api/productions/${id}/landmarks`, { name: "dot", x1: 1, y1: 1, x2: 1, y2: 1 });
    expect(dot.status).toBe(400);
    expect(dot.json.error.fieldErrors).toHaveProperty("x2");
    const far = await s.post(`/api/productions/${id}/landmarks`, { name: "far", x1: 1, y1: 1, x2: 900, y2: 1 });
    expect(far.status).toBe(400);
    expect(far.json.error.fieldErrors).toHaveProperty("x2");
  });
});

describe("underlay uploads", () => {
  it("stores a PNG (type from its bytes), serves it back, and saves the calibration with a version", async () => {
    const { s, id } = await ownProduction();
    const png = makePng(120, 80);
    const up = await upload(s, id, png, "plan.png");
    expect(up.status).toBe(201);
    const u = up.json.upload;
    expect(u).toMatchObject({ contentType: "image/png", widthPx: 120, heightPx: 80, locked: false });
    const file = await fetch(`${BASE_URL}${u.url}`, { headers: { cookie: s.cookie } });
    expect(file.headers.get("content-type")).toBe("image/png");
    // What is served is the stored copy sharp wrote again (tests/integration/underlay-decode.test.ts).
    expect((await file.arrayBuffer()).byteLength).toBe(u.sizeBytes);
    const cal = await s.patch(`/api/productions/${id}/uploads/${u.id}`, {
      version: u.version,
      metresPerPixel: 0.05,
      offsetX: -3,
      offsetY: 4,
      opacity: 0.3,
      locked: true,
    });
    expect(cal.status).toBe(200);
    expect(cal.json.upload).toMatchObject({
      metresPerPixel: 0.05,
      offsetX: -3,
      offsetY: 4,
      opacity: 0.3,
      locked: true,
    });
    const moveLocked = await s.patch(`/api/productions/${id}/uploads/${u.id}`, {
      version: cal.json.upload.version,
      offsetX: 1,
    });
    expect(moveLocked.status).toBe(400);
    expect(moveLocked.json.error.fieldErrors).toHaveProperty("offsetX");
    const stale = await s.patch(`/api/productions/${id}/uploads/${u.id}`, { version: u.version, opacity: 0.9 });
    expect(stale.status).toBe(409);
    const bad = await s.patch(`/api/productions/${id}/uploads/${u.id}`, {
      version: cal.json.upload.version,
      opacity: 2,
    });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors).toHaveProperty("opacity");
  });

  it("refuses a file that only claims to be a PNG, with a clear message", async () => {
    const { s, id } = await ownProduction();
    const r = await upload(
      s,
      id,
      new TextEncoder().encode("<svg xmlns='http://www.w3.org/2000/svg'></svg>"),
      "sneaky.png",
    );
    expect(r.status).toBe(415);
    expect(r.json.error.message).toMatch(/not a PNG, JPEG or WebP/);
    expect((await s.get(`/api/productions/${id}/uploads`)).json.uploads).toHaveLength(0);
  });

  it("refuses an oversized file", async () => {
    const { s, id } = await ownProduction();
    const big = new Uint8Array(16 * 1024 * 1024);
    big.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    const r = await upload(s, id, big, "huge.png");
    expect(r.status).toBe(413);
    expect(r.json.error.message).toMatch(/limit is 15 MB|larger than the 15 MB/);
  });
});

describe("roles on the plot", () => {
  it("lets every member read the plot but only the designer write it; outsiders get 404", async () => {
    const designer = await demoSession("designer");
    const electrician = await demoSession("electrician");
    const viewer = await demoSession("viewer");
    const id = await demoProductionId(designer);
    const plot = await electrician.get(`/api/productions/${id}/plot`);
    expect(plot.status).toBe(200);
    // Every unit of the rig, whatever other tests have hung since the seed.
    const rig = (await electrician.get(`/api/productions/${id}/fixtures`)).json.fixtures;
    expect(rig.length).toBeGreaterThanOrEqual(DEMO_FIXTURE_COUNT);
    expect(plot.json.fixtures.length).toBe(rig.length);
    expect(typeof plot.json.stamp).toBe("string");
    const f = plot.json.fixtures[0];
    const focus = await electrician.patch(`/api/productions/${id}/fixtures/${f.id}`, {
      version: f.version,
      focusX: 1,
      focusY: 2,
    });
    expect(focus.status).toBe(403);
    expect(
      (
        await electrician.post(`/api/productions/${id}/area-zones`, {
          name: "X",
          polygon: [
            { x: 0, y: 0 },
            { x: 1, y: 0 },
            { x: 1, y: 1 },
          ],
        })
      ).status,
    ).toBe(403);
    expect(
      (await viewer.post(`/api/productions/${id}/landmarks`, { name: "lip", x1: 0, y1: 0, x2: 1, y2: 0 })).status,
    ).toBe(403);
    const { session: outsider } = await freshUser("outsider");
    expect((await outsider.get(`/api/productions/${id}/plot`)).status).toBe(404);
    expect((await upload(outsider, id, makePng(4, 4), "x.png")).status).toBe(404);
  });

  it("moves the change token when something changes (the editor's live update)", async () => {
    const { s, id } = await ownProduction();
    const before = (await s.get(`/api/productions/${id}/plot?only=stamp`)).json.stamp;
    await s.post(`/api/productions/${id}/landmarks`, { name: "header", x1: -5, y1: 0, x2: 5, y2: 0 });
    const after = (await s.get(`/api/productions/${id}/plot?only=stamp`)).json.stamp;
    expect(after).not.toBe(before);
    expect((await s.get(`/api/productions/${id}/plot?only=nonsense`)).status).toBe(400);
  });

  it("answers the editor's slim read: the same units, in the same order, with the same kept values", async () => {
    const viewer = await demoSession("viewer");
    const id = await demoProductionId(viewer);
    const full = (await viewer.get(`/api/productions/${id}/plot`)).json;
    const slim = await viewer.get(`/api/productions/${id}/plot?shape=slim`);
    expect(slim.status).toBe(200);
    const rows = slim.json.fixtures.map(fromPlotFixtureWire);
    expect(rows.map((r: { id: number }) => r.id)).toEqual(full.fixtures.map((f: { id: number }) => f.id));
    const i = full.fixtures.findIndex((f: { focusX: number | null }) => f.focusX !== null);
    expect(rows[i].unitNumber).toBe(full.fixtures[i].unitNumber);
    expect(rows[i].focusX).toBeCloseTo(full.fixtures[i].focusX, 3); // rounded to the millimetre, common practice
    expect(rows[i].version).toBe(full.fixtures[i].version);
    // a fraction of the full read's size
    expect(JSON.stringify(slim.json.fixtures).length).toBeLessThan(JSON.stringify(full.fixtures).length / 4);
    const bad = await viewer.get(`/api/productions/${id}/plot?shape=tiny`);
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.json)).toMatch(/shape/);
  });
});

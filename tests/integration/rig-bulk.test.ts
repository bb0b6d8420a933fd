// Bulk edit of a selection and accessories, through the route handlers.
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession } from "./support/api";
import { fixturesOf, rigProduction, upload } from "./support/rig";

async function withUnits() {
  const p = await rigProduction();
  await upload(
    p.s,
    p.id,
    { name: "u.csv", body: "Position,Unit,Type\nLX1,1,Wash 13\nLX1,2,Wash 13\nLX1,3,Wash 13\nLX1,4,Profile 26\n" },
    { mode: "commit" },
  );
  const fx = await fixturesOf(p.s, p.id);
  return { ...p, fx, items: fx.map((f) => ({ id: f.id, version: f.version })) };
}

describe("bulk edit", () => {
  it("packs addresses by footprint and never straddles slot 512", async () => {
    const { s, id, items } = await withUnits();
    const r = await s.post(`/api/productions/${id}/fixtures/bulk`, {
      items,
      action: { kind: "addresses", universe: 2, address: 487 },
    });
    expect(r.status).toBe(200);
    const fx = await fixturesOf(s, id);
    // ANSI E1.11: 13-slot units at 487 (–499) and 500 (–512); the third would end at 525, so it starts universe 3
    expect(fx.map((f) => [f.universe, f.address])).toEqual([
      [2, 487],
      [2, 500],
      [3, 1],
      [3, 14],
    ]);
  });

  it("numbers channels and sets colour, and a stale version changes nothing", async () => {
    const { s, id, items } = await withUnits();
    expect(
      (
        await s.post(`/api/productions/${id}/fixtures/bulk`, {
          items,
          action: { kind: "channels", start: 101, step: 1 },
        })
      ).status,
    ).toBe(200);
    expect((await fixturesOf(s, id)).map((f) => f.channel)).toEqual([101, 102, 103, 104]);
    const stale = await s.post(`/api/productions/${id}/fixtures/bulk`, {
      items,
      action: { kind: "colour", colour: "pale blue" },
    });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.channel).toBe(101);
    expect((await fixturesOf(s, id)).every((f) => f.colour === null)).toBe(true);
  });

  it("refuses a bad start with the field named, and colour to the electrician", async () => {
    const { s, id, items } = await withUnits();
    const bad = await s.post(`/api/productions/${id}/fixtures/bulk`, {
      items,
      action: { kind: "addresses", universe: 1, address: 513 },
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.error.fieldErrors)).toContain("action.address");
    const el = await demoSession("electrician");
    const demo = await demoProductionId(el);
    const f = (await fixturesOf(el, demo))[0];
    expect(
      (
        await el.post(`/api/productions/${demo}/fixtures/bulk`, {
          items: [{ id: f.id, version: f.version }],
          action: { kind: "colour", colour: "pale blue" },
        })
      ).status,
    ).toBe(403);
  });
});

describe("accessories", () => {
  it("adds, edits with a version and refuses a stale edit or a range past 512", async () => {
    const { s, id, fx } = await withUnits();
    const created = await s.post(`/api/productions/${id}/accessories`, {
      fixtureId: fx[3].id,
      kind: "scroller",
      universe: 1,
      address: 100,
      footprint: 2,
      wattage: 40,
      weightKg: 2.5,
    });
    expect(created.status).toBe(201);
    const a = created.json.accessory;
    const moved = await s.patch(`/api/productions/${id}/accessories/${a.id}`, { version: a.version, address: 200 });
    expect(moved.json.accessory).toMatchObject({ address: 200, version: a.version + 1 });
    expect(
      (await s.patch(`/api/productions/${id}/accessories/${a.id}`, { version: a.version, address: 300 })).status,
    ).toBe(409);
    // ANSI E1.11: a 2-slot device at 512 would need slot 513
    const over = await s.patch(`/api/productions/${id}/accessories/${a.id}`, { version: a.version + 1, address: 512 });
    expect(over.status).toBe(400);
  });

  it("lets the electrician add one and not the viewer", async () => {
    const el = await demoSession("electrician");
    const id = await demoProductionId(el);
    const f = (await fixturesOf(el, id))[0];
    const r = await el.post(`/api/productions/${id}/accessories`, { fixtureId: f.id, kind: "iris" });
    expect(r.status).toBe(201);
    const viewer = await demoSession("viewer");
    expect((await viewer.post(`/api/productions/${id}/accessories`, { fixtureId: f.id, kind: "iris" })).status).toBe(
      403,
    );
  });
});

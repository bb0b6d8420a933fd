// Positions, focus points, fixture types and fixtures through the route handlers.
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession, freshUser } from "./support/api";

async function ownProduction() {
  const { session } = await freshUser("rig");
  const id = (await session.post("/api/productions", { name: "Rig test" })).json.production.id as number;
  return { s: session, id };
}

describe("positions", () => {
  it("creates, renames with a version, and answers a stale rename with 409", async () => {
    const { s, id } = await ownProduction();
    const created = await s.post(`/api/productions/${id}/positions`, {
      name: "1st Electric",
      kind: "overhead-pipe",
      x1: -6,
      y1: 1,
      x2: 6,
      y2: 1,
      trimHeight: 7,
    });
    expect(created.status).toBe(201);
    const pos = created.json.position;
    const renamed = await s.patch(`/api/productions/${id}/positions/${pos.id}`, { version: pos.version, name: "LX1" });
    expect(renamed.json.position.name).toBe("LX1");
    const stale = await s.patch(`/api/productions/${id}/positions/${pos.id}`, { version: pos.version, trimHeight: 8 });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.name).toBe("LX1");
  });

  it("refuses a negative trim and an unknown kind, naming the fields", async () => {
    const { s, id } = await ownProduction();
    const r = await s.post(`/api/productions/${id}/positions`, {
      name: "Bad",
      kind: "rafter",
      x1: 0,
      y1: 0,
      trimHeight: -1,
    });
    expect(r.status).toBe(400);
    expect(Object.keys(r.json.error.fieldErrors)).toEqual(expect.arrayContaining(["kind", "trimHeight"]));
  });

  it("refuses a duplicate position name", async () => {
    const { s, id } = await ownProduction();
    const body = { name: "Boom SL", kind: "boom", x1: 6, y1: 2, trimHeight: 4 };
    expect((await s.post(`/api/productions/${id}/positions`, body)).status).toBe(201);
    const again = await s.post(`/api/productions/${id}/positions`, body);
    expect(again.status).toBe(400);
    expect(again.json.error.fieldErrors).toHaveProperty("name");
  });

  it("does not let the electrician draw positions", async () => {
    const el = await demoSession("electrician");
    const id = await demoProductionId(el);
    const r = await el.post(`/api/productions/${id}/positions`, {
      name: "Rogue",
      kind: "boom",
      x1: 0,
      y1: 0,
      trimHeight: 3,
    });
    expect(r.status).toBe(403);
  });
});

describe("fixtures on a position", () => {
  it("hangs fixtures, aims them at a focus point, and moving the point moves every mark", async () => {
    const { s, id } = await ownProduction();
    const pos = (
      await s.post(`/api/productions/${id}/positions`, {
        name: "FOH",
        kind: "foh-bridge",
        x1: -4,
        y1: -8,
        x2: 4,
        y2: -8,
        trimHeight: 8,
      })
    ).json.position;
    const type = (
      await s.post(`/api/productions/${id}/fixture-types`, {
        name: "Profile 26",
        family: "profile",
        coneMinDeg: 26,
        coneMaxDeg: 26,
        peakCandela: 40000,
        dmxModes: [{ name: "dimmer", footprint: 1 }],
      })
    ).json.fixtureType;
    const point = (await s.post(`/api/productions/${id}/focus-points`, { name: "Area 1", x: 0, y: 2 })).json.focusPoint;
    const hung = await s.post(`/api/productions/${id}/fixtures`, {
      fixtures: [
        { positionId: pos.id, fixtureTypeId: type.id, unitNumber: "1", x: 2, y: -8, focusPointId: point.id },
        { positionId: pos.id, fixtureTypeId: type.id, unitNumber: "2", x: -2, y: -8, focusPointId: point.id },
      ],
    });
    expect(hung.status).toBe(201);
    const throwBefore = hung.json.fixtures[0].computed.throw;
    await s.patch(`/api/productions/${id}/focus-points/${point.id}`, { version: point.version, y: 5 });
    const after = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures;
    for (const f of after) expect(f.computed.focus).toMatchObject({ x: 0, y: 5 });
    expect(after.find((f: any) => f.unitNumber === "1").computed.throw).toBeGreaterThan(throwBefore);
  });

  it("refuses a duplicate unit number on a position and writes none of the batch", async () => {
    const { s, id } = await ownProduction();
    const pos = (
      await s.post(`/api/productions/${id}/positions`, {
        name: "LX2",
        kind: "overhead-pipe",
        x1: -4,
        y1: 3,
        x2: 4,
        y2: 3,
        trimHeight: 7,
      })
    ).json.position;
    const type = (
      await s.post(`/api/productions/${id}/fixture-types`, {
        name: "Wash",
        family: "fresnel",
        coneMinDeg: 15,
        coneMaxDeg: 60,
        peakCandela: 20000,
        dmxModes: [{ name: "dimmer", footprint: 1 }],
      })
    ).json.fixtureType;
    const r = await s.post(`/api/productions/${id}/fixtures`, {
      fixtures: [
        { positionId: pos.id, fixtureTypeId: type.id, unitNumber: "7", x: 0, y: 3 },
        { positionId: pos.id, fixtureTypeId: type.id, unitNumber: "7", x: 1, y: 3 },
      ],
    });
    expect(r.status).toBe(400);
    expect((await s.get(`/api/productions/${id}/fixtures`)).json.fixtures).toHaveLength(0);
  });

  it("refuses a type's cone range that runs backwards", async () => {
    const { s, id } = await ownProduction();
    const r = await s.post(`/api/productions/${id}/fixture-types`, {
      name: "Odd",
      family: "profile",
      coneMinDeg: 50,
      coneMaxDeg: 25,
      peakCandela: 1000,
      dmxModes: [{ name: "d", footprint: 1 }],
    });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("coneMinDeg");
  });
});

describe("deleting plan objects", () => {
  async function smallRig() {
    const { s, id } = await ownProduction();
    const pos = (
      await s.post(`/api/productions/${id}/positions`, {
        name: "LX3",
        kind: "overhead-pipe",
        x1: -4,
        y1: 5,
        x2: 4,
        y2: 5,
        trimHeight: 7,
      })
    ).json.position;
    const type = (
      await s.post(`/api/productions/${id}/fixture-types`, {
        name: "Par",
        family: "par",
        coneMinDeg: 30,
        coneMaxDeg: 30,
        peakCandela: 9000,
        dmxModes: [{ name: "dimmer", footprint: 1 }],
      })
    ).json.fixtureType;
    const point = (await s.post(`/api/productions/${id}/focus-points`, { name: "Area 9", x: 1.5, y: 3 })).json
      .focusPoint;
    await s.post(`/api/productions/${id}/fixtures`, {
      fixtures: [{ positionId: pos.id, fixtureTypeId: type.id, unitNumber: "1", x: 0, y: 5, focusPointId: point.id }],
    });
    return { s, id, pos, type, point };
  }

  it("leaves a fixture's mark where its deleted focus point was", async () => {
    const { s, id, point } = await smallRig();
    expect((await s.request("DELETE", `/api/productions/${id}/focus-points/${point.id}`)).status).toBe(200);
    const [f] = (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures;
    expect(f.focusPointId).toBeNull();
    expect(f.computed.focus).toMatchObject({ x: 1.5, y: 3 });
  });

  it("refuses to delete a type still in use, and deletes it once nothing uses it", async () => {
    const { s, id, pos, type } = await smallRig();
    const refused = await s.request("DELETE", `/api/productions/${id}/fixture-types/${type.id}`);
    expect(refused.status).toBe(400);
    expect(refused.json.error.message).toMatch(/1 fixture uses this type/);
    expect((await s.request("DELETE", `/api/productions/${id}/positions/${pos.id}`)).status).toBe(200);
    expect((await s.get(`/api/productions/${id}/fixtures`)).json.fixtures).toHaveLength(0);
    expect((await s.request("DELETE", `/api/productions/${id}/fixture-types/${type.id}`)).status).toBe(200);
    expect((await s.request("DELETE", `/api/productions/${id}/fixture-types/${type.id}`)).status).toBe(404);
  });

  it("words a duplicate name with the right article", async () => {
    const { s, id } = await ownProduction();
    const polygon = [
      { x: 0, y: 0 },
      { x: 1, y: 0 },
      { x: 1, y: 1 },
    ];
    expect((await s.post(`/api/productions/${id}/area-zones`, { name: "DSC", polygon })).status).toBe(201);
    const again = await s.post(`/api/productions/${id}/area-zones`, { name: "DSC", polygon });
    expect(again.status).toBe(400);
    expect(again.json.error.message).toBe("This production already has an acting area with that name.");
  });
});

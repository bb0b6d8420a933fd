// Fixture types: editing a type's figures per role, and every fixture's computed values following.
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession } from "./support/api";
import { fixturesOf, rigProduction, upload } from "./support/rig";

describe("fixture type figures", () => {
  it("a new cone changes the computed pool of every fixture of the type", async () => {
    const { s, id, profile } = await rigProduction();
    // Straight down from 6 m, so the deck pool is a circle of diameter 2·h·tan(cone/2).
    const csv =
      "Position,Unit,Type,X (m),Y (m),Lens height (m),Focus X (m),Focus Y (m)\nLX1,1,Profile 26,0,1,6,0,1\nLX1,2,Profile 26,2,1,6,2,1\n";
    expect((await upload(s, id, { name: "t.csv", body: csv }, { mode: "commit" })).status).toBe(200);
    const soft = await s.patch(`/api/productions/${id}/fixture-types/${profile.id}`, {
      version: profile.version,
      defaultSoftnessDeg: 0,
    });
    expect(soft.status).toBe(200);
    const before = await fixturesOf(s, id);
    // right-circular cone geometry, from memory: 2 · 6 · tan(13°) = 2.770 m
    for (const f of before) expect(f.computed.deck.widthAcross).toBeCloseTo(2 * 6 * Math.tan((13 * Math.PI) / 180), 2);
    const r = await s.patch(`/api/productions/${id}/fixture-types/${profile.id}`, {
      version: soft.json.fixtureType.version,
      coneMinDeg: 40,
      coneMaxDeg: 40,
    });
    expect(r.status).toBe(200);
    const after = await fixturesOf(s, id);
    // right-circular cone geometry, from memory: 2 · 6 · tan(20°) = 4.368 m
    for (const f of after) expect(f.computed.deck.widthAcross).toBeCloseTo(2 * 6 * Math.tan((20 * Math.PI) / 180), 2);
    const stale = await s.patch(`/api/productions/${id}/fixture-types/${profile.id}`, {
      version: profile.version,
      wattage: 500,
    });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.coneMaxDeg).toBe(40);
  });

  it("the electrician changes wattage but not the cone; a bad figure is a 400 naming the field", async () => {
    const el = await demoSession("electrician");
    const demo = await demoProductionId(el);
    const type = (await el.get(`/api/productions/${demo}/fixture-types`)).json.fixtureTypes[0];
    const ok = await el.patch(`/api/productions/${demo}/fixture-types/${type.id}`, {
      version: type.version,
      wattage: type.wattage + 1,
    });
    expect(ok.status).toBe(200);
    expect(ok.json.fixtureType.wattage).toBe(type.wattage + 1);
    const cone = await el.patch(`/api/productions/${demo}/fixture-types/${type.id}`, {
      version: ok.json.fixtureType.version,
      coneMaxDeg: 50,
    });
    expect(cone.status).toBe(403);
    const bad = await el.patch(`/api/productions/${demo}/fixture-types/${type.id}`, {
      version: ok.json.fixtureType.version,
      weightKg: -3,
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.error.fieldErrors)).toContain("weightKg");
    // put it back for other tests of the demo
    await el.patch(`/api/productions/${demo}/fixture-types/${type.id}`, {
      version: ok.json.fixtureType.version,
      wattage: type.wattage,
    });
  });
});

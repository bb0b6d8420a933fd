// The checks' newer parts through the API against MariaDB: a type's load kind, powered accessories on
// their host's circuit, and the per-unit flags the plot and rig badges read.
import { describe, expect, it } from "vitest";
import { freshUser } from "./support/api";

async function production() {
  const { session: s } = await freshUser("checks-units");
  const id = (await s.post("/api/productions", { name: "Checks units test" })).json.production.id as number;
  const p = `/api/productions/${id}`;
  const { version } = (await s.get(`${p}/checks/settings`)).json.settings;
  await s.patch(`${p}/checks/settings`, { version, electricalCode: "us-nec", supplySystem: "120-208-3ph" });
  const pos = (
    await s.post(`${p}/positions`, {
      name: "2nd electric",
      kind: "overhead-pipe",
      x1: -5,
      y1: 3,
      x2: 5,
      y2: 3,
      trimHeight: 7,
    })
  ).json.position;
  return { s, p, pos };
}

const type = (over: object) => ({
  coneMinDeg: 26,
  coneMaxDeg: 26,
  peakCandela: 30000,
  weightKg: 7,
  dmxModes: [{ name: "dimmer", footprint: 1 }],
  ...over,
});

describe("a type's load kind", () => {
  it("a one-slot LED profile is switch-mode once its type says so, and on a dimmed circuit that is an error", async () => {
    const { s, p, pos } = await production();
    const ledProfile = (
      await s.post(`${p}/fixture-types`, type({ name: "LED profile, one slot", family: "profile", wattage: 200 }))
    ).json.fixtureType;
    expect(ledProfile.loadKind).toBeNull();
    await s.post(`${p}/circuits`, { name: "31", ratingA: 20, phase: "A", power: "dimmed" });
    await s.post(`${p}/fixtures`, {
      fixtures: [{ positionId: pos.id, fixtureTypeId: ledProfile.id, unitNumber: "1", x: 0, y: 3, circuit: "31" }],
    });
    let checks = (await s.get(`${p}/checks`)).json.checks;
    // Unset, a "profile" is read as a lamp: no error, and one slot gives no prompt either
    expect(checks.findings.filter((f: any) => f.severity === "error")).toEqual([]);
    const bad = await s.patch(`${p}/fixture-types/${ledProfile.id}`, { version: ledProfile.version, loadKind: "LED" });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.json)).toMatch(/loadKind/);
    const set = await s.patch(`${p}/fixture-types/${ledProfile.id}`, {
      version: ledProfile.version,
      loadKind: "switch-mode",
    });
    expect(set.status).toBe(200);
    expect(set.json.fixtureType.loadKind).toBe("switch-mode");
    checks = (await s.get(`${p}/checks`)).json.checks;
    const error = checks.findings.find((f: any) => f.severity === "error");
    expect(error.message).toMatch(/set that dimmer to non-dim or use a constant-power circuit/);
    // 200 VA / 120 V = 1.67 A (I = VA / V)
    expect(checks.power.circuits[0].amps).toBeCloseTo(200 / 120, 9);
  });
});

describe("powered accessories", () => {
  it("a 50 VA scroller on a 575 W unit adds to its circuit: 625 / 120 = 5.21 A; one with no wattage is not counted", async () => {
    const { s, p, pos } = await production();
    const lamp = (await s.post(`${p}/fixture-types`, type({ name: "575 W profile", family: "profile", wattage: 575 })))
      .json.fixtureType;
    await s.post(`${p}/circuits`, { name: "12", ratingA: 20, phase: "B", power: "non-dim" });
    const made = await s.post(`${p}/fixtures`, {
      fixtures: ["1", "2"].map((n, i) => ({
        positionId: pos.id,
        fixtureTypeId: lamp.id,
        unitNumber: n,
        x: i,
        y: 3,
        circuit: "12",
      })),
    });
    const [u1, u2] = made.json.fixtures;
    expect((await s.post(`${p}/accessories`, { fixtureId: u1.id, kind: "scroller", wattage: 50 })).status).toBe(201);
    let checks = (await s.get(`${p}/checks`)).json.checks;
    const c12 = checks.power.circuits[0];
    // P = V·I: (2 × 575 W + 50 VA) / 120 V = 10 A
    expect(c12.loadVA).toBe(1200);
    expect(c12.amps).toBeCloseTo(10, 9);
    expect(c12.accessories).toEqual([expect.objectContaining({ fixtureId: u1.id, kind: "scroller", wattage: 50 })]);
    await s.post(`${p}/accessories`, { fixtureId: u2.id, kind: "gobo rotator" });
    await s.post(`${p}/accessories`, { fixtureId: u2.id, kind: "barn doors", weightKg: 1 });
    checks = (await s.get(`${p}/checks`)).json.checks;
    expect(checks.power.circuits[0].loadVA).toBe(1200); // the rotator has no wattage: not counted, not 0 W silently
    expect(checks.power.notCounted).toEqual([{ id: u2.id, label: "gobo rotator on 2 (2nd electric)" }]);
    expect(checks.power.circuits[0].notCounted).toEqual(["gobo rotator on 2 (2nd electric)"]);
  });
});

describe("per-unit flags", () => {
  it("GET checks/units names what is wrong on each unit and the row of the checks page it opens", async () => {
    const { s, p, pos } = await production();
    const lamp = (await s.post(`${p}/fixture-types`, type({ name: "1 kW fresnel", family: "fresnel", wattage: 1000 })))
      .json.fixtureType;
    await s.post(`${p}/circuits`, { name: "40", ratingA: 20, phase: "C", power: "dimmed" });
    const made = await s.post(`${p}/fixtures`, {
      fixtures: ["1", "2", "3"].map((n, i) => ({
        positionId: pos.id,
        fixtureTypeId: lamp.id,
        unitNumber: n,
        x: i,
        y: 3,
        circuit: "40",
        universe: 1,
        address: 10 + i,
      })),
    });
    const ids = made.json.fixtures.map((f: any) => f.id);
    const res = await s.get(`${p}/checks/units`);
    expect(res.status).toBe(200);
    // 3 × 1,000 W / 120 V = 25 A on a 20 A circuit (P = V·I)
    for (const id of ids) {
      expect(res.json.units[id]).toMatchObject({
        severity: "error",
        notes: ["circuit 40 overloaded (25.0 A on 20 A)"],
      });
    }
    expect(res.json.units[ids[0]].unit).toBe("1 (2nd electric)");
    const checks = (await s.get(`${p}/checks`)).json.checks;
    const row = checks.findings.find((f: any) => f.key === res.json.units[ids[0]].findingKey);
    expect(row.subject).toBe("Circuit 40");
    expect(res.json.summary.errors).toBe(checks.summary.errors);
  });
});

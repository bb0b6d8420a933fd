// The checks through the API against MariaDB: circuits and data lines written, the production's
// electrical settings, and the computed power, DMX and rigging results.
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession, freshUser, getBytes } from "./support/api";

async function rigged() {
  const { session: s } = await freshUser("checks");
  const id = (await s.post("/api/productions", { name: "Checks test" })).json.production.id as number;
  const p = `/api/productions/${id}`;
  const pos = (
    await s.post(`${p}/positions`, {
      name: "1st electric",
      kind: "overhead-pipe",
      x1: -5,
      y1: 1,
      x2: 5,
      y2: 1,
      trimHeight: 7,
      ratedLoadKg: 100,
    })
  ).json.position;
  const profile = (
    await s.post(`${p}/fixture-types`, {
      name: "Test profile",
      family: "profile",
      coneMinDeg: 26,
      coneMaxDeg: 26,
      peakCandela: 40000,
      wattage: 750,
      weightKg: 8,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).json.fixtureType;
  const led = (
    await s.post(`${p}/fixture-types`, {
      name: "Test LED wash",
      family: "led-wash",
      coneMinDeg: 20,
      coneMaxDeg: 20,
      peakCandela: 9000,
      wattage: 300,
      weightKg: 10,
      dmxModes: [{ name: "wide", footprint: 16 }],
    })
  ).json.fixtureType;
  expect(profile && led && pos).toBeTruthy();
  return { s, id, p, pos, profile, led };
}

const unit = (pos: any, type: any, n: string, extra: object) => ({
  positionId: pos.id,
  fixtureTypeId: type.id,
  unitNumber: n,
  x: 0,
  y: 1,
  ...extra,
});

describe("electrical settings", () => {
  it("a new production has no code chosen: no continuous limit, the voltage set by hand; choosing the NEC gives 120 V and 80 %", async () => {
    const { s, p } = await rigged();
    const before = (await s.get(`${p}/checks`)).json.checks;
    expect(before.electrical).toMatchObject({ code: "none", derating: null });
    const settings = (await s.get(`${p}/checks/settings`)).json.settings;
    const nec = await s.patch(`${p}/checks/settings`, {
      version: settings.version,
      electricalCode: "us-nec",
      supplySystem: "120-208-3ph",
    });
    expect(nec.status).toBe(200);
    const after = (await s.get(`${p}/checks`)).json.checks;
    expect(after.electrical).toMatchObject({ code: "us-nec", voltage: 120, derating: 0.8, phases: ["A", "B", "C"] }); // NFPA 70 210.20(A)
    // A stale write gets 409 with the current settings
    const stale = await s.patch(`${p}/checks/settings`, { version: settings.version, derating: 0.9 });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.electricalCode).toBe("us-nec");
  });

  it("refuses a voltage of 0 and an unknown code, naming the fields", async () => {
    const { s, p } = await rigged();
    const { version } = (await s.get(`${p}/checks/settings`)).json.settings;
    const r = await s.patch(`${p}/checks/settings`, { version, voltage: 0, electricalCode: "moon" });
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors.voltage[0]).toMatch(/above 0 V/);
    expect(r.json.error.fieldErrors).toHaveProperty("electricalCode");
  });
});

describe("power", () => {
  it("three 750 W lamps on a 20 A circuit at 120 V warn over 80 %; adding an LED unit makes it over its rating and a dimmed-circuit error", async () => {
    const { s, p, pos, profile, led } = await rigged();
    const { version } = (await s.get(`${p}/checks/settings`)).json.settings;
    await s.patch(`${p}/checks/settings`, { version, electricalCode: "us-nec", supplySystem: "120-208-3ph" });
    const batch = await s.post(`${p}/circuits/batch`, {
      circuits: [
        { name: "1", ratingA: 20, phase: "A", power: "dimmed" },
        { name: "2", ratingA: 20, phase: "B", power: "constant" },
      ],
    });
    expect(batch.status).toBe(201);
    expect(batch.json.circuits.map((c: any) => c.name)).toEqual(["1", "2"]);
    await s.post(`${p}/fixtures`, { fixtures: ["1", "2", "3"].map((n) => unit(pos, profile, n, { circuit: "1" })) });
    let checks = (await s.get(`${p}/checks`)).json.checks;
    const c1 = checks.power.circuits.find((c: any) => c.name === "1");
    expect(c1.amps).toBeCloseTo(18.75, 9); // REFERENCE.md: 3 × 750 W on 120 V = 18.75 A
    expect(c1.status).toBe("over-continuous"); // NFPA 70 210.20(A): over 16 A
    expect(checks.power.phases.find((x: any) => x.phase === "A").amps).toBeCloseTo(18.75, 9);
    await s.post(`${p}/fixtures`, { fixtures: [unit(pos, led, "4", { circuit: "1" })] });
    checks = (await s.get(`${p}/checks`)).json.checks;
    const again = checks.power.circuits.find((c: any) => c.name === "1");
    expect(again.amps).toBeCloseTo(2550 / 120, 9); // P = V·I: 3 × 750 + 300 VA
    expect(again.status).toBe("over-rating");
    const errors = checks.findings
      .filter((f: any) => f.severity === "error")
      .map((f: any) => f.message)
      .join("\n");
    expect(errors).toMatch(/set that dimmer to non-dim or use a constant-power circuit/);
    expect(checks.summary.errors).toBeGreaterThanOrEqual(2);
    // Every fixture on the overloaded circuit carries the error badge
    expect(Object.values(checks.fixtureSeverity)).toEqual(["error", "error", "error", "error"]);
  });

  it("a type with no wattage is 'not counted', never a silent 0", async () => {
    const { s, p, pos } = await rigged();
    const bare = (
      await s.post(`${p}/fixture-types`, {
        name: "Unknown unit",
        family: "fresnel",
        coneMinDeg: 20,
        coneMaxDeg: 50,
        peakCandela: 9000,
        dmxModes: [{ name: "dimmer", footprint: 1 }],
      })
    ).json.fixtureType;
    await s.post(`${p}/circuits`, { name: "7", ratingA: 16 });
    await s.post(`${p}/fixtures`, { fixtures: [unit(pos, bare, "1", { circuit: "7" })] });
    const checks = (await s.get(`${p}/checks`)).json.checks;
    expect(checks.power.notCounted).toHaveLength(1);
    expect(checks.power.circuits[0].notCounted).toHaveLength(1);
    expect(checks.rigging.notCounted).toHaveLength(1);
  });

  it("circuits: bad rating refused, stale edit 409 with the current row, a duplicate name in a batch writes none", async () => {
    const { s, p } = await rigged();
    const bad = await s.post(`${p}/circuits`, { name: "9", ratingA: 0 });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors.ratingA[0]).toMatch(/above 0 A/);
    const c = (await s.post(`${p}/circuits`, { name: "9", ratingA: 16, phase: "L1" })).json.circuit;
    expect((await s.patch(`${p}/circuits/${c.id}`, { version: c.version, ratingA: 10 })).status).toBe(200);
    const stale = await s.patch(`${p}/circuits/${c.id}`, { version: c.version, ratingA: 32 });
    expect(stale.status).toBe(409);
    expect(stale.json.error.current.ratingA).toBe(10);
    const dup = await s.post(`${p}/circuits/batch`, {
      circuits: [
        { name: "10", ratingA: 16 },
        { name: "10", ratingA: 16 },
      ],
    });
    expect(dup.status).toBe(400);
    expect(dup.json.error.message).toMatch(/Row 2/);
    expect((await s.get(`${p}/circuits`)).json.circuits.map((x: any) => x.name)).toEqual(["9"]);
    expect((await s.request("DELETE", `${p}/circuits/${c.id}`)).status).toBe(200);
  });
});

describe("DMX", () => {
  it("a 16-slot unit at 500 does not fit; same type and mode at one start is shared; address 0 and 513 are refused at entry", async () => {
    const { s, p, pos, led, profile } = await rigged();
    await s.post(`${p}/fixtures`, {
      fixtures: [
        unit(pos, led, "1", { universe: 1, address: 1 }),
        unit(pos, led, "2", { universe: 1, address: 1 }),
        unit(pos, profile, "3", { universe: 1, address: 10 }),
        unit(pos, led, "4", { universe: 1, address: 12 }),
      ],
    });
    const checks = (await s.get(`${p}/checks`)).json.checks;
    expect(checks.dmx.shared).toHaveLength(1); // units 1 and 2: same type, same mode
    const overlap = checks.findings.filter((f: any) => f.area === "dmx" && f.severity === "error");
    // ANSI E1.11 slots: units 1 and 2 take 1–16, unit 3 slot 10, unit 4 12–27: the shared pair overlaps both
    expect(overlap).toHaveLength(3);
    expect(checks.dmx.universes[0].segments.some((x: any) => x.state === "conflict")).toBe(true);
    // ANSI E1.11: 500 + 16 − 1 = 515 > 512 is refused when entered
    const past = await s.post(`${p}/fixtures`, { fixtures: [unit(pos, led, "5", { universe: 1, address: 500 })] });
    expect(past.status).toBe(400);
    for (const address of [0, 513]) {
      const r = await s.post(`${p}/fixtures`, { fixtures: [unit(pos, led, "6", { universe: 1, address })] });
      expect(r.status, `address ${address}`).toBe(400); // ANSI E1.11: 1–512
      expect(JSON.stringify(r.json.error)).toMatch(/1–512/);
    }
    const noSlots = await s.post(`${p}/fixtures`, {
      fixtures: [unit(pos, profile, "7", { universe: 1, address: 100, footprint: 0 })],
    });
    expect(noSlots.status).toBe(400);
    expect(JSON.stringify(noSlots.json.error)).toMatch(/Footprint must be 1–512 slots/);
    expect((await s.get(`${p}/fixtures`)).json.fixtures.map((f: any) => f.unitNumber).sort()).toEqual([
      "1",
      "2",
      "3",
      "4",
    ]); // nothing half-written
  });

  it("data lines: units in order, the 32-device limit, only this production's fixtures", async () => {
    const { s, p, pos, profile } = await rigged();
    const made = await s.post(`${p}/fixtures`, {
      fixtures: Array.from({ length: 33 }, (_, i) =>
        unit(pos, profile, String(i + 1), { universe: 1, address: i + 1 }),
      ),
    });
    const ids = made.json.fixtures.map((f: any) => f.id);
    const line = await s.post(`${p}/data-lines`, { name: "SL run", universe: 1, fixtureIds: ids.slice(0, 32) });
    expect(line.status).toBe(201);
    let checks = (await s.get(`${p}/checks`)).json.checks;
    expect(checks.dmx.dataLines[0]).toMatchObject({ devices: 32, overLimit: false }); // EIA-485: 32 unit loads (from memory)
    await s.patch(`${p}/data-lines/${line.json.dataLine.id}`, { version: line.json.dataLine.version, fixtureIds: ids });
    checks = (await s.get(`${p}/checks`)).json.checks;
    expect(checks.dmx.dataLines[0]).toMatchObject({ devices: 33, overLimit: true });
    const other = await rigged();
    const foreign = await other.s.post(`${other.p}/data-lines`, { name: "Theirs", fixtureIds: [ids[0]] });
    expect(foreign.status).toBe(400);
    expect(foreign.json.error.fieldErrors).toHaveProperty("fixtureIds");
  });
});

describe("rigging", () => {
  it("weight on a position with cable and hardware, lift lines, and the 80 % warning", async () => {
    const { s, p, pos, profile } = await rigged();
    const { version } = (await s.get(`${p}/checks/settings`)).json.settings;
    await s.patch(`${p}/checks/settings`, { version, cableKgPerM: 1, hardwareKgPerUnit: 1 });
    await s.post(`${p}/fixtures`, {
      fixtures: Array.from({ length: 7 }, (_, i) => unit(pos, profile, String(i + 1), { x: -4.5 + i * 1.5 })),
    });
    const lift = await s.patch(`${p}/checks/positions/${pos.id}`, { version: pos.version, liftLines: 3 });
    expect(lift.status).toBe(200);
    const checks = (await s.get(`${p}/checks`)).json.checks;
    const r = checks.rigging.positions[0];
    // 7 × 8 kg + 10 m × 1 kg/m + 7 × 1 kg = 73 kg of 100 kg (plain sum)
    expect(r.totalKg).toBeCloseTo(73, 9);
    expect(r.status).toBe("ok");
    expect(r.liftLineKg[1]).toBeCloseTo(73 * 0.625, 9); // REFERENCE.md: middle of three lines 62.5 %
    await s.post(`${p}/fixtures`, { fixtures: [unit(pos, profile, "8", { x: 0 })] });
    const near = (await s.get(`${p}/checks`)).json.checks.rigging.positions[0];
    expect(near.totalKg).toBeCloseTo(82, 9);
    expect(near.status).toBe("near"); // warned from 80 %
  });
});

describe("who may", () => {
  it("the viewer reads the checks and the export but writes nothing; outsiders get 404", async () => {
    const viewer = await demoSession("viewer");
    const id = await demoProductionId(viewer);
    const r = await viewer.get(`/api/productions/${id}/checks`);
    expect(r.status).toBe(200);
    expect(r.json.checks.cautions.general[0]).toMatch(/planning aids/);
    expect((await viewer.post(`/api/productions/${id}/circuits`, { name: "V1", ratingA: 10 })).status).toBe(403);
    expect((await viewer.post(`/api/productions/${id}/data-lines`, { name: "V1" })).status).toBe(403);
    const csv = await getBytes(viewer, `/api/productions/${id}/checks/export?format=csv&part=circuits`);
    expect(csv.status).toBe(200);
    expect(csv.bytes.toString("utf8")).toMatch(/Circuit,Phase,Power,Rating A/);
    const xlsx = await getBytes(viewer, `/api/productions/${id}/checks/export?format=xlsx`);
    expect(xlsx.bytes.subarray(0, 2).toString()).toBe("PK");
    const { session: outsider } = await freshUser("outsider");
    expect((await outsider.get(`/api/productions/${id}/checks`)).status).toBe(404);
  });

  it("the electrician adds circuits", async () => {
    const el = await demoSession("electrician");
    const id = await demoProductionId(el);
    const r = await el.post(`/api/productions/${id}/circuits`, {
      name: `E${Date.now() % 100000}`,
      ratingA: 10,
      power: "non-dim",
    });
    expect(r.status).toBe(201);
  });
});

// Benchmark for the checks: all three (DMX, power, rigging) for a production of N fixtures, as the API
// computes them (getChecksReport: the reads plus the pure checks), at 100, 1,500 and 5,000 fixtures with
// universes and circuits in proportion (1,500 fixtures → 48 universes, 600 circuits; a third 16-slot LED units).
// Uses DATABASE_URL when set; otherwise a throwaway MariaDB (migrated, seeded, removed afterwards).
// With APP_URL or a build (BENCH_DIST_DIR) it also times GET /api/productions/[id]/checks over HTTP.
// Each figure is the median of BENCH_REPEAT runs (default 7) after BENCH_WARM runs (default 20) in the same
// process. Goal (issue 15): under 100 ms at 1,500.
// Run with `npm run bench:checks`; figures go to docs/benchmarks.md under "Checks".
import os from "node:os";
import { performance } from "node:perf_hooks";
import { getDb } from "../models";
import { getChecksReport } from "../lib/data/checks";
import { ensureDatabase, ensureServer, stopAll } from "./support/cues-env";

const SIZES = process.env.BENCH_SIZES ? process.env.BENCH_SIZES.split(",").map(Number) : [100, 1500, 5000];
const REPEAT = Number(process.env.BENCH_REPEAT ?? 7);
// A server answers many requests: the figures are a warm process's. The first few dozen runs of the checks
// in a fresh process are several times slower while V8 compiles them (checkPower: ~30 ms cold, ~1 ms warm).
const WARM = Number(process.env.BENCH_WARM ?? 20);
const UNITS_PER_PIPE = 30;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** An invented production of n fixtures: a third 16-slot LED units, the rest 1-slot lamps. */
async function seedProduction(n: number) {
  const { Production, Position, FixtureType, Fixture, Circuit, DataLine, Accessory } = getDb();
  const production = await Production.create({
    name: `Bench checks ${n} ${Date.now()}`,
    venue: "Bench",
    displayUnits: "metric",
    electricalCode: "us-nec",
    supplySystem: "120-208-3ph",
  } as never);
  const productionId = production.id;
  const pipes = Math.ceil(n / UNITS_PER_PIPE);
  const positions = await Position.bulkCreate(
    Array.from({ length: pipes }, (_, p) => ({
      productionId,
      name: `Pipe ${p + 1}`,
      kind: "overhead-pipe" as const,
      x1: -8,
      y1: p,
      x2: 8,
      y2: p,
      trimHeight: 7,
      ratedLoadKg: 250,
      liftLines: 3,
      sortOrder: p,
    })),
  );
  const lamp = await FixtureType.create({
    productionId,
    name: "Lamp profile",
    family: "profile",
    coneMinDeg: 26,
    coneMaxDeg: 26,
    peakCandela: 40000,
    wattage: 750,
    weightKg: 8,
    dmxModes: [{ name: "dimmer", footprint: 1 }],
    frameSize: null,
    goboSize: null,
  });
  const led = await FixtureType.create({
    productionId,
    name: "LED wash",
    family: "led-wash",
    coneMinDeg: 20,
    coneMaxDeg: 20,
    peakCandela: 9000,
    wattage: 300,
    weightKg: 10,
    dmxModes: [{ name: "wide", footprint: 16 }],
    frameSize: null,
    goboSize: null,
  });
  const circuitCount = Math.round(n * 0.4);
  // 1,500 fixtures over 48 universes (issue 15's size), the same density at other sizes.
  const universes = Math.max(1, Math.round((n * 48) / 1500));
  const perUniverse = Math.ceil(n / universes);
  let address = 1;
  const rows = Array.from({ length: n }, (_, i) => {
    const isLed = i % 3 === 0;
    const footprint = isLed ? 16 : 1;
    if (i % perUniverse === 0) address = 1;
    const row = {
      productionId,
      positionId: positions[Math.floor(i / UNITS_PER_PIPE)].id,
      fixtureTypeId: isLed ? led.id : lamp.id,
      unitNumber: String((i % UNITS_PER_PIPE) + 1),
      unitSort: String((i % UNITS_PER_PIPE) + 1).padStart(6, "0"),
      channel: i + 1,
      universe: 1 + Math.floor(i / perUniverse),
      address,
      dmxMode: isLed ? "wide" : "dimmer",
      footprint,
      circuit: String(1 + (i % circuitCount)),
      x: -8 + ((i % UNITS_PER_PIPE) + 0.5) * (16 / UNITS_PER_PIPE),
      y: Math.floor(i / UNITS_PER_PIPE),
    };
    // Every 50th lamp shares the next one's dimmer slot (a deliberate share); every 97th overlaps the next unit (a conflict).
    address += i % 50 === 1 ? 0 : i % 97 === 5 ? Math.max(0, footprint - 1) : footprint;
    return row;
  });
  for (let i = 0; i < rows.length; i += 1000) await Fixture.bulkCreate(rows.slice(i, i + 1000) as never);
  await Circuit.bulkCreate(
    Array.from({ length: circuitCount }, (_, c) => ({
      productionId,
      name: String(c + 1),
      ratingA: 20,
      phase: ["A", "B", "C"][c % 3],
      power: c % 3 === 0 ? ("constant" as const) : ("dimmed" as const),
    })),
  );
  const ids = (await Fixture.findAll({
    raw: true,
    where: { productionId },
    attributes: ["id", "positionId"],
    order: [["id", "ASC"]],
  })) as unknown as { id: number; positionId: number }[];
  await DataLine.bulkCreate(
    positions.map((p) => ({
      productionId,
      name: `${p.name} run`,
      universe: null,
      fixtureIds: ids.filter((f) => f.positionId === p.id).map((f) => f.id),
    })),
  );
  await Accessory.bulkCreate(
    ids
      .filter((_, i) => i % 10 === 0)
      .map((f) => ({
        productionId,
        fixtureId: f.id,
        kind: "scroller",
        universe: null,
        address: null,
        footprint: null,
        wattage: 50,
        weightKg: 2,
      })),
  );
  return { productionId, universes, circuits: circuitCount };
}

async function timeHttp(url: string, productionId: number, path = "checks"): Promise<number | null> {
  // The route needs a signed-in member; the bench signs in as the demo designer and adds itself as owner.
  const { Membership, User } = getDb();
  const demo = await User.findOne({ where: { email: "maren.oduya@quillmere.test" } });
  if (!demo) return null;
  await Membership.findOrCreate({
    where: { userId: demo.id, productionId },
    defaults: { userId: demo.id, productionId, role: "designer", isOwner: true },
  });
  const signIn = await fetch(`${url}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: url },
    body: JSON.stringify({ email: demo.email, password: "lantern-demo-2026" }),
  });
  const cookie = signIn.headers.getSetCookie()[0]?.split(";")[0];
  if (!cookie) return null;
  const times: number[] = [];
  for (let i = 0; i < REPEAT + WARM; i++) {
    const t = performance.now();
    const res = await fetch(`${url}/api/productions/${productionId}/${path}`, { headers: { cookie } });
    await res.arrayBuffer();
    // A build from before the checks existed answers 404: no figure rather than a wrong one.
    if (res.status !== 200) return null;
    if (i >= WARM) times.push(performance.now() - t);
  }
  return median(times);
}

async function main() {
  console.log(
    `bench:checks — ${os.cpus().length} CPUs, load ${os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(" ")}, Node ${process.version}`,
  );
  if ((await ensureDatabase()) === "unavailable") return;
  const url = await ensureServer();
  // Wall time swings with other work on a shared machine; Node's CPU time (reads decoded + checks) much less.
  console.log(
    "fixtures | universes | circuits | report wall ms (reads + checks) | report Node CPU ms | checks only wall ms | HTTP GET checks ms | HTTP GET checks/units ms | findings",
  );
  for (const n of SIZES) {
    const { productionId, universes, circuits } = await seedProduction(n);
    for (let i = 0; i < WARM; i++) await getChecksReport({ productionId }); // warm the pool and the JIT
    const total: number[] = [];
    const cpu: number[] = [];
    const compute: number[] = [];
    let findings = 0;
    for (let i = 0; i < REPEAT; i++) {
      const t = performance.now();
      const c = process.cpuUsage();
      const r = await getChecksReport({ productionId });
      total.push(performance.now() - t);
      const u = process.cpuUsage(c);
      cpu.push((u.user + u.system) / 1000);
      compute.push(r!.computeMs);
      findings = r!.findings.length;
    }
    const http = url ? await timeHttp(url, productionId) : null;
    const httpUnits = url ? await timeHttp(url, productionId, "checks/units") : null;
    const ms = (x: number | null) => (x == null ? "–" : x.toFixed(1));
    console.log(
      `${n} | ${universes} | ${circuits} | ${ms(median(total))} | ${ms(median(cpu))} | ${ms(median(compute))} | ${ms(http)} | ${ms(httpUnits)} | ${findings} | load ${os.loadavg()[0].toFixed(1)}`,
    );
  }
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(async () => {
    if (process.env.DATABASE_URL)
      await getDb()
        .sequelize.close()
        .catch(() => {});
    await stopAll();
  });

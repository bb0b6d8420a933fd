// `npm run bench:load`: the production server under autocannon on loopback, against the same data read by
// the mariadb driver alone plus the same join, optics and JSON (bench/support/load-raw.ts), in one run.
// At 1,500 fixtures: the rig list (with pools), one fixture, an optimistic-locked write, and the cue
// summary at 600 cues × 400 channels. Starts its own MariaDB, build (BENCH_DIST_DIR, default
// .next-bench-load) and `next start`; everything it starts it stops. BENCH_SECONDS sets each run's
// length (default 10); BENCH_PROFILE=<folder> writes the server's CPU profile there (node --cpu-prof).
import { type ChildProcess, spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import { DEMO_PASSWORD, DEMO_USERS } from "../tests/support/demo";
import { seedBenchProduction } from "./plot-seed";
import { summarise } from "./support/numbers";
import { seedBenchCues } from "./support/load-seed";
import { rawReader } from "./support/load-raw";
// @ts-expect-error plain ES modules without types (Node built-ins only, shared with the runners)
import { startMariaDb } from "../scripts/lib/mariadb.mjs";
// @ts-expect-error plain ES modules without types
import { bin, buildIfStale, freePort, migrate, seedWhenEmpty, waitForHttp } from "../scripts/lib/project.mjs";

const FIXTURES = 1500;
const [CUES, CHANNELS] = [600, 400];
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = 10;
const stops: Array<() => Promise<unknown> | unknown> = [];

async function startApp(databaseUrl: string, dir: string) {
  const distDir = process.env.BENCH_DIST_DIR ?? ".next-bench-load";
  const env = {
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: randomBytes(36).toString("base64url"),
    STORAGE_DIR: path.join(dir, "uploads"),
    NEXT_TELEMETRY_DISABLED: "1",
  };
  buildIfStale(distDir, env);
  const port = await freePort();
  const profile = process.env.BENCH_PROFILE;
  const profiling = profile ? ["--cpu-prof", `--cpu-prof-dir=${path.resolve(profile)}`] : [];
  const args = [...profiling, bin("next"), "start", "-p", String(port), "-H", "127.0.0.1"];
  const server: ChildProcess = spawn(process.execPath, args, {
    stdio: ["ignore", "ignore", "inherit"],
    env: { ...process.env, ...env, NEXT_DIST_DIR: distDir, NODE_ENV: "production" },
  });
  stops.push(
    () =>
      new Promise<void>((resolve) => {
        if (server.exitCode !== null) return resolve();
        server.once("exit", () => resolve());
        server.kill("SIGTERM");
      }),
  );
  const url = `http://127.0.0.1:${port}`;
  await waitForHttp(`${url}/api/health`);
  return url;
}

async function signIn(base: string) {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ email: DEMO_USERS.designer, password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}`);
  return res.headers.getSetCookie()[0].split(";")[0];
}

type Cannon = { rps: number; p50: number; p975: number; non2xx: number; errors: number };

async function cannon(opts: autocannon.Options): Promise<Cannon> {
  const r = await autocannon({ connections: CONNECTIONS, duration: SECONDS, ...opts });
  return {
    rps: r.requests.average,
    p50: r.latency.p50,
    p975: r.latency.p97_5,
    non2xx: r.non2xx,
    errors: r.errors + r.timeouts,
  };
}

/** Sequential median of `fn` (ms), after a warm-up. */
async function median(fn: () => Promise<unknown>, n: number) {
  for (let i = 0; i < 3; i++) await fn();
  const t: number[] = [];
  for (let i = 0; i < n; i++) {
    const start = performance.now();
    await fn();
    t.push(performance.now() - start);
  }
  return summarise(t).median;
}

/** Requests a second from `connections` callers of `fn` for the run's length. */
async function throughput(fn: (caller: number) => Promise<unknown>, connections = CONNECTIONS) {
  let done = 0;
  const end = performance.now() + SECONDS * 1000;
  await Promise.all(
    Array.from({ length: connections }, async (_, caller) => {
      while (performance.now() < end) {
        await fn(caller);
        done++;
      }
    }),
  );
  return done / SECONDS;
}

const load = () => os.loadavg()[0].toFixed(1);
const ms = (x: number) => `${x.toFixed(1)} ms`;

async function main() {
  const dir = mkdtempSync(path.join(os.tmpdir(), "throwline-bench-load-"));
  stops.push(() => rmSync(dir, { recursive: true, force: true }));
  const db = await startMariaDb({ dir, port: await freePort(), password: randomBytes(12).toString("hex") });
  stops.push(() => db.stop());
  migrate({ DATABASE_URL: db.url });
  await seedWhenEmpty({ DATABASE_URL: db.url });
  const productionId = await seedBenchProduction(db.url, FIXTURES);
  const levels = await seedBenchCues(db.url, productionId, CUES, CHANNELS);
  const base = await startApp(db.url, dir);
  const cookie = await signIn(base);
  const raw = rawReader(db.url);
  stops.push(() => raw.end());

  const api = `${base}/api/productions/${productionId}`;
  const list = await (await fetch(`${api}/fixtures`, { headers: { cookie } })).json();
  const ids: number[] = list.fixtures.map((f: { id: number }) => f.id);
  if (ids.length !== FIXTURES) throw new Error(`the list has ${ids.length} fixtures, not ${FIXTURES}`);
  const one = ids[Math.floor(ids.length / 2)];
  console.log(
    `bench:load — ${FIXTURES} fixtures, ${CUES} cues × ${CHANNELS} channels (${levels} levels); ${CONNECTIONS} connections, ${SECONDS} s a run; load ${load()} at the start`,
  );

  // The same bytes both ways (pool numbers and all), so the comparison is of equal work.
  const rawBody = JSON.parse(await raw.list(productionId));
  if (JSON.stringify(rawBody.fixtures.map((f: { id: number }) => f.id)) !== JSON.stringify(ids))
    throw new Error("the raw read and the API disagree on the list");

  const headers = { cookie };
  const rows: string[] = [];
  const report = (what: string, app: Cannon, rawRps: number, appMedian: number, rawMedian: number) => {
    const line = `${what}: app ${app.rps.toFixed(0)} req/s (p50 ${app.p50} ms, p97.5 ${app.p975} ms under ${CONNECTIONS} connections; non-2xx ${app.non2xx}, errors ${app.errors}); alone ${ms(appMedian)} median; raw ${rawRps.toFixed(0)} req/s, ${ms(rawMedian)} median; ratio of medians ${(appMedian / rawMedian).toFixed(2)}×; load ${load()}`;
    rows.push(line);
    console.log(line);
  };

  // Medians one request at a time (the ratio), then throughput under CONNECTIONS callers.
  const getList = () => fetch(`${api}/fixtures`, { headers }).then((r) => r.arrayBuffer());
  report(
    "rig list (1,500 with pools)",
    await cannon({ url: `${api}/fixtures`, headers }),
    await throughput(() => raw.list(productionId)),
    await median(getList, 40),
    await median(() => raw.list(productionId), 40),
  );

  const getOne = () => fetch(`${api}/fixtures/${one}`, { headers }).then((r) => r.arrayBuffer());
  report(
    "one fixture",
    await cannon({ url: `${api}/fixtures/${one}`, headers }),
    await throughput(() => raw.one(productionId, one)),
    await median(getOne, 200),
    await median(() => raw.one(productionId, one), 200),
  );

  // Each connection edits its own fixture and carries its version forward, as an editing client does.
  const versions = new Map<number, number>();
  for (const f of list.fixtures as Array<{ id: number; version: number }>) versions.set(f.id, f.version);
  let next = 0;
  const writes = await cannon({
    url: `${api}/fixtures`,
    requests: [
      {
        method: "PATCH",
        setupRequest: (req, context: Record<string, number>) => {
          context.id ??= ids[next++ % ids.length];
          const id = context.id;
          return {
            ...req,
            path: `/api/productions/${productionId}/fixtures/${id}`,
            headers: { cookie, "content-type": "application/json" },
            body: JSON.stringify({ version: versions.get(id), notes: `bench ${Date.now()}` }),
          };
        },
        onResponse: (status, body, context: Record<string, number>) => {
          const json = JSON.parse(body);
          const row = status === 200 ? json.fixture : json.error?.current;
          if (row) versions.set(context.id, row.version);
        },
      },
    ],
  });
  const rawIds = ids.slice(-CONNECTIONS);
  const rawVersions = new Map(rawIds.map((id) => [id, versions.get(id) as number]));
  const rawWrite = (id: number) => async () =>
    rawVersions.set(id, await raw.write(productionId, id, rawVersions.get(id) as number, `raw ${Date.now()}`));
  const patchOne = async () => {
    const id = ids[0];
    const r = await fetch(`${api}/fixtures/${id}`, {
      method: "PATCH",
      headers: { cookie, "content-type": "application/json" },
      body: JSON.stringify({ version: versions.get(id), notes: `alone ${Date.now()}` }),
    });
    versions.set(id, (await r.json()).fixture.version);
  };
  report(
    "optimistic-locked write",
    writes,
    await throughput((caller) => rawWrite(rawIds[caller])()),
    await median(patchOne, 100),
    await median(rawWrite(rawIds[0]), 100),
  );

  const getCues = () => fetch(`${api}/cues/summary`, { headers }).then((r) => r.arrayBuffer());
  const cues = await cannon({ url: `${api}/cues/summary`, headers, connections: 4 });
  const cuesAlone = await median(getCues, 20);
  const line = `cue summary (${CUES} × ${CHANNELS}): app ${cues.rps.toFixed(1)} req/s (p50 ${cues.p50} ms, p97.5 ${cues.p975} ms under 4 connections; non-2xx ${cues.non2xx}); alone ${ms(cuesAlone)} median; load ${load()}`;
  console.log(line);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(async () => {
    for (const stop of stops.reverse()) await stop();
  });

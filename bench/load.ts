// `npm run bench:load`: the production server under autocannon on loopback, against the same data read by
// the mariadb driver alone plus the same join, optics and JSON (bench/support/load-raw.ts), in one run.
// At 1,500 fixtures: the rig list (with pools), one fixture, an optimistic-locked write, and the cue
// summary at 600 cues × 400 channels. Starts its own MariaDB, build (BENCH_DIST_DIR, default
// .next-bench-load) and `next start`; everything it starts it stops. BENCH_SECONDS sets each run's
// length (default 10); BENCH_PROFILE=<folder> writes the server's CPU profile there (node --cpu-prof);
// BENCH_ONLY=one,write runs only some parts. Each run reports the CPU a request took as well as the wall clock.
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
import { treeCpuMs } from "./support/process-cpu";
// @ts-expect-error plain ES modules without types (Node built-ins only, shared with the runners)
import { startMariaDb } from "../scripts/lib/mariadb.mjs";
// @ts-expect-error plain ES modules without types
import { buildIfStale, freePort, migrate, seedWhenEmpty } from "../scripts/lib/project.mjs";
// @ts-expect-error plain ES modules without types
import { startAppServer } from "../scripts/lib/app-server.mjs";

const FIXTURES = 1500;
const [CUES, CHANNELS] = [600, 400];
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = 10;
/** BENCH_ONLY=one,write runs only those parts (list, one, write, cues), e.g. for a profile of one kind. */
const ONLY = new Set((process.env.BENCH_ONLY ?? "list,one,write,cues").split(","));
const stops: Array<() => Promise<unknown> | unknown> = [];
let serverPid = 0;
let dbPid = 0;

/** CPU ms a request: the app server's and MariaDB's, over one run (see support/process-cpu.ts). */
async function cpuPerRequest<T>(run: () => Promise<T>, count: (result: T) => number, ownPid = serverPid) {
  const mine = () =>
    ownPid === process.pid ? process.cpuUsage().user / 1000 + process.cpuUsage().system / 1000 : treeCpuMs(ownPid);
  const [app0, db0] = [mine(), treeCpuMs(dbPid)];
  const result = await run();
  const n = Math.max(1, count(result));
  return { result, app: (mine() - app0) / n, db: (treeCpuMs(dbPid) - db0) / n };
}

async function startApp(databaseUrl: string, dir: string) {
  const distDir = process.env.BENCH_DIST_DIR ?? ".next-bench-load";
  const env = {
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: randomBytes(36).toString("base64url"),
    STORAGE_DIR: path.join(dir, "uploads"),
    NEXT_TELEMETRY_DISABLED: "1",
  };
  buildIfStale(distDir, env);
  const profile = process.env.BENCH_PROFILE;
  return startAppServer({
    distDir,
    env,
    cleanups: stops,
    nodeArgs: profile ? ["--cpu-prof", `--cpu-prof-dir=${path.resolve(profile)}`] : [],
    onStart: (pid: number) => {
      serverPid = pid;
    },
  }) as Promise<string>;
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

type Cannon = { rps: number; p50: number; p975: number; non2xx: number; errors: number; cpu: string };

async function cannon(opts: autocannon.Options): Promise<Cannon> {
  const {
    result: r,
    app,
    db,
  } = await cpuPerRequest(
    () => autocannon({ connections: CONNECTIONS, duration: SECONDS, ...opts }),
    (r) => r.requests.total,
  );
  return {
    rps: r.requests.average,
    p50: r.latency.p50,
    p975: r.latency.p97_5,
    non2xx: r.non2xx,
    errors: r.errors + r.timeouts,
    cpu: `CPU a request: server ${app.toFixed(2)} ms + MariaDB ${db.toFixed(2)} ms`,
  };
}

/** Sequential median of `fn` (ms), after a warm-up; `before` runs untimed ahead of each call. */
async function median(fn: () => Promise<unknown>, n: number, before?: () => Promise<unknown>) {
  for (let i = 0; i < 3; i++) await fn();
  const t: number[] = [];
  for (let i = 0; i < n; i++) {
    await before?.();
    const start = performance.now();
    await fn();
    t.push(performance.now() - start);
  }
  return summarise(t).median;
}

/** Requests a second from `connections` callers of `fn` for the run's length, with the CPU each took. */
async function throughput(fn: (caller: number) => Promise<unknown>, connections = CONNECTIONS) {
  let done = 0;
  const end = performance.now() + SECONDS * 1000;
  const { app, db } = await cpuPerRequest(
    () =>
      Promise.all(
        Array.from({ length: connections }, async (_, caller) => {
          while (performance.now() < end) {
            await fn(caller);
            done++;
          }
        }),
      ),
    () => done,
    process.pid,
  );
  return {
    rps: done / SECONDS,
    cpu: `CPU a request: bench process ${app.toFixed(2)} ms + MariaDB ${db.toFixed(2)} ms`,
  };
}

const load = () => os.loadavg()[0].toFixed(1);
const ms = (x: number) => `${x.toFixed(1)} ms`;

async function main() {
  const dir = mkdtempSync(path.join(os.tmpdir(), "throwline-bench-load-"));
  stops.push(() => rmSync(dir, { recursive: true, force: true }));
  const db = await startMariaDb({ dir, port: await freePort(), password: randomBytes(12).toString("hex") });
  dbPid = db.pid;
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

  // Uncompressed, as the raw path's bytes (fetch would ask for gzip, and Next would pack 3.5 MB each time).
  const headers = { cookie, "accept-encoding": "identity" };
  const rows: string[] = [];
  const report = (
    what: string,
    app: Cannon,
    raw: { rps: number; cpu: string },
    appMedian: number,
    rawMedian: number,
  ) => {
    const line = `${what}: app ${app.rps.toFixed(0)} req/s (p50 ${app.p50} ms, p97.5 ${app.p975} ms under ${CONNECTIONS} connections; non-2xx ${app.non2xx}, errors ${app.errors}; ${app.cpu}); alone ${ms(appMedian)} median; raw ${raw.rps.toFixed(0)} req/s (${raw.cpu}), ${ms(rawMedian)} median; ratio of medians ${(appMedian / rawMedian).toFixed(2)}×; load ${load()}`;
    rows.push(line);
    console.log(line);
  };

  if (ONLY.has("list")) {
    // Medians one request at a time (the ratio), then throughput under CONNECTIONS callers.
    const getList = () => fetch(`${api}/fixtures`, { headers }).then((r) => r.arrayBuffer());
    const rawListMedian = await median(() => raw.list(productionId), 40);
    report(
      "rig list (1,500 with pools; unchanged rig, answer kept)",
      await cannon({ url: `${api}/fixtures`, headers }),
      await throughput(() => raw.list(productionId)),
      await median(getList, 40),
      rawListMedian,
    );
    // The list right after a change (a note written by the driver, untimed, before each read): the server
    // builds it again, so this is the app's whole path against the raw one.
    // (A fixture neither write run below touches: they take the first and the last CONNECTIONS ids.)
    const changing = (list.fixtures as Array<{ id: number; version: number }>)[ids.length - CONNECTIONS - 1];
    let changingVersion = changing.version;
    const changedList = await median(getList, 20, async () => {
      changingVersion = await raw.write(productionId, changing.id, changingVersion, `changed ${Date.now()}`);
    });
    const coldLine = `rig list after each change (built again): alone ${ms(changedList)} median; raw ${ms(rawListMedian)} median; ratio of medians ${(changedList / rawListMedian).toFixed(2)}×; load ${load()}`;
    rows.push(coldLine);
    console.log(coldLine);
    // A client polling with the ETag it holds: 304 and no body while nothing changed.
    const etag = (await fetch(`${api}/fixtures`, { headers })).headers.get("etag") ?? "";
    const polls = await cannon({ url: `${api}/fixtures`, headers: { ...headers, "if-none-match": etag } });
    const pollLine = `rig list polled with its ETag (304): app ${polls.rps.toFixed(0)} req/s (p50 ${polls.p50} ms, p97.5 ${polls.p975} ms; non-2xx ${polls.non2xx} (304s), errors ${polls.errors}; ${polls.cpu}); load ${load()}`;
    rows.push(pollLine);
    console.log(pollLine);
  }

  if (ONLY.has("one")) {
    // The floor under every request: the proxy, Next's routing and one trivial query (no session, no data).
    const floor = await cannon({ url: `${base}/api/health` });
    const floorLine = `floor, GET /api/health (SELECT 1): app ${floor.rps.toFixed(0)} req/s (p50 ${floor.p50} ms, p97.5 ${floor.p975} ms under ${CONNECTIONS} connections; ${floor.cpu}); load ${load()}`;
    rows.push(floorLine);
    console.log(floorLine);
    const getOne = () => fetch(`${api}/fixtures/${one}`, { headers }).then((r) => r.arrayBuffer());
    report(
      "one fixture",
      await cannon({ url: `${api}/fixtures/${one}`, headers }),
      await throughput(() => raw.one(productionId, one)),
      await median(getOne, 200),
      await median(() => raw.one(productionId, one), 200),
    );
  }

  if (ONLY.has("write")) {
    // Each connection edits its own fixture and carries its version forward, as an editing client does.
    // Versions as they are now: the list run above changed a fixture behind the first read's back.
    const current = await (await fetch(`${api}/fixtures`, { headers })).json();
    const versions = new Map<number, number>();
    for (const f of current.fixtures as Array<{ id: number; version: number }>) versions.set(f.id, f.version);
    let next = 0;
    // Any answer but 200 is counted by status and its error code, so a non-2xx in the figures is explained.
    const odd = new Map<string, number>();
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
            if (status !== 200) {
              const key = `${status} ${json.error?.code ?? ""} ${json.error?.message ?? ""}`.trim();
              odd.set(key, (odd.get(key) ?? 0) + 1);
            }
            const row = status === 200 ? json.fixture : json.error?.current;
            if (row) versions.set(context.id, row.version);
          },
        },
      ],
    });
    for (const [answer, n] of odd) console.log(`  write answered ${answer} × ${n}`);
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
  }

  if (ONLY.has("cues")) {
    const getCues = () => fetch(`${api}/cues/summary`, { headers }).then((r) => r.arrayBuffer());
    const cues = await cannon({ url: `${api}/cues/summary`, headers, connections: 4 });
    const cuesAlone = await median(getCues, 20);
    const line = `cue summary (${CUES} × ${CHANNELS}): app ${cues.rps.toFixed(1)} req/s (p50 ${cues.p50} ms, p97.5 ${cues.p975} ms under 4 connections; non-2xx ${cues.non2xx}; ${cues.cpu}); alone ${ms(cuesAlone)} median; load ${load()}`;
    console.log(line);
  }
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(async () => {
    for (const stop of stops.reverse()) await stop();
  });

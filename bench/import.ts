// Benchmark for rig import and export. Uses DATABASE_URL when set; otherwise it starts a
// throwaway MariaDB (scripts/lib/mariadb.mjs), migrates and seeds it, and removes it afterwards. For 100, 1,500 and 5,000 rows: the full import (parse, map,
// validate with zod, plan, one-transaction write with change records) from .csv and from .xlsx, against
// a raw batched INSERT of the same fixture rows through the mariadb driver; and export to .xlsx.
// An update-heavy case re-imports the same rows with every colour changed (all updates), against a raw
// batched UPDATE of the same colours by id. Each figure is the median of BENCH_REPEAT runs (default 3).
// Run with `npm run bench:import`; figures go to docs/benchmarks.md under "Import and export".
import { readdirSync, readFileSync } from "node:fs";
import os from "node:os";
import { performance } from "node:perf_hooks";
import * as mariadb from "mariadb";
import { getDb } from "../models";
import { commitImport, type Progress } from "../lib/data/import";
import { exportRig } from "../lib/data/rig-export";
import { ensureDatabase, stopAll } from "./support/cues-env";
import { writeCsv } from "../lib/io/csv-write";
import { writeXlsx } from "../lib/io/xlsx-write";
import type { SheetOut } from "../lib/io/sheet";
import { unitSortKey } from "../lib/rig/unit-number";

const SIZES = process.env.BENCH_SIZES ? process.env.BENCH_SIZES.split(",").map(Number) : [100, 1500, 5000];
const REPEAT = Number(process.env.BENCH_REPEAT ?? 3);
const POSITIONS = 10;
const designer = { role: "designer" as const, isOwner: true };

function rows(n: number, colourTag = ""): SheetOut {
  const header = [
    "Position",
    "Unit",
    "Type",
    "Channel",
    "Universe",
    "Address",
    "Colour",
    "Purpose",
    "X (m)",
    "Y (m)",
    "Lens height (m)",
    "Hung",
  ];
  const body = Array.from({ length: n }, (_, i) => {
    const p = i % POSITIONS;
    const unit = Math.floor(i / POSITIONS) + 1;
    return [
      `Pipe ${p + 1}`,
      String(unit),
      "Profile 26",
      i + 1,
      Math.floor(i / 512) + 1,
      (i % 512) + 1,
      i % 3 ? `pale blue${colourTag} + light frost` : `N/C${colourTag}`,
      `area ${i % 12}`,
      -8 + (unit % 160) / 10,
      p,
      7 - (i % 5) / 10,
      i % 2 ? "yes" : "no",
    ];
  });
  return { name: "Rig", columns: header.map((h) => ({ header: h, width: 10 })), rows: body };
}

async function freshProduction(userId: number, tag: string) {
  const { Production, Membership, Position, FixtureType } = getDb();
  const production = await Production.create({
    name: `Bench ${tag} ${Date.now()}`,
    venue: "Bench",
    displayUnits: "metric",
  } as never);
  await Membership.create({ userId, productionId: production.id, role: "designer", isOwner: true });
  const positions = await Position.bulkCreate(
    Array.from({ length: POSITIONS }, (_, p) => ({
      productionId: production.id,
      name: `Pipe ${p + 1}`,
      kind: "overhead-pipe" as const,
      x1: -8,
      y1: p,
      x2: 8,
      y2: p,
      trimHeight: 7,
      ratedLoadKg: null,
      sortOrder: p,
    })),
  );
  const type = await FixtureType.create({
    productionId: production.id,
    name: "Profile 26",
    family: "profile",
    coneMinDeg: 26,
    coneMaxDeg: 26,
    peakCandela: 40000,
    dmxModes: [{ name: "dimmer", footprint: 1 }],
    frameSize: "6.25 in",
    goboSize: null,
  });
  return { productionId: production.id, positionIds: positions.map((p) => p.id), typeId: type.id };
}

// On a shared machine wall times swing with other people's work; CPU time (this process plus the
// MariaDB server's, from /proc) swings much less, so every figure is taken both ways. The server is
// found by its --port in /proc/*/cmdline (only when it runs on this machine; otherwise CPU is Node's alone).
function serverPid(port: string): number | null {
  for (const pid of readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    try {
      const cmd = readFileSync(`/proc/${pid}/cmdline`, "utf8").split("\0");
      if (cmd[0].endsWith("mariadbd") && cmd.includes(`--port=${port}`)) return Number(pid);
    } catch {
      // gone, or not ours to read
    }
  }
  return null;
}
const TICK_MS = 10; // USER_HZ is 100 on Linux
function serverCpuMs(pid: number | null) {
  if (!pid) return 0;
  const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
  return (Number(fields[11]) + Number(fields[12])) * TICK_MS; // utime, stime
}
type Timing = { wall: number; cpu: number };
let dbPid: number | null = null;
async function timed<T>(work: () => Promise<T>): Promise<{ value: T } & Timing> {
  const c0 = process.cpuUsage();
  const d0 = serverCpuMs(dbPid);
  const t0 = performance.now();
  const value = await work();
  const wall = performance.now() - t0;
  const c = process.cpuUsage(c0);
  return { value, wall, cpu: (c.user + c.system) / 1000 + serverCpuMs(dbPid) - d0 };
}

type Target = { productionId: number; positionIds: number[]; typeId: number };

async function rawInsert(pool: mariadb.Pool, sheet: SheetOut, target: Target) {
  const values = sheet.rows.map((r) => [
    target.productionId,
    target.positionIds[Number(String(r[0]).slice(5)) - 1],
    target.typeId,
    r[1],
    unitSortKey(String(r[1])),
    r[3],
    r[4],
    r[5],
    r[6],
    r[7],
    r[8],
    r[9],
    r[10],
    r[11] === "yes",
  ]);
  const conn = await pool.getConnection();
  const t = await timed(async () => {
    await conn.beginTransaction();
    await conn.batch(
      "INSERT INTO fixtures (production_id, position_id, fixture_type_id, unit_number, unit_sort, channel, universe, address, colour, purpose, x, y, lens_height, hung, aim, version, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 'deck', 1, NOW(), NOW())",
      values,
    );
    await conn.commit();
  });
  conn.release();
  return t;
}

// The same new colours written by id in one batched UPDATE (no version check, no change records).
async function rawUpdate(pool: mariadb.Pool, sheet: SheetOut, target: Target) {
  const conn = await pool.getConnection();
  const ids = new Map<string, number>(
    (
      await conn.query("SELECT id, position_id, unit_number FROM fixtures WHERE production_id = ?", [
        target.productionId,
      ])
    ).map((f: { id: number; position_id: number; unit_number: string }) => [`${f.position_id}|${f.unit_number}`, f.id]),
  );
  const values = sheet.rows.map((r) => [
    r[6],
    ids.get(`${target.positionIds[Number(String(r[0]).slice(5)) - 1]}|${r[1]}`),
  ]);
  const t = await timed(async () => {
    await conn.beginTransaction();
    await conn.batch("UPDATE fixtures SET colour = ?, version = version + 1, updated_at = NOW() WHERE id = ?", values);
    await conn.commit();
  });
  conn.release();
  return t;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const f0 = (ms: number) => `${Math.round(ms).toLocaleString("en-GB").replace(/,/g, " ")} ms`;
const med = (ts: Timing[]): Timing => ({ wall: median(ts.map((t) => t.wall)), cpu: median(ts.map((t) => t.cpu)) });
const both = (t: Timing) => `${f0(t.wall)} / ${f0(t.cpu)}`;
const ratio = (t: Timing, raw: Timing) =>
  `${both(t)} (${(t.wall / raw.wall).toFixed(1)}× / ${(t.cpu / raw.cpu).toFixed(1)}×)`;

type Stages = { read: Timing; check: Timing; write: Timing };

async function main() {
  if ((await ensureDatabase()) === "unavailable") return;
  const url = process.env.DATABASE_URL!;
  const u = new URL(url);
  dbPid = serverPid(u.port);
  const pool = mariadb.createPool({
    host: u.hostname,
    port: Number(u.port),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.slice(1),
    connectionLimit: 2,
  });
  const { User } = getDb();
  const user = (await User.findOne())!;
  console.log(
    `Rig import/export benchmark — ${new Date().toISOString().slice(0, 16)}Z, ${os.cpus().length} cores, Node ${process.version}, median of ${REPEAT} run(s) per figure`,
  );
  // Warm up: the first run pays for module loading and the connection pool.
  {
    const warm = rows(50);
    const t = await freshProduction(user.id, "warm");
    await commitImport({
      productionId: t.productionId,
      member: designer,
      userId: user.id,
      request: { bytes: Buffer.from(writeCsv(warm)), fileName: "w.csv", createMissing: false },
    });
    await commitImport({
      productionId: t.productionId,
      member: designer,
      userId: user.id,
      request: { bytes: await writeXlsx([rows(50, " w")]), fileName: "w.xlsx", createMissing: false },
    });
  }
  const timeImport = async (
    bytes: Uint8Array,
    name: string,
    productionId: number,
    expect: "create" | "update",
    n: number,
  ) => {
    // Wall and CPU at the first report of each stage, so the split read / check / write can be printed.
    const now = (): Timing => {
      const c = process.cpuUsage();
      return { wall: performance.now(), cpu: (c.user + c.system) / 1000 + serverCpuMs(dbPid) };
    };
    const marks = new Map<string, Timing>();
    const progress: Progress = (stage) => void (marks.has(stage) || marks.set(stage, now()));
    const t = await timed(() =>
      commitImport({
        productionId,
        member: designer,
        userId: user.id,
        request: { bytes, fileName: name, createMissing: false },
        progress,
      }),
    );
    const end = now();
    if (t.value.counts[expect] !== n)
      throw new Error(`${name}: expected ${n} ${expect}s, got ${JSON.stringify(t.value.counts)}`);
    const at = (s: string) => marks.get(s) ?? end;
    const span = (a: Timing, b: Timing): Timing => ({ wall: b.wall - a.wall, cpu: b.cpu - a.cpu });
    return {
      wall: t.wall,
      cpu: t.cpu,
      stages: {
        read: span(at("reading"), at("checking")),
        check: span(at("checking"), at("writing")),
        write: span(at("writing"), end),
      },
    };
  };
  const summary: string[] = [];
  const stageLines: string[] = [];
  for (const n of SIZES) {
    const sheet = rows(n);
    const csv = Buffer.from(writeCsv(sheet));
    const xlsx = await writeXlsx([sheet]);
    const load = os.loadavg()[0];
    const t = {
      raw: [] as Timing[],
      csv: [] as Timing[],
      xlsx: [] as Timing[],
      rawUpd: [] as Timing[],
      upd: [] as Timing[],
      exp: [] as Timing[],
    };
    const st = { csv: [] as Stages[], xlsx: [] as Stages[], upd: [] as Stages[] };
    let kb = 0;
    for (let rep = 0; rep < REPEAT; rep++) {
      // Every rep gives the rows new colours, so the re-import updates every fixture.
      const changed = rows(n, ` r${rep}`);
      const rawTarget = await freshProduction(user.id, `raw ${n}`);
      t.raw.push(await rawInsert(pool, sheet, rawTarget));
      t.rawUpd.push(await rawUpdate(pool, changed, rawTarget));
      const csvProduction = (await freshProduction(user.id, `csv ${n}`)).productionId;
      const c = await timeImport(csv, "rig.csv", csvProduction, "create", n);
      const x = await timeImport(
        xlsx,
        "rig.xlsx",
        (await freshProduction(user.id, `xlsx ${n}`)).productionId,
        "create",
        n,
      );
      t.csv.push(c);
      t.xlsx.push(x);
      st.csv.push(c.stages);
      st.xlsx.push(x.stages);
      // Re-import into the production the .csv went into: every row an update (new colour).
      const upd = await timeImport(Buffer.from(writeCsv(changed)), "rig-changed.csv", csvProduction, "update", n);
      t.upd.push(upd);
      st.upd.push(upd.stages);
      const out = await timed(() => exportRig({ productionId: csvProduction, view: "all", format: "xlsx" }));
      t.exp.push(out);
      kb = out.value.body.length / 1024;
    }
    const raw = med(t.raw);
    const rawUpd = med(t.rawUpd);
    const line = `| ${n.toLocaleString("en-GB")} | ${load.toFixed(1)} | ${both(raw)} | ${ratio(med(t.csv), raw)} | ${ratio(med(t.xlsx), raw)} | ${both(rawUpd)} | ${ratio(med(t.upd), rawUpd)} | ${both(med(t.exp))} (${kb.toFixed(0)} KB) |`;
    console.log(line);
    summary.push(line);
    for (const [name, list] of Object.entries(st)) {
      const m = (k: keyof Stages) => both(med(list.map((s) => s[k])));
      stageLines.push(
        `| ${n.toLocaleString("en-GB")} | ${name === "upd" ? "re-import .csv (updates)" : `.${name}`} | ${m("read")} | ${m("check")} | ${m("write")} |`,
      );
    }
  }
  console.log(
    `\nSummary: median of ${REPEAT}; each cell is wall / CPU (Node + ${dbPid ? "MariaDB server" : "no server CPU: not local"}); × is against the raw INSERT, or the raw UPDATE for the re-import:`,
  );
  console.log(
    "| rows | load avg (1 min) | raw batched INSERT | import .csv (× raw) | import .xlsx (× raw) | raw batched UPDATE | re-import .csv, all updates (× raw UPDATE) | export .xlsx, every column |",
  );
  console.log("|---|---|---|---|---|---|---|---|");
  for (const line of summary) console.log(line);
  console.log("\nStages, wall / CPU (from the first progress report of each; 'write' includes saving the mapping):");
  console.log("| rows | file | read | check | write |");
  console.log("|---|---|---|---|---|");
  for (const line of stageLines) console.log(line);
  await pool.end();
  await getDb().sequelize.close();
  await stopAll();
}

main().catch(async (err) => {
  console.error(err);
  await stopAll();
  process.exit(1);
});

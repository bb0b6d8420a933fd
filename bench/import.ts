// Benchmark for rig import and export (issue 5). Uses DATABASE_URL when set; otherwise it starts a
// throwaway MariaDB (scripts/lib/mariadb.mjs), migrates and seeds it, and removes it afterwards. For 100, 1,500 and 5,000 rows: the full import (parse, map,
// validate with zod, plan, one-transaction write with change records) from .csv and from .xlsx, against
// a raw batched INSERT of the same fixture rows through the mariadb driver; and export to .xlsx.
// Run with `npm run bench:import`; figures go to docs/benchmarks.md under "Import and export".
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
const POSITIONS = 10;
const designer = { role: "designer" as const, isOwner: true };

function rows(n: number): SheetOut {
  const header = ["Position", "Unit", "Type", "Channel", "Universe", "Address", "Colour", "Purpose", "X (m)", "Y (m)", "Lens height (m)", "Hung"];
  const body = Array.from({ length: n }, (_, i) => {
    const p = i % POSITIONS;
    const unit = Math.floor(i / POSITIONS) + 1;
    return [`Pipe ${p + 1}`, String(unit), "Profile 26", i + 1, Math.floor(i / 512) + 1, (i % 512) + 1, i % 3 ? "L201 + #132" : "N/C", `area ${i % 12}`, -8 + (unit % 160) / 10, p, 7 - (i % 5) / 10, i % 2 ? "yes" : "no"];
  });
  return { name: "Rig", columns: header.map((h) => ({ header: h, width: 10 })), rows: body };
}

async function freshProduction(userId: number, tag: string) {
  const { Production, Membership, Position, FixtureType } = getDb();
  const production = await Production.create({ name: `Bench ${tag} ${Date.now()}`, venue: "Bench", displayUnits: "metric" } as never);
  await Membership.create({ userId, productionId: production.id, role: "designer", isOwner: true });
  const positions = await Position.bulkCreate(Array.from({ length: POSITIONS }, (_, p) => ({ productionId: production.id, name: `Pipe ${p + 1}`, kind: "overhead-pipe" as const, x1: -8, y1: p, x2: 8, y2: p, trimHeight: 7, ratedLoadKg: null, sortOrder: p })));
  const type = await FixtureType.create({ productionId: production.id, name: "Profile 26", family: "profile", coneMinDeg: 26, coneMaxDeg: 26, peakCandela: 40000, dmxModes: [{ name: "dimmer", footprint: 1 }], frameSize: "6.25 in", goboSize: null });
  return { productionId: production.id, positionIds: positions.map((p) => p.id), typeId: type.id };
}

async function rawInsert(pool: mariadb.Pool, sheet: SheetOut, target: { productionId: number; positionIds: number[]; typeId: number }) {
  const values = sheet.rows.map((r) => [target.productionId, target.positionIds[Number(String(r[0]).slice(5)) - 1], target.typeId, r[1], unitSortKey(String(r[1])), r[3], r[4], r[5], r[6] === "N/C" ? "N/C" : r[6], r[7], r[8], r[9], r[10], r[11] === "yes"]);
  const conn = await pool.getConnection();
  const t0 = performance.now();
  await conn.beginTransaction();
  await conn.batch(
    "INSERT INTO fixtures (production_id, position_id, fixture_type_id, unit_number, unit_sort, channel, universe, address, colour, purpose, x, y, lens_height, hung, aim, version, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 'deck', 1, NOW(), NOW())",
    values,
  );
  await conn.commit();
  const ms = performance.now() - t0;
  conn.release();
  return ms;
}

async function main() {
  if ((await ensureDatabase()) === "unavailable") return;
  const url = process.env.DATABASE_URL!;
  const u = new URL(url);
  const pool = mariadb.createPool({ host: u.hostname, port: Number(u.port), user: decodeURIComponent(u.username), password: decodeURIComponent(u.password), database: u.pathname.slice(1), connectionLimit: 2 });
  const { User } = getDb();
  const user = (await User.findOne())!;
  console.log(`Rig import/export benchmark — ${new Date().toISOString().slice(0, 10)}, ${os.cpus().length} cores, Node ${process.version}`);
  console.log("rows | raw INSERT | import .csv (× raw) | import .xlsx (× raw) | export .xlsx");
  // Warm up: the first run pays for module loading and the connection pool.
  {
    const warm = rows(50);
    const t = await freshProduction(user.id, "warm");
    await commitImport({ productionId: t.productionId, member: designer, userId: user.id, request: { bytes: Buffer.from(writeCsv(warm)), fileName: "w.csv", createMissing: false } });
  }
  const stages: string[] = [];
  for (const n of SIZES) {
    const sheet = rows(n);
    const csv = Buffer.from(writeCsv(sheet));
    const xlsx = await writeXlsx([sheet]);
    const raw = await rawInsert(pool, sheet, await freshProduction(user.id, `raw ${n}`));
    const timeImport = async (bytes: Uint8Array, name: string) => {
      const t = await freshProduction(user.id, `${name} ${n}`);
      const t0 = performance.now();
      // Time of the first report of each stage, so the split read / check / write can be printed.
      const marks = new Map<string, number>();
      const progress: Progress = (stage) => void (marks.has(stage) || marks.set(stage, performance.now() - t0));
      const r = await commitImport({ productionId: t.productionId, member: designer, userId: user.id, request: { bytes, fileName: name, createMissing: false }, progress });
      if (r.counts.create !== n) throw new Error(`expected ${n} creates, got ${JSON.stringify(r.counts)}`);
      const ms = performance.now() - t0;
      const at = (s: string) => marks.get(s) ?? ms;
      stages.push(`  ${name} ${n}: read ${(at("checking") - at("reading")).toFixed(0)} ms, check ${(at("writing") - at("checking")).toFixed(0)} ms, write ${(ms - at("writing")).toFixed(0)} ms`);
      return { ms, productionId: t.productionId };
    };
    const c = await timeImport(csv, "rig.csv");
    const x = await timeImport(xlsx, "rig.xlsx");
    const t0 = performance.now();
    const out = await exportRig({ productionId: c.productionId, view: "all", format: "xlsx" });
    const exportMs = performance.now() - t0;
    const f = (ms: number) => `${ms.toFixed(0)} ms`;
    console.log(`${n} | ${f(raw)} | ${f(c.ms)} (${(c.ms / raw).toFixed(1)}×) | ${f(x.ms)} (${(x.ms / raw).toFixed(1)}×) | ${f(exportMs)} (${(out.body.length / 1024).toFixed(0)} KB)`);
  }
  console.log("stages (first report of each stage; 'write' includes saving the mapping):");
  for (const line of stages) console.log(line);
  await pool.end();
  await getDb().sequelize.close();
  await stopAll();
}

main().catch(async (err) => {
  console.error(err);
  await stopAll();
  process.exit(1);
});

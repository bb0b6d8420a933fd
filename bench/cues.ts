// Benchmark for the cues (issue 7): the tracked state of every cue in a large show, the summaries,
// and the cue sheet as the API builds it from the database.
// Run: `npm run bench:cues`. The pure part always runs. The database part runs when DATABASE_URL is
// set (e.g. `node scripts/start.mjs --db-only`, then `npm run bench:cues` with .env.local loaded):
// it seeds a throwaway production, times getCueSheet (the summary route's whole work) and deletes it.
// With APP_URL also set and the server running, it times the summary route over HTTP as the demo designer.
import os from "node:os";
import { performance } from "node:perf_hooks";
import { computeTracking, summarizeCue, runningTime, groupStandbys, type CueMoves } from "../lib/cues";

/** Deterministic pseudo-random numbers (mulberry32), so every run times the same show. */
function rng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Sparse moves as in real shows: most cues move 2–20 channels, a few move a third of the rig, some follow. */
function show(cues: number, channels: number, seed = 7) {
  const r = rng(seed);
  return Array.from({ length: cues }, (_, i) => {
    const big = r() < 0.05;
    const count = big ? Math.floor(channels / 3) : 2 + Math.floor(r() * 19);
    const levels: Record<number, number> = {};
    for (let k = 0; k < count; k++) levels[1 + Math.floor(r() * channels)] = Math.round(r() * 10) * 10;
    return { id: i + 1, number: i + 1 + (r() < 0.1 ? 0.5 : 0), block: r() < 0.01, levels, follow: r() < 0.08 ? 2 : null, upTime: 3, downTime: null, delay: 0 };
  });
}

function time(fn: () => void, runs = 20) {
  fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    fn();
    t.push(performance.now() - s);
  }
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(t.length / 2)], p95: t[Math.floor(t.length * 0.95)] };
}

const fmt = (ms: number) => `${ms.toFixed(ms < 10 ? 2 : 1)} ms`;
console.log(`cues benchmark · ${os.cpus().length} cores · Node ${process.version}`);
console.log("\nPure (lib/cues): tracking every cue, then summaries, running times and standbys");
for (const [c, ch] of [[150, 100], [300, 200], [600, 400], [1200, 800]] as const) {
  const s = show(c, ch);
  const info = new Map(Array.from({ length: ch }, (_, i) => [i + 1, { purposes: [`purpose ${i % 12}`], areas: [`Area ${i % 9}`] }]));
  const track = time(() => void computeTracking(s as CueMoves[]));
  const all = time(() => {
    const t = computeTracking(s as CueMoves[]);
    for (let i = 0; i < s.length; i++) runningTime(s[i], summarizeCue(t, i, info));
    groupStandbys(s);
  });
  const moves = s.reduce((n, x) => n + Object.keys(x.levels).length, 0);
  console.log(`  ${c} cues × ${ch} channels (${moves} moves): tracking ${fmt(track.median)} (p95 ${fmt(track.p95)}), with summaries ${fmt(all.median)} (p95 ${fmt(all.p95)})`);
}

async function database() {
  if (!process.env.DATABASE_URL) {
    console.log("\nDATABASE_URL not set: database part skipped.");
    return;
  }
  const { getDb } = await import("../models");
  const { getCueSheet } = await import("../lib/data/cues");
  const db = getDb();
  const s = show(600, 400);
  const production = await db.Production.create({ name: `bench cues ${Date.now()}`, venue: "bench" } as never);
  try {
    const rows = await db.Cue.bulkCreate(s.map((c) => ({ productionId: production.id, number: String(c.number), upTime: 3, follow: c.follow, block: c.block })));
    const levels = rows.flatMap((row, i) => Object.entries(s[i].levels).map(([ch, level]) => ({ cueId: row.id, channel: Number(ch), level })));
    for (let i = 0; i < levels.length; i += 5000) await db.CueLevel.bulkCreate(levels.slice(i, i + 5000));
    console.log(`\nDatabase: seeded 600 cues, ${levels.length} moves (400 channels) in a throwaway production`);
    const samples: number[] = [];
    for (let i = 0; i < 21; i++) {
      const t = performance.now();
      await getCueSheet({ productionId: production.id });
      samples.push(performance.now() - t);
    }
    samples.sort((a, b) => a - b);
    console.log(`  getCueSheet (the summary route's work): median ${fmt(samples[10])}, max ${fmt(samples[20])}`);
    if (process.env.APP_URL) await overHttp(production.id, db);
  } finally {
    await db.Production.destroy({ where: { id: production.id } });
    await db.sequelize.close();
  }
}

/** The summary route over HTTP, as the demo designer made a member of the throwaway production. */
async function overHttp(productionId: number, db: Awaited<ReturnType<typeof import("../models")["getDb"]>>) {
  const base = process.env.APP_URL!;
  const user = await db.User.findOne({ where: { email: "maren.oduya@quillmere.test" } });
  if (!user) return console.log("  (demo designer not found: HTTP part skipped)");
  await db.Membership.create({ userId: user.id, productionId, role: "designer", isOwner: false } as never);
  const signIn = await fetch(`${base}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email: "maren.oduya@quillmere.test", password: "lantern-demo-2026" }) });
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const samples: number[] = [];
  for (let i = 0; i < 21; i++) {
    const t = performance.now();
    const r = await fetch(`${base}/api/productions/${productionId}/cues/summary`, { headers: { cookie } });
    await r.arrayBuffer();
    samples.push(performance.now() - t);
  }
  samples.sort((a, b) => a - b);
  console.log(`  GET /cues/summary over HTTP: median ${fmt(samples[10])}, max ${fmt(samples[20])}`);
}

database().catch((err) => {
  console.error(err);
  process.exit(1);
});

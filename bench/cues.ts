// Benchmark for the cues: the tracked state of every cue in a large show, the cue sheet
// (summaries, running times with parts, links, standbys), and the summary route's work from the
// database and over HTTP.
// Run: `npm run bench:cues`. Nothing needs setting: without DATABASE_URL a throwaway MariaDB is
// started, migrated and seeded (bench/support/cues-env.ts); without APP_URL `next start` runs from
// an existing build (BENCH_DIST_DIR, default .next), or the HTTP part is skipped with a message.
import os from "node:os";
import { performance } from "node:perf_hooks";
import { buildCueSheet, computeTracking, type CueMoves, type SheetCue } from "../lib/cues";
import { DEMO_PASSWORD, DEMO_USERS } from "../tests/support/demo";
import { ensureDatabase, ensureServer, stopAll } from "./support/cues-env";
import { seededRandom, summarise } from "./support/numbers";

/** Sparse moves as in real shows: most cues move 2–20 channels, a few a third of the rig; some follow, some have parts or links. */
function show(cues: number, channels: number, seed = 7): SheetCue[] {
  const r = seededRandom(seed);
  return Array.from({ length: cues }, (_, i) => {
    const big = r() < 0.05;
    const count = big ? Math.floor(channels / 3) : 2 + Math.floor(r() * 19);
    const levels: Record<number, number> = {};
    for (let k = 0; k < count; k++) levels[1 + Math.floor(r() * channels)] = Math.round(r() * 10) * 10;
    const moved = Object.keys(levels).map(Number);
    const parts =
      r() < 0.05
        ? [{ part: 2, upTime: 8, downTime: null, delay: 2, channels: moved.slice(0, Math.ceil(moved.length / 2)) }]
        : [];
    const link = r() < 0.02 && i + 5 < cues ? i + 5 : null;
    return {
      id: i + 1,
      number: i + 1,
      block: r() < 0.01,
      levels,
      follow: r() < 0.08 ? 2 : null,
      link,
      upTime: 3,
      downTime: null,
      delay: 0,
      parts,
    };
  });
}

async function time(fn: () => unknown, runs = 21) {
  await fn(); // warm-up
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    await fn();
    t.push(performance.now() - s);
  }
  return summarise(t);
}

const fmt = (ms: number) => `${ms.toFixed(ms < 10 ? 2 : 1)} ms`;
const line = (s: { median: number; p95: number; max: number }) =>
  `median ${fmt(s.median)}, p95 ${fmt(s.p95)}, max ${fmt(s.max)}`;
const SIZES = [
  [150, 100],
  [300, 200],
  [600, 400],
  [1200, 800],
] as const;

async function pure() {
  console.log(
    "\nPure (lib/cues): tracking every cue; then the whole cue sheet (summaries, running times with parts, links, standbys)",
  );
  for (const [c, ch] of SIZES) {
    const s = show(c, ch);
    const info = new Map(
      Array.from({ length: ch }, (_, i) => [i + 1, { purposes: [`purpose ${i % 12}`], areas: [`Area ${i % 9}`] }]),
    );
    const track = await time(() => computeTracking(s as CueMoves[]));
    const sheet = await time(() => buildCueSheet(s, info));
    const moves = s.reduce((n, x) => n + Object.keys(x.levels).length, 0);
    console.log(`  ${c} cues × ${ch} channels (${moves} moves): tracking ${line(track)}; sheet ${line(sheet)}`);
  }
}

async function database() {
  if ((await ensureDatabase()) === "unavailable") return;
  const { getDb } = await import("../models");
  const { getCueSheet } = await import("../lib/data/cues");
  const db = getDb();
  const made: number[] = [];
  try {
    const server = await ensureServer();
    for (const [c, ch] of SIZES.slice(1)) {
      const s = show(c, ch);
      const production = await db.Production.create({
        name: `bench cues ${c}x${ch} ${Date.now()}`,
        venue: "bench",
      } as never);
      made.push(production.id);
      const rows = await db.Cue.bulkCreate(
        s.map((q) => ({
          productionId: production.id,
          number: String(q.number),
          upTime: 3,
          follow: q.follow,
          block: q.block,
          link: q.link == null ? null : String(q.link),
        })),
      );
      const levels = rows.flatMap((row, i) =>
        Object.entries(s[i].levels).map(([chan, level]) => ({ cueId: row.id, channel: Number(chan), level })),
      );
      for (let i = 0; i < levels.length; i += 5000) await db.CueLevel.bulkCreate(levels.slice(i, i + 5000));
      await db.CuePart.bulkCreate(
        rows.flatMap((row, i) => s[i].parts.map((p) => ({ cueId: row.id, ...p, channels: [...p.channels] }))),
      );
      console.log(`\n${c} cues × ${ch} channels from the database (${levels.length} moves):`);
      console.log(
        `  getCueSheet (the summary route's whole work): ${line(await time(() => getCueSheet({ productionId: production.id }), 41))}`,
      );
      if (server)
        console.log(
          `  GET /cues/summary over HTTP as the designer: ${line(await overHttp(server, production.id, db))}`,
        );
    }
  } finally {
    if (made.length) await db.Production.destroy({ where: { id: made } });
    await db.sequelize.close();
  }
}

/** The summary route over HTTP, as the demo designer made a member of the throwaway production. */
async function overHttp(base: string, productionId: number, db: ReturnType<typeof import("../models")["getDb"]>) {
  const user = await db.User.findOne({ where: { email: DEMO_USERS.designer } });
  if (!user) throw new Error("the demo designer is not in this database (seed it, or use the throwaway one)");
  await db.Membership.create({ userId: user.id, productionId, role: "designer", isOwner: false } as never);
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ email: DEMO_USERS.designer, password: DEMO_PASSWORD }),
  });
  const cookie = signIn.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  return time(async () => {
    const r = await fetch(`${base}/api/productions/${productionId}/cues/summary`, { headers: { cookie } });
    if (!r.ok) throw new Error(`summary answered ${r.status}`);
    await r.arrayBuffer();
  }, 41);
}

console.log(
  `cues benchmark · ${new Date().toISOString().slice(0, 10)} · ${os.cpus().length} cores · Node ${process.version}`,
);
pure()
  .then(database)
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(stopAll);

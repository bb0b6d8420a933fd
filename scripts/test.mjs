// `npm test`: the whole suite from a fresh clone. Starts its own throwaway MariaDB (own port and
// folder, removed afterwards), migrates and seeds it, runs the unit suite, builds the app, starts it,
// runs the integration suite (through the route handlers over HTTP) and the end-to-end suite in
// Debian's Chromium, and ends with one plain line: `N passed, N failed`.
import { spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdirSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { cleanupList } from "./lib/cleanups.mjs";
import { ensurePackages, log } from "./lib/system.mjs";
import { ensureNodeModules } from "./lib/node-modules.mjs";
import { startMariaDb, stopRunningMariaDb } from "./lib/mariadb.mjs";
import { ROOT, buildIfStale, freePort, migrate, seedWhenEmpty } from "./lib/project.mjs";
import { startMailStandIn } from "./lib/mail-stand-in.mjs";
import { startS3StandIn } from "./lib/s3-stand-in.mjs";
import { newTotals, runVitestSuite } from "./lib/vitest-run.mjs";
import { startAppServer } from "./lib/app-server.mjs";

// `npm test -- cues plot` runs only test files whose path contains one of the words (still all three
// suites). TEST_DIST_DIR and TEST_RESULTS_DIR let several runs share one checkout without colliding.
const FILTERS = process.argv.slice(2).filter((a) => !a.startsWith("-"));
const RESULTS = path.resolve(ROOT, process.env.TEST_RESULTS_DIR ?? "test-results");
const DIST_DIR = process.env.TEST_DIST_DIR ?? ".next-test";
const cleanups = cleanupList();
const totals = newTotals();

/** Test files under a folder, narrowed to the FILTERS words when given. */
function testFiles(dir) {
  const files = readdirSync(path.join(ROOT, dir), { recursive: true })
    .map((f) => path.join(dir, String(f)))
    .filter((f) => f.endsWith(".test.ts"));
  return FILTERS.length ? files.filter((f) => FILTERS.some((w) => f.includes(w))) : [dir];
}

function runVitest(name, configFile, dir, env) {
  return runVitestSuite({ name, configFile, files: testFiles(dir), env, resultsDir: RESULTS, totals });
}

/** Biome (format + lint, one config in biome.json) over the whole tree counts as one test; it runs first. */
function lint() {
  log("Format and lint (biome check) …");
  const r = spawnSync(
    process.execPath,
    [path.join(ROOT, "node_modules/@biomejs/biome/bin/biome"), "check", "--colors=off", "."],
    { cwd: ROOT, encoding: "utf8" },
  );
  if (r.status === 0) {
    totals.passed += 1;
    log("biome: passed");
  } else {
    totals.failed += 1;
    process.stdout.write(r.stdout + r.stderr);
    log("biome: failed (run `npx biome check --write .` to apply the safe fixes)");
  }
}

/** `tsc --noEmit` over the whole tree counts as one test. */
function typecheck() {
  log("Type-checking (tsc --noEmit) …");
  const r = spawnSync(
    process.execPath,
    [path.join(ROOT, "node_modules/typescript/bin/tsc"), "--noEmit", "-p", "tsconfig.json"],
    { cwd: ROOT, encoding: "utf8" },
  );
  if (r.status === 0) {
    totals.passed += 1;
    log("typecheck: passed");
  } else {
    totals.failed += 1;
    process.stdout.write(r.stdout + r.stderr);
    log("typecheck: failed");
  }
}

/** `next start` of the test build on a free loopback port; resolves with its address once it answers. */
const startTestServer = (env) =>
  startAppServer({ distDir: DIST_DIR, env: { ...env, TEST_RESULTS_DIR: RESULTS }, cleanups });

async function main() {
  mkdirSync(RESULTS, { recursive: true });
  ensurePackages(["mariadb", "mariadbClient", "chromium", "pdftoppm", "fonts", "libreoffice"]);
  ensureNodeModules(ROOT);

  const dbDir = mkdtempSync(path.join(os.tmpdir(), "throwline-test-db-"));
  cleanups.push(() => rmSync(dbDir, { recursive: true, force: true }));
  const dbSettings = { dir: dbDir, port: await freePort(), password: randomBytes(12).toString("hex") };
  const db = await startMariaDb(dbSettings);
  cleanups.push(() => db.stop());
  // The faults suite stops this server and starts it again (a new process): stop whichever one runs at the end.
  cleanups.push(() => stopRunningMariaDb(dbDir));
  const mail = await startMailStandIn({ port: await freePort(), outboxDir: path.join(dbDir, "outbox") });
  cleanups.push(() => mail.stop());

  // Uploads go to an S3 bucket on a local stand-in, as with several app servers in a real deployment.
  const s3 = await startS3StandIn({ port: await freePort(), dir: path.join(dbDir, "s3") });
  cleanups.push(() => s3.stop());

  const env = {
    ...s3.env,
    DATABASE_URL: db.url,
    SESSION_SECRET: randomBytes(36).toString("base64url"),
    SMTP_URL: mail.url,
    MAIL_OUTBOX_DIR: mail.outboxDir,
    STORAGE_DIR: path.join(dbDir, "uploads"),
    // For the faults suite only (tests/integration/faults.test.ts): how to stop and restart this database.
    TEST_MARIADB_DIR: dbDir,
    TEST_MARIADB_PORT: String(dbSettings.port),
    TEST_MARIADB_PASSWORD: dbSettings.password,
    NEXT_TELEMETRY_DISABLED: "1",
  };
  migrate(env);
  await seedWhenEmpty(env);

  if (!FILTERS.length) lint();
  await runVitest("unit", "vitest.config.mts", "tests/unit", env);
  if (!FILTERS.length) typecheck();

  let serverUp = false;
  try {
    buildIfStale(DIST_DIR, env);
    // A second server (same build, same MariaDB and bucket) for the two-servers test, only when it runs.
    const second = testFiles("tests/integration").some(
      (f) => f === "tests/integration" || f.endsWith("two-servers.test.ts"),
    );
    const [baseUrl, secondUrl] = await Promise.all([startTestServer(env), second ? startTestServer(env) : null]);
    serverUp = true;
    Object.assign(env, { APP_URL: baseUrl }, secondUrl ? { APP_URL_SECOND: secondUrl } : {});
  } catch (err) {
    log(`The app could not be built or started: ${err.message}`);
    totals.failed += 1;
  }

  if (serverUp) {
    await runVitest("integration", "vitest.config.mts", "tests/integration", env);
    await runVitest("e2e", "vitest.e2e.config.mts", "tests/e2e", env);
  }
}

let exitCode = 1;
try {
  await main();
} catch (err) {
  log(`The test run stopped early: ${err.stack ?? err.message}`);
  totals.failed += 1;
} finally {
  await cleanups.run();
  const skipped = totals.skipped ? `, ${totals.skipped} skipped` : "";
  process.stdout.write(`\n${totals.passed} passed, ${totals.failed} failed${skipped}\n`);
  exitCode = totals.failed === 0 && totals.passed > 0 ? 0 : 1;
}
process.exit(exitCode);
